// The zip bundle: a golden SHA-256 (node:crypto as the outside reference), the same bytes again and in a fresh tsx process, read back with jszip.
import { execFileSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import JSZip from 'jszip';
import { describe, expect, it } from 'vitest';
import { prepare, writeFiles } from '../../../../src/lib/design';
import { exportFileName } from '../../../../src/lib/formats/bundle';
import { parseFormatList } from '../../../../src/lib/formats/parse-format-list';
import { InputError, parseDesignInput } from '../../../../src/lib/schemas';
import { goldenBundle, goldenDesign, goldenMeta } from '../../../fixtures/bundle/golden-bundle';

/**
 * Recorded from the first build. It changes only when sizing or a writer changes on purpose:
 * then check the new files by eye and record the new hash.
 * Re-recorded when the sweep JSON's stack turned bottom up (z increasing): only design.sweep.json
 * and the manifest naming its hash changed; every Gerber, drill, DXF, SVG and the notes kept their bytes.
 * Re-recorded for the corrected first pass (issue 16): the patch 0.008 mm shorter (Hammerstad–Jensen
 * εeff), the probe 0.69 mm further from the centre (loaded edge resistance), the ground 0.008 mm
 * shorter, the sweep's new derived values, and two new warnings in the fab notes (small ground,
 * probe hole against the connector pin). Checked file by file against the previous build.
 * Re-recorded for the board-house fab notes (issue 17): an order checklist, the recorded profile named with its
 * figures, no sizing warnings. Only the fab notes and the manifest naming their hash changed (file by file).
 * Re-recorded for sweep JSON version 2 (issue 17): only design.sweep.json (formatVersion 2, the v2 schema URL, a base
 * of the applicable fields, each point's solverSetup) and the manifest naming its hash changed; every Gerber, drill,
 * DXF, SVG and the notes kept their bytes (checked file by file against the previous build).
 * Re-recorded for the dimensioned drawing (issue 17, the drafter): only drawing.svg (dimensions in tiers, the probe
 * position from datum A, sizes to 0.01 mm, the title block, masks as outlines), drawing.dxf (the same dimensions and
 * title block on the layers FF-DIMENSIONS and FF-TITLE; the board layers' geometry unchanged) and the manifest naming
 * their hashes changed; every Gerber, drill, sweep and the notes kept their bytes (the writer goldens, file by file).
 */
const GOLDEN_SHA256 = 'b18596d49d78eb20c8b30bf6ac7de32033d467f3fb15219c7fd5ac863d549cc5';
const sha = (b: Uint8Array) => createHash('sha256').update(b).digest('hex');

describe('export bundle', () => {
	it('matches the recorded golden hash, twice in one process', async () => {
		expect(sha(await goldenBundle())).toBe(GOLDEN_SHA256);
		expect(sha(await goldenBundle())).toBe(GOLDEN_SHA256);
	});

	it('gives the same hash in a fresh process in another time zone', () => {
		const out = execFileSync('npx', ['tsx', 'tests/fixtures/bundle/golden-bundle.ts'], { encoding: 'utf8', env: { ...process.env, TZ: 'Asia/Kolkata' } });
		expect(out.trim()).toBe(GOLDEN_SHA256);
	});

	it('holds every file in the fixed order with the revision date and no folder entries', async () => {
		const zip = await JSZip.loadAsync(await goldenBundle());
		const names = Object.keys(zip.files);
		const s = (part: string, ext: string) => exportFileName(goldenMeta, part, ext);
		expect(names).toEqual([
			s('copper-top', 'gbr'),
			s('copper-bottom', 'gbr'),
			s('profile', 'gbr'),
			s('mask-top', 'gbr'),
			s('mask-bottom', 'gbr'),
			s('drill-plated', 'drl'),
			s('drawing', 'dxf'),
			s('drawing', 'svg'),
			s('design', 'sweep.json'),
			s('fab-notes', 'txt'),
			s('manifest', 'json')
		]);
		expect(names[0]).toBe('sunroof-gnss-B.copper-top.gbr');
		for (const f of Object.values(zip.files)) {
			expect(f.dir).toBe(false);
			expect(f.date.toISOString()).toBe('2026-11-20T00:00:00.000Z');
		}
		const manifest = JSON.parse(await zip.file(s('manifest', 'json'))!.async('string'));
		for (const entry of manifest.files) {
			const bytes = await zip.file(entry.name)!.async('uint8array');
			expect(entry.sizeBytes).toBe(bytes.length);
			expect(entry.sha256).toBe(sha(bytes));
		}
		expect(manifest.files.length).toBe(names.length - 1);
	});

	it('builds only the chosen formats, plus the manifest', async () => {
		const files = await writeFiles(prepare(parseDesignInput(goldenDesign)), parseFormatList('drill,notes'), goldenMeta);
		expect(files.map((f) => f.name)).toEqual(['sunroof-gnss-B.drill-plated.drl', 'sunroof-gnss-B.fab-notes.txt', 'sunroof-gnss-B.manifest.json']);
	});

	it('refuses an unknown format name with an InputError', () => {
		expect(() => parseFormatList('gerber,pdf')).toThrow(InputError);
	});
});
