// One golden file per writer per fixture design: every file each format writes for six fixture designs (one per
// kind of artwork: a plain inset patch, a probe-fed disc with its drill, a corner-cut CP patch, a three-copper
// aperture-coupled stack, a 2 × 2 array and an edge-fed patch with an edge launch) is compared, byte for byte, with the file checked in under
// tests/fixtures/writers/<design>/. A change to any writer shows here as the file and line it changed, beside the one
// hash of the golden bundle. After an intended change, write them again with
//   UPDATE_GOLDEN=1 npx vitest run tests/unit/formats/golden
// and review the diff of tests/fixtures/writers before committing it.
import { existsSync, mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { prepare, writeFiles } from '../../../../src/lib/design';
import { createExportMeta } from '../../../../src/lib/formats/export-meta';
import { formatIds } from '../../../../src/lib/formats/format-ids';
import { parseDesignInput, type DesignInputDocument } from '../../../../src/lib/schemas';
import { designDocument } from '../../../fixtures/designs/design-cases';
import { layeredCases } from '../../../fixtures/designs/layered-cases';

const root = join(import.meta.dirname, '../../../fixtures/writers');
const update = process.env.UPDATE_GOLDEN === '1';
const layered = (name: string): DesignInputDocument => layeredCases.find((c) => c.name === name)!.doc;

const designs: { slug: string; doc: DesignInputDocument }[] = [
	{ slug: 'rectangular-inset', doc: designDocument('rectangular', 'inset', { name: 'Golden inset' }) },
	{ slug: 'circular-probe', doc: designDocument('circular', 'probe', { name: 'Golden disc', solderMask: true }) },
	{ slug: 'truncated-corner-inset', doc: designDocument('truncated-corner', 'inset', { name: 'Golden corner-cut' }) },
	{ slug: 'aperture-coupled', doc: { ...layered('aperture-coupled patch'), name: 'Golden aperture' } },
	{ slug: 'array-2x2-quarter-wave', doc: { ...layered('2×2 quarter-wave array'), name: 'Golden array' } },
	// an edge-fed patch with an edge launch: its pads, the via drill file and the launch lines of the fab notes
	{ slug: 'rectangular-edge-launch', doc: designDocument('rectangular', 'edge', { name: 'Golden launch', launch: { kind: 'edge', viaRows: 2 } }) }
];

async function filesOf(doc: DesignInputDocument) {
	const meta = createExportMeta({ designName: doc.name ?? 'Golden', revisionLabel: 'A', revisionDate: '2026-12-01' });
	return writeFiles(prepare(parseDesignInput(doc)), formatIds, meta);
}

describe.each(designs)('the files written for $slug', ({ slug, doc }) => {
	it('equal the checked-in golden files, one per file, and no file is missing or extra', async () => {
		const dir = join(root, slug);
		const files = await filesOf(doc);
		if (update) {
			rmSync(dir, { recursive: true, force: true });
			mkdirSync(dir, { recursive: true });
			for (const f of files) writeFileSync(join(dir, f.name), f.bytes);
		}
		expect(existsSync(dir), `${dir} holds the golden files (write them with UPDATE_GOLDEN=1)`).toBe(true);
		expect(files.map((f) => f.name).sort()).toEqual(readdirSync(dir).sort());
		const decoder = new TextDecoder();
		for (const f of files) expect(decoder.decode(f.bytes), f.name).toBe(readFileSync(join(dir, f.name), 'utf8'));
	});
});

it('covers every format of the registry in at least one design', async () => {
	const written = (await Promise.all(designs.map((d) => filesOf(d.doc)))).flat().map((f) => f.name);
	const extensionOf: Record<(typeof formatIds)[number], RegExp> = { gerber: /\.gbr$/, drill: /\.drl$/, dxf: /\.dxf$/, svg: /\.svg$/, sweep: /\.sweep\.json$/, notes: /fab-notes\.txt$/, step: /\.step$/ };
	for (const id of formatIds) expect(written.some((name) => extensionOf[id].test(name)), id).toBe(true);
});
