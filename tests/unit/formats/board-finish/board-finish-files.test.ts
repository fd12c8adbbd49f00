// The legend, the masks and the mounting holes in the files: Gerber X2 and Excellon read back by @tracespace/parser
// 5.0.0-next.0, DXF by dxf-parser, SVG by its elements, the fab notes by their lines, and the pipeline's read-back.
import DxfParser from 'dxf-parser';
import { createParser } from '@tracespace/parser';
import { describe, expect, it } from 'vitest';
import { prepare, readBack, stamped, writeFiles } from '../../../../src/lib/design';
import { createExportMeta } from '../../../../src/lib/formats/export-meta';
import { parseDesignInput, type DesignInputDocument } from '../../../../src/lib/schemas';
import { readBackGerber } from '../gerber/read-back';

const meta = createExportMeta({ designName: 'Roof GNSS', revisionLabel: 'C', revisionDate: '2026-12-02' });
const doc: DesignInputDocument = {
	name: 'Roof GNSS',
	frequencyHz: 2.45e9,
	substrate: { relativePermittivity: 4.4, heightMm: 1.6, lossTangent: 0.02 },
	groundMarginMm: 10,
	solderMask: true,
	maskCoverage: 'covered',
	legend: { orderText: 'FR4 1.6MM ENIG' },
	mountingHoles: [{ xMm: 3.5, yMm: 3.5, diameterMm: 3.2 }]
};
const prepared = prepare(parseDesignInput(doc));
const files = await writeFiles(prepared, ['gerber', 'drill', 'dxf', 'svg', 'notes'], meta);
const text = (suffix: string) => new TextDecoder().decode(files.find((f) => f.name.endsWith(suffix))!.bytes);
const decoded = (bytes: Uint8Array) => new TextDecoder().decode(bytes);
/** The legend's strokes as written: the stamped artwork's (name, marks, order text and the revision line). */
const strokeCount = stamped(prepared, meta).artwork.layers.find((l) => l.id === 'legend-top')!.shapes.filter((s) => s.geometry.kind === 'stroke').length;

describe('Gerber X2 layers for legend and mask (Gerber Layer Format Specification, file attributes, .FileFunction)', () => {
	it.each([
		{ file: '.legend-top.gbr', fn: '%TF.FileFunction,Legend,Top*%', polarity: '%TF.FilePolarity,Positive*%' },
		{ file: '.mask-top.gbr', fn: '%TF.FileFunction,Soldermask,Top*%', polarity: '%TF.FilePolarity,Negative*%' },
		{ file: '.mask-bottom.gbr', fn: '%TF.FileFunction,Soldermask,Bot*%', polarity: '%TF.FilePolarity,Negative*%' }
	])('$file parses to the end with the file function $fn', ({ file, fn, polarity }) => {
		const read = readBackGerber(text(file));
		expect(read.tree.filetype).toBe('gerber');
		expect(read.tree.done).toBe(true);
		expect(read.fileAttributes).toContain(fn);
		expect(read.fileAttributes).toContain(polarity);
	});

	it('draws the legend as strokes of one round pen, 0.15 mm, all inside the board', () => {
		const read = readBackGerber(text('.legend-top.gbr'));
		const tools = read.tree.children.flatMap((n) => (n.type === 'toolDefinition' && n.shape.type === 'circle' ? [n.shape.diameter] : []));
		expect(tools).toEqual([0.15]);
		expect(read.regions).toEqual([]);
		expect(read.strokes.length).toBeGreaterThan(100);
		for (const s of read.strokes) for (const [x, y] of [s.from, s.to]) {
			expect(x).toBeGreaterThan(0);
			expect(y).toBeGreaterThan(0);
			expect(x).toBeLessThan(prepared.artwork.board.widthMm);
			expect(y).toBeLessThan(prepared.artwork.board.lengthMm);
		}
	});

	it('leaves the patch under the mask when covered: the top mask opens the feed and the hole only', () => {
		const top = prepared.artwork.layers.find((l) => l.id === 'mask-top')!;
		expect(top.shapes.map((s) => s.id)).toEqual(['mask-top-feed-line', 'mask-top-mounting-hole-1']);
		const read = readBackGerber(text('.mask-top.gbr'));
		expect(read.regions.length + read.flashes.length).toBe(2);
	});
});

describe('Excellon NPTH file (X2 drill attributes; read back by @tracespace/parser)', () => {
	it('writes the mounting hole in a non-plated file as a mechanical drill, and no plated file', () => {
		expect(files.some((f) => f.name.endsWith('drill-plated.drl'))).toBe(false);
		const drl = text('drill-non-plated.drl');
		const p = createParser();
		p.feed(drl);
		const tree = p.results();
		expect(tree.filetype).toBe('drill');
		expect(tree.done).toBe(true);
		const comments = tree.children.flatMap((n) => (n.type === 'comment' ? [n.comment] : []));
		expect(comments).toContain('#@! TF.FileFunction,NonPlated,1,2,NPTH');
		expect(comments).toContain('#@! TA.AperFunction,NonPlated,NPTH,MechanicalDrill');
		const tool = tree.children.find((n) => n.type === 'toolDefinition');
		expect(tool && tool.type === 'toolDefinition' && tool.shape.type === 'circle' && tool.shape.diameter).toBe(3.2);
		const hits = tree.children.filter((n) => n.type === 'graphic');
		expect(hits).toHaveLength(1);
		const hit = hits[0];
		expect(hit.type === 'graphic' && [Number(hit.coordinates.x), Number(hit.coordinates.y)]).toEqual([3.5, 3.5]);
	});
});

describe('the pipeline read-back covers the new layers', () => {
	it('reads every file back as drawn, the stamped revision included', () => {
		const result = readBack(files, prepared, meta);
		expect(result.mismatches).toEqual([]);
		expect(result.ok).toBe(true);
		expect(result.view.layers.map((l) => l.key)).toEqual(expect.arrayContaining(['legend-top', 'mask-top', 'mask-bottom']));
	});

	it('catches a legend stroke moved by 2 µm, and a legend file missing', () => {
		const legend = files.find((f) => f.name.endsWith('.legend-top.gbr'))!;
		const moved = decoded(legend.bytes).replace(/X(\d+)Y(\d+)D01\*/, (_m, x: string, y: string) => `X${Number(x) + 2000}Y${y}D01*`);
		const bad = readBack(files.map((f) => (f === legend ? { name: f.name, bytes: new TextEncoder().encode(moved) } : f)), prepared, meta);
		expect(bad.ok).toBe(false);
		expect(bad.mismatches.map((m) => m.check)).toContain('layer-shape');
		const without = readBack(files.filter((f) => f !== legend), prepared, meta);
		expect(without.ok).toBe(false);
	});

	it('writes designs without a legend from the same object: stamping changes nothing there', () => {
		const plain = prepare(parseDesignInput({ ...doc, legend: undefined }));
		expect(stamped(plain, meta)).toBe(plain);
	});
});

describe('DXF and SVG draw the legend through the layer mechanism', () => {
	it('puts the legend centre lines on a LEGEND-TOP layer as open polylines (dxf-parser)', () => {
		const dxf = new DxfParser().parseSync(text('.drawing.dxf')) as unknown as { tables: { layer: { layers: Record<string, unknown> } }; entities: { layer: string; type: string; shape?: boolean }[] };
		expect(Object.keys(dxf.tables.layer.layers)).toContain('LEGEND-TOP');
		const ink = dxf.entities.filter((e) => e.layer === 'LEGEND-TOP');
		expect(ink.length).toBe(strokeCount);
		expect(ink.every((e) => e.type === 'LWPOLYLINE' && !e.shape)).toBe(true);
		expect(dxf.entities.filter((e) => e.layer === 'DRILL-NON-PLATED')).toHaveLength(1);
	});

	it('draws the legend as round-capped unfilled paths in its own SVG group', () => {
		const svg = text('.drawing.svg');
		const group = /<g [^>]*id="layer-legend-top"[^>]*>([\s\S]*?)<\/g>/.exec(svg);
		expect(group).not.toBeNull();
		const paths = group![1].match(/<path [^>]*>/g) ?? [];
		expect(paths.length).toBe(strokeCount);
		expect(paths.every((p) => p.includes('fill="none"') && p.includes('stroke-linecap="round"') && p.includes('stroke-width="0.15"'))).toBe(true);
	});
});

describe('fab notes', () => {
	const notes = text('.fab-notes.txt');

	it('state the mask over the patch with the εr and thickness the sizing assumed, and the mask colour advice', () => {
		expect(notes).toContain('Solder mask: yes, over the patch too; openings as drawn on the mask layers');
		expect(notes).toMatch(/sized under 20 µm of mask \(assumed, not stated by the design\) of εr 3\.8 \(assumed, not stated by the design\)/);
		expect(notes).toMatch(/use one mask product and colour for every build/);
	});

	it('name the legend layer and the NPTH mounting hole', () => {
		expect(notes).toMatch(/Legend \(silkscreen\), top side only, as drawn on the legend layer: 0\.15 mm lines, 1 mm text/);
		expect(notes).toContain('Mounting holes: 1 non-plated (NPTH) hole in the non-plated drill file; do not plate it.');
		expect(notes).toMatch(/NPTH 3\.2 mm finished hole, 1 hole\(s\)/);
	});
});
