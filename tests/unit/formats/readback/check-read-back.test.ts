// Read-back self-check: our own Gerber and Excellon output, parsed with @tracespace/parser 5.0.0-next.0 (the outside
// reference), matches the artwork; corrupted output (test-only edits of the text) is caught.
import { describe, expect, it } from 'vitest';
import { buildArtwork, type Artwork } from '../../../../src/lib/artwork';
import { createExportMeta } from '../../../../src/lib/formats/export-meta';
import { toExcellon } from '../../../../src/lib/formats/excellon';
import { toGerber } from '../../../../src/lib/formats/gerber';
import { prepare, readBack, writeFiles } from '../../../../src/lib/design';
import { checkReadBack, isFabFileName, type FabFile, type ReadBackCheck } from '../../../../src/lib/formats/readback';
import { regionArea } from '../../../../src/lib/geometry';
import { size } from '../../../../src/lib/rf';
import { parseDesignInput, type DesignInputDocument } from '../../../../src/lib/schemas';

const meta = createExportMeta({ designName: 'Read back', revisionLabel: 'A', revisionDate: '2026-12-01' });
const fr4 = { relativePermittivity: 4.4, heightMm: 1.6 };

function artworkOf(doc: Partial<DesignInputDocument>): Artwork {
	return buildArtwork(size(parseDesignInput({ frequencyHz: 2.45e9, substrate: fr4, solderMask: true, ...doc })));
}

/** The files an export writes for the fab: one Gerber per layer, plated and non-plated Excellon. */
type TextFile = { name: string; text: string };
function filesOf(artwork: Artwork): TextFile[] {
	return [
		...artwork.layers.map((l) => ({ name: `${l.id}.gbr`, text: toGerber(artwork, l.id, meta) })),
		{ name: 'plated.drl', text: toExcellon(artwork, true, meta) },
		{ name: 'non-plated.drl', text: toExcellon(artwork, false, meta) }
	];
}

function edit(files: TextFile[], name: string, change: (text: string) => string): TextFile[] {
	return files.map((f) => {
		if (f.name !== name) return f;
		const text = change(f.text);
		if (text === f.text) throw new Error(`the edit of ${name} changed nothing`);
		return { ...f, text };
	});
}
const checksOf = (artwork: Artwork, files: readonly FabFile[]): ReadBackCheck[] => [...new Set(checkReadBack(artwork, files).mismatches.map((m) => m.check))];

const designs: [string, Partial<DesignInputDocument>][] = [
	['rectangular inset', {}],
	['rectangular edge', { feed: 'edge' }],
	['rectangular quarter-wave', { feed: 'quarter-wave' }],
	['rectangular probe', { feed: 'probe' }],
	['circular probe', { shape: 'circular', feed: 'probe' }],
	['circular edge', { shape: 'circular', feed: 'edge' }],
	['truncated-corner inset', { shape: 'truncated-corner' }],
	['nearly-square probe', { shape: 'nearly-square', feed: 'probe' }]
];

describe('checkReadBack on honest writer output', () => {
	it.each(designs)('finds no mismatch for a %s design', (_name, doc) => {
		const artwork = artworkOf(doc);
		const result = checkReadBack(artwork, filesOf(artwork));
		expect(result.mismatches).toEqual([]);
		expect(result.ok).toBe(true);
	});

	it('exports the fab view: the ground with its clearance hole, the probe hole, the board', () => {
		const artwork = artworkOf({ feed: 'probe' });
		const { view } = checkReadBack(artwork, filesOf(artwork));
		const ground = view.layers.find((l) => l.key === 'copper-L2')!;
		expect(ground.polygons).toHaveLength(1);
		expect(ground.polygons[0].holes).toHaveLength(1);
		const { widthMm: w, lengthMm: l } = artwork.board;
		const clearance = artwork.layers[1].shapes.find((s) => s.id === 'clearance')!;
		const d = clearance.geometry.kind === 'circle' ? clearance.geometry.diameterMm : NaN;
		// plane area = board − clearance disc (flattened: within 0.01 %)
		expect(ground.areaMm2).toBeCloseTo(w * l - (Math.PI * d * d) / 4, 2);
		expect(view.board).toEqual({ minXMm: 0, minYMm: 0, maxXMm: expect.closeTo(w, 6), maxYMm: expect.closeTo(l, 6) });
		expect(view.drills.find((f) => f.plated)!.holes).toEqual([
			{ xMm: expect.closeTo(artwork.drills[0].center[0], 3), yMm: expect.closeTo(artwork.drills[0].center[1], 3), diameterMm: artwork.drills[0].diameterMm }
		]);
	});

	it('reads the top copper area as the artwork has it (exact region areas, no overlaps on an edge feed)', () => {
		const artwork = artworkOf({ feed: 'edge' });
		const { view } = checkReadBack(artwork, filesOf(artwork));
		const exact = artwork.layers[0].shapes.reduce((s, x) => s + (x.geometry.kind === 'region' ? regionArea(x.geometry.region) : 0), 0);
		expect(view.layers.find((l) => l.key === 'copper-L1')!.areaMm2 / exact).toBeCloseTo(1, 5);
	});

	it.each(designs)('passes the export pipeline\'s own Gerber and drill files for a %s design', async (_name, doc) => {
		const prepared = prepare(parseDesignInput({ frequencyHz: 2.45e9, substrate: fr4, solderMask: true, ...doc }));
		const files = (await writeFiles(prepared, ['gerber', 'drill', 'notes'], meta)).filter((f) => isFabFileName(f.name));
		expect(files.length).toBeGreaterThanOrEqual(4);
		expect(checkReadBack(prepared.artwork, files).mismatches).toEqual([]);
		expect(readBack(files, prepared, meta).mismatches).toEqual([]);
	});

	it('accepts the files as bytes too', () => {
		const artwork = artworkOf({ feed: 'probe' });
		const bytes = filesOf(artwork).map((f) => ({ name: f.name, bytes: new TextEncoder().encode(f.text) }));
		expect(checkReadBack(artwork, bytes).ok).toBe(true);
	});
});

describe('checkReadBack catches corrupted output', () => {
	const inset = artworkOf({});
	const probe = artworkOf({ feed: 'probe' });
	it.each<[string, Artwork, (f: TextFile[]) => FabFile[], ReadBackCheck[]]>([
		// the feed-line region (the second G36…G37 block of the top copper) is dropped
		['a dropped region', inset, (f) => edit(f, 'copper-top.gbr', (t) => t.replace(/(G36\*[\s\S]*?G37\*\n[\s\S]*?)G36\*[\s\S]*?G37\*\n/, '$1')), ['layer-area', 'layer-shape', 'layer-extents']],
		// one vertex of the patch moved 0.2 mm in x
		[
			'a shifted region coordinate',
			inset,
			(f) => edit(f, 'copper-top.gbr', (t) => t.replace(/G36\*\nX(\d+)Y(\d+)D02\*\nG01\*\nX(\d+)/, (_m, x, y, x2) => `G36*\nX${x}Y${y}D02*\nG01*\nX${Number(x2) + 200000}`)),
			['layer-shape']
		],
		// the board outline's far corner moved 5 µm
		['a shifted profile coordinate', inset, (f) => edit(f, 'profile.gbr', (t) => t.replace(/\nX(\d+)Y(\d+)D01\*/, (_m, x, y) => `\nX${Number(x) + 5000}Y${y}D01*`)), ['board-extents']],
		// the probe drill grows 10 µm
		['a changed drill diameter', probe, (f) => edit(f, 'plated.drl', (t) => t.replace(/T01C(\d+\.\d+)/, (_m, d) => `T01C${(Number(d) + 0.01).toFixed(3)}`)), ['drill-diameter']],
		// the probe drill moved 2 µm
		['a moved drill hit', probe, (f) => edit(f, 'plated.drl', (t) => t.replace(/\nX(\d+\.\d+)Y/, (_m, x) => `\nX${(Number(x) + 0.002).toFixed(3)}Y`)), ['drill-position']],
		// the probe drill hit is gone
		['a dropped drill hit', probe, (f) => edit(f, 'plated.drl', (t) => t.replace(/\nX[\d.]+Y[\d.]+/, '')), ['drill-count']],
		// the clearance is flashed dark: LPC lost, the anti-pad becomes copper
		['a lost clear polarity', probe, (f) => edit(f, 'copper-bottom.gbr', (t) => t.replace('%LPC*%\n', '')), ['layer-area', 'layer-shape']],
		// the file is cut before M02
		['a truncated file', inset, (f) => edit(f, 'copper-top.gbr', (t) => t.replace('M02*', '')), ['file-unreadable']],
		// the ground layer's file is missing
		['a missing layer file', inset, (f) => f.filter((x) => x.name !== 'copper-bottom.gbr'), ['layer-missing']],
		// the plated drill file is missing while the artwork has a probe hole
		['a missing drill file', probe, (f) => f.filter((x) => x.name !== 'plated.drl'), ['layer-missing']],
		// a rectangular aperture we never write and do not read
		['an unsupported aperture', probe, (f) => edit(f, 'copper-top.gbr', (t) => t.replace(/%ADD10C,([\d.]+)\*%/, '%ADD10R,$1X$1*%')), ['file-unsupported']],
		// the top copper claims to be layer 2
		['a wrong file function', inset, (f) => edit(f, 'copper-top.gbr', (t) => t.replace('%TF.FileFunction,Copper,L1,Top*%', '%TF.FileFunction,Copper,L2,Bot*%')), ['layer-missing', 'layer-unexpected']]
	])('%s', (_name, artwork, corrupt, expected) => {
		const result = checkReadBack(artwork, corrupt(filesOf(artwork)));
		expect(result.ok).toBe(false);
		expect(checksOf(artwork, corrupt(filesOf(artwork))).sort()).toEqual([...expected].sort());
		for (const m of result.mismatches) expect(m.message.length).toBeGreaterThan(10);
	});
});
