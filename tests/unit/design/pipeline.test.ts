// The one pipeline: each request draws the artwork exactly once (counted by wrapping the artwork builder), and its
// steps give the bytes the golden bundle recorded.
import { describe, expect, it, vi, beforeEach } from 'vitest';
import * as artworkModule from '../../../src/lib/artwork';
import { bundle, gate, holdsFabFiles, prepare, prepareSized, readBack, writeFiles } from '../../../src/lib/design';
import { canonicalJson } from '../../../src/lib/design/canonical-json';
import { bundleFormatIds, formatIds } from '../../../src/lib/formats/format-ids';
import { formatRegistry } from '../../../src/lib/formats/registry';
import { size } from '../../../src/lib/rf';
import { parseDesignInput } from '../../../src/lib/schemas';
import { STANDARD_QUICK_TURN_PROFILE } from '../../../src/lib/schemas/fab-profile';
import { run as runExport } from '../../../src/cli/commands/export';
import { goldenDesign, goldenMeta } from '../../fixtures/bundle/golden-bundle';
import { designDocument } from '../../fixtures/designs/design-cases';

vi.mock('../../../src/lib/artwork', async (importOriginal) => {
	const actual = await importOriginal<typeof import('../../../src/lib/artwork')>();
	return { ...actual, buildArtwork: vi.fn(actual.buildArtwork) };
});
const builds = () => vi.mocked(artworkModule.buildArtwork).mock.calls.length;

/** A download's steps as the server and the CLI take them: gate, write, read back, zip. */
async function download(prepared: ReturnType<typeof prepare>, formats: readonly (typeof formatIds)[number][]) {
	gate(prepared, STANDARD_QUICK_TURN_PROFILE);
	const files = await writeFiles(prepared, formats, goldenMeta);
	if (holdsFabFiles(files)) expect(readBack(files, prepared, goldenMeta).ok).toBe(true);
	return bundle(files, goldenMeta);
}

beforeEach(() => {
	vi.mocked(artworkModule.buildArtwork).mockClear();
});

describe('the design pipeline', () => {
	it('draws the artwork once for a Gerber download of a probe-fed design (its drill file is read back with it)', async () => {
		const prepared = prepare(parseDesignInput(goldenDesign));
		await download(prepared, ['gerber']);
		expect(builds()).toBe(1);
	});

	it.each(formatIds)('draws the artwork once for a %s download', async (format) => {
		await download(prepare(parseDesignInput(goldenDesign)), [format]);
		expect(builds()).toBe(1);
	});

	it('draws the artwork once for the whole bundle, the one-point sweep included', async () => {
		await download(prepare(parseDesignInput(goldenDesign)), bundleFormatIds);
		expect(builds()).toBe(1);
	});

	it('draws a stored revision once when its stored results came back from jsonb with their keys reordered', async () => {
		// PostgreSQL's jsonb returns object keys sorted by length, then bytes (PostgreSQL manual §8.14, "JSON Types")
		const reorder = (v: unknown): unknown =>
			Array.isArray(v) ? v.map(reorder) : v && typeof v === 'object' ? Object.fromEntries(Object.entries(v).sort(([a], [b]) => a.length - b.length || (a < b ? -1 : 1)).map(([k, x]) => [k, reorder(x)])) : v;
		const stored = JSON.parse(JSON.stringify(reorder(size(parseDesignInput(goldenDesign)))));
		vi.mocked(artworkModule.buildArtwork).mockClear();
		const fromStore = await download(prepareSized(stored), bundleFormatIds);
		expect(builds()).toBe(1);
		// and the bytes are those of a fresh design: the reorder changes nothing a user downloads
		expect(fromStore).toEqual(await download(prepare(parseDesignInput(goldenDesign)), bundleFormatIds));
	});

	it('draws the artwork once per CLI export', async () => {
		const { mkdtempSync, writeFileSync } = await import('node:fs');
		const { tmpdir } = await import('node:os');
		const { join } = await import('node:path');
		const dir = mkdtempSync(join(tmpdir(), 'ff-pipeline-'));
		writeFileSync(join(dir, 'design.json'), JSON.stringify(goldenDesign));
		vi.spyOn(console, 'log').mockImplementation(() => undefined);
		expect(await runExport([join(dir, 'design.json'), '--out', join(dir, 'out.zip')])).toBe(0);
		expect(builds()).toBe(1);
	});

	it('writes a format that does not apply to the artwork nowhere: no drill file for a design without holes', async () => {
		const prepared = prepare(parseDesignInput(designDocument('rectangular', 'inset')));
		expect(prepared.artwork.drills).toEqual([]);
		expect(formatRegistry.find((f) => f.id === 'drill')!.appliesTo(prepared.artwork)).toBe(false);
		expect((await writeFiles(prepared, ['drill'], goldenMeta)).map((f) => f.name)).toEqual(['sunroof-gnss-B.manifest.json']);
	});

	it('keeps a stored revision whose values today\u2019s sizing no longer gives (its results are what the revision is)', () => {
		const sized = size(parseDesignInput(goldenDesign));
		const older = { ...sized, patch: { ...sized.patch, widthMm: (sized.patch as { widthMm: number }).widthMm + 0.5 } };
		const prepared = prepareSized(older as typeof sized);
		expect(prepared.sized).toBe(older);
		expect(canonicalJson(prepared.sized)).not.toBe(canonicalJson(sized));
	});
});
