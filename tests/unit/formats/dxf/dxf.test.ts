// DXF files read back with dxf-parser 1.1 (the outside reference): layers, entity counts, units and extents.
import DxfParser from 'dxf-parser';
import { describe, expect, it } from 'vitest';
import { buildArtwork } from '../../../../src/lib/artwork';
import { buildDxfCommands, dxfLayerName, toDxf } from '../../../../src/lib/formats/dxf';
import { allShapeFeedCases, sizedCase } from '../../../fixtures/designs/design-cases';

const cases = allShapeFeedCases.map((c) => ({ ...c, artwork: buildArtwork(sizedCase(c.shape, c.feed, { solderMask: true })) }));

// eslint-disable-next-line @typescript-eslint/no-explicit-any
const parse = (text: string): any => new DxfParser().parseSync(text);

describe('DXF writer', () => {
	it.each(cases)('reads back the layers, entity counts and extents of a $shape / $feed design', ({ artwork }) => {
		const dxf = parse(toDxf(artwork));
		const layerNames = Object.keys(dxf.tables.layer.layers);
		for (const layer of artwork.layers) expect(layerNames).toContain(dxfLayerName(layer.id));
		if (artwork.drills.length) expect(layerNames).toContain('DRILL-PLATED');
		// $INSUNITS 4 = millimetres (AutoCAD DXF reference, HEADER section)
		expect(dxf.header.$INSUNITS).toBe(4);
		const expected = buildDxfCommands(artwork).flatMap((c) => (c.type === 'layer' ? [] : [c]));
		expect(dxf.entities.length).toBe(expected.length);
		for (const layer of artwork.layers) {
			const name = dxfLayerName(layer.id);
			expect(dxf.entities.filter((e: { layer: string }) => e.layer === name).length).toBe(expected.filter((c) => c.layer === name).length);
		}
		for (const e of dxf.entities) {
			if (e.type === 'LWPOLYLINE') expect(e.shape).toBe(true); // closed flag (group 70 bit 1)
			else expect(e.type).toBe('CIRCLE');
		}
		// extents: every vertex and circle box lies on the board, and the profile spans it exactly
		let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
		for (const e of dxf.entities) {
			const pts = e.type === 'CIRCLE' ? [{ x: e.center.x - e.radius, y: e.center.y - e.radius }, { x: e.center.x + e.radius, y: e.center.y + e.radius }] : e.vertices;
			for (const p of pts) {
				minX = Math.min(minX, p.x); minY = Math.min(minY, p.y); maxX = Math.max(maxX, p.x); maxY = Math.max(maxY, p.y);
			}
		}
		expect(minX).toBeCloseTo(0, 6);
		expect(minY).toBeCloseTo(0, 6);
		expect(maxX).toBeCloseTo(artwork.board.widthMm, 5);
		expect(maxY).toBeCloseTo(artwork.board.lengthMm, 5);
		expect(dxf.header.$EXTMAX.x).toBeCloseTo(artwork.board.widthMm, 5);
		expect(dxf.header.$EXTMAX.y).toBeCloseTo(artwork.board.lengthMm, 5);
		expect(dxf.header.$EXTMIN.x).toBeCloseTo(0, 6);
	});

	it('writes a circular patch as a CIRCLE and a round-topped feed as a polyline with arc bulges', () => {
		const a = buildArtwork(sizedCase('circular', 'edge'));
		const dxf = parse(toDxf(a));
		const top = dxf.entities.filter((e: { layer: string }) => e.layer === 'COPPER-TOP');
		const circle = top.find((e: { type: string }) => e.type === 'CIRCLE');
		const patch = sizedCase('circular', 'edge').patch;
		if (patch.kind !== 'circular') throw new Error('expected circular');
		expect(circle.radius).toBeCloseTo(patch.radiusMm, 6);
		const feed = top.find((e: { type: string }) => e.type === 'LWPOLYLINE');
		const bulges = feed.vertices.filter((v: { bulge?: number }) => v.bulge).map((v: { bulge: number }) => v.bulge);
		// clockwise arc along the circle's underside: negative bulge (AutoCAD DXF reference, LWPOLYLINE group 42)
		expect(bulges.length).toBe(1);
		expect(bulges[0]).toBeLessThan(0);
	});

	it('gives byte-identical text for the same artwork twice in one process', () => {
		expect(toDxf(cases[0].artwork)).toBe(toDxf(cases[0].artwork));
	});
});
