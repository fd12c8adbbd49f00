// Layered designs and arrays through every writer, read back by the outside references: @tracespace/parser (Gerber), dxf-parser, ajv (sweep JSON Schema).
import Ajv2020 from 'ajv/dist/2020';
import DxfParser from 'dxf-parser';
import { describe, expect, it } from 'vitest';
import { buildArtwork } from '../../../../src/lib/artwork';
import { buildDxfCommands, buildSweepDocument, createExportMeta, dxfLayerName, serializeSweep, sweepJsonSchema, toDxf, toGerber, bundleFormatIds } from '../../../../src/lib/formats';
import { layeredCases } from '../../../fixtures/designs/layered-cases';
import { readBackGerber } from '../gerber/read-back';
import { prepareSized, writeFiles } from '../../../../src/lib/design';
import { sizeDocument } from '../../../fixtures/designs/size-document';

const meta = createExportMeta({ designName: 'Layered demo', revisionLabel: 'A', revisionDate: '2026-12-02' });
const ajv = new Ajv2020({ allErrors: true, strict: true, strictTypes: false, strictTuples: false });
const validate = ajv.compile(sweepJsonSchema as object);
const cases = layeredCases.map((c) => ({ ...c, sized: sizeDocument(c.doc), artwork: buildArtwork(sizeDocument(c.doc)) }));

describe('layered designs and arrays in every format', () => {
	it.each(cases)('$name: every Gerber layer parses completely with @tracespace/parser and reads back its regions', ({ artwork }) => {
		for (const layer of artwork.layers) {
			const read = readBackGerber(toGerber(artwork, layer.id, meta));
			// @tracespace/parser: a complete parse has filetype gerber and reaches M02
			expect(read.tree.filetype).toBe('gerber');
			expect(read.tree.done).toBe(true);
			expect(read.tree.children.filter((n) => n.type === 'unimplemented' && !/^%T[FAD]/.test(n.value))).toEqual([]);
			if (layer.function.kind !== 'profile') {
				const contours = layer.shapes.flatMap((s) => (s.geometry.kind === 'region' ? [s.geometry.region.outer, ...s.geometry.region.holes] : []));
				expect(read.regions.length).toBe(contours.length);
				expect(read.regions.filter((r) => r.polarity === 'clear').length).toBe(layer.shapes.filter((s) => s.polarity === 'clear' && s.geometry.kind === 'region').length);
			}
		}
	});

	it.each(cases.filter((c) => c.artwork.metadata.copperLayerCount === 3))('$name: copper file functions L1 Top, L2 Inr, L3 Bot (Gerber Layer Format Specification §5.6.3)', ({ artwork }) => {
		const fileFunction = (id: string) => readBackGerber(toGerber(artwork, id, meta)).fileAttributes.find((a) => a.startsWith('%TF.FileFunction'));
		expect(fileFunction('copper-top')).toBe('%TF.FileFunction,Copper,L1,Top*%');
		expect(fileFunction('copper-inner-1')).toBe('%TF.FileFunction,Copper,L2,Inr*%');
		expect(fileFunction('copper-bottom')).toBe('%TF.FileFunction,Copper,L3,Bot*%');
	});

	it.each(cases)('$name: DXF read back by dxf-parser holds every layer with its entity count', ({ artwork }) => {
		 
		const dxf: any = new DxfParser().parseSync(toDxf(artwork));
		const expected = buildDxfCommands(artwork).flatMap((c) => (c.type === 'layer' ? [] : [c]));
		expect(dxf.entities.length).toBe(expected.length);
		for (const layer of artwork.layers) {
			const name = dxfLayerName(layer.id);
			expect(Object.keys(dxf.tables.layer.layers)).toContain(name);
			expect(dxf.entities.filter((e: { layer: string }) => e.layer === name).length).toBe(expected.filter((c) => c.layer === name).length);
		}
		expect(dxf.header.$EXTMAX.x).toBeCloseTo(artwork.board.widthMm, 5);
		expect(dxf.header.$EXTMAX.y).toBeCloseTo(artwork.board.lengthMm, 5);
	});

	it.each(cases)('$name: sweep JSON validates with ajv and lists every layer of the stack, each slab on the one below (z increasing bottom up)', ({ doc }) => {
		const sweep = JSON.parse(serializeSweep(buildSweepDocument(doc, { axes: [{ field: 'frequencyHz', values: [2.4e9, 2.45e9] }] }, meta)));
		expect(validate(sweep)).toBe(true);
		expect(validate.errors ?? []).toEqual([]);
		for (const point of sweep.points) {
			expect(point.status).toBe('sized');
			const stack = point.stack as { kind: string; zMm: number; thicknessMm: number }[];
			const resolved = sizeDocument(doc).layerStack;
			expect(stack.length).toBe(resolved ? resolved.length : 3);
			// listed bottom up: z rises from 0 along the list with no gap or overlap (issue 10 "Must show")
			const up = stack;
			expect(up[0]).toMatchObject({ kind: 'copper', layerId: 'copper-bottom', zMm: 0 });
			expect(up.at(-1)).toMatchObject({ kind: 'copper', layerId: 'copper-top' });
			for (let i = 1; i < up.length; i++) {
				expect(up[i].zMm).toBeGreaterThan(up[i - 1].zMm);
				expect(up[i].zMm).toBeCloseTo(up[i - 1].zMm + up[i - 1].thicknessMm, 12);
			}
			expect(point.layers.filter((l: { function: { kind: string } }) => l.function.kind === 'copper').length).toBe(stack.filter((s) => s.kind === 'copper').length);
		}
	});

	it('writes the whole bundle of a 2×4 aperture-coupled array: three copper Gerbers, DXF, SVG, sweep, notes with the bonding film', async () => {
		const c = cases.find((x) => x.name === '2×4 aperture-coupled array')!;
		const files = await writeFiles(prepareSized(c.sized), bundleFormatIds, meta);
		const names = files.map((f) => f.name);
		expect(names).toEqual(
			['copper-top.gbr', 'copper-inner-1.gbr', 'copper-bottom.gbr', 'profile.gbr', 'drawing.dxf', 'drawing.svg', 'design.sweep.json', 'array-pattern.json', 'fab-notes.txt', 'manifest.json'].map((n) => `layered-demo-A.${n}`)
		);
		const notes = new TextDecoder().decode(files.find((f) => f.name.endsWith('fab-notes.txt'))!.bytes);
		expect(notes).toContain('copper-inner-1');
		expect(notes).toContain('bonding film');
		const pattern = JSON.parse(new TextDecoder().decode(files.find((f) => f.name.endsWith('array-pattern.json'))!.bytes));
		expect(pattern.pattern.anglesDeg.length).toBe(pattern.pattern.xzDb.length);
		expect(pattern.columns * pattern.rows).toBe(8);
	});

	it('writes no array-pattern file for a single element', async () => {
		const c = cases.find((x) => x.name === 'aperture-coupled patch')!;
		expect((await writeFiles(prepareSized(c.sized), ['sweep'], meta)).map((f) => f.name)).toEqual(['layered-demo-A.design.sweep.json', 'layered-demo-A.manifest.json']);
	});
});
