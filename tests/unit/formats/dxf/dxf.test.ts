// DXF files read back with dxf-parser 1.1 (the outside reference): layers, entity counts, units and extents.
import DxfParser from 'dxf-parser';
import { describe, expect, it } from 'vitest';
import { buildArtwork } from '../../../../src/lib/artwork';
import { buildDxfCommands, DXF_DIMENSION_LAYER, DXF_TITLE_LAYER, dxfLayerName, toDxf } from '../../../../src/lib/formats/dxf';
import { createExportMeta } from '../../../../src/lib/formats/export-meta';
import { FIRST_PASS_CAUTION } from '../../../../src/lib/formats/drawing-sheet';
import { allShapeFeedCases, sizedCase } from '../../../fixtures/designs/design-cases';

const cases = allShapeFeedCases.map((c) => ({ ...c, artwork: buildArtwork(sizedCase(c.shape, c.feed, { solderMask: true })) }));

 
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

	it.each(cases)('with the revision meta, adds the dimensions and title block of a $shape / $feed design on FF-DIMENSIONS and FF-TITLE', ({ artwork }) => {
		const meta = createExportMeta({ designName: 'Sunroof GNSS', revisionLabel: 'B', revisionDate: '2026-11-20' });
		const plain = parse(toDxf(artwork));
		const dxf = parse(toDxf(artwork, meta));
		const layerNames = Object.keys(dxf.tables.layer.layers);
		expect(layerNames).toContain(DXF_DIMENSION_LAYER);
		expect(layerNames).toContain(DXF_TITLE_LAYER);
		// the board layers' entities are the same with and without the sheet
		const board = (d: { entities: { layer: string }[] }) => d.entities.filter((e) => e.layer !== DXF_DIMENSION_LAYER && e.layer !== DXF_TITLE_LAYER).map(({ handle, ...rest }: { handle?: string; layer: string }) => (void handle, rest));
		expect(board(dxf)).toEqual(board(plain));
		// every dimension's TEXT carries its label and value to 0.01 mm (no profile: the default resolution)
		const texts = (layer: string) => dxf.entities.filter((e: { type: string; layer: string }) => e.type === 'TEXT' && e.layer === layer).map((e: { text: string }) => e.text);
		const dimTexts = texts(DXF_DIMENSION_LAYER);
		for (const d of artwork.dimensions) expect(dimTexts).toContain(`${d.label} ${d.valueMm.toFixed(2)}`);
		expect(dimTexts).toContain('A');
		const title = texts(DXF_TITLE_LAYER);
		expect(title).toContain('Sunroof GNSS');
		expect(title).toContain('Revision B · 2026-11-20');
		expect(title).toContain(FIRST_PASS_CAUTION);
		// lines only besides the texts; the extents now cover the sheet around the board
		for (const e of dxf.entities.filter((e: { layer: string }) => e.layer === DXF_DIMENSION_LAYER || e.layer === DXF_TITLE_LAYER)) expect(['LINE', 'TEXT']).toContain(e.type);
		expect(dxf.header.$EXTMIN.x).toBeLessThan(0);
		expect(dxf.header.$EXTMIN.y).toBeLessThan(0);
		expect(dxf.header.$EXTMAX.y).toBeGreaterThan(artwork.board.lengthMm);
	});

	it.each(cases)('leaves room between the TEXT entities of a $shape / $feed drawing, read at a CAD font’s width', ({ artwork }) => {
		const meta = createExportMeta({ designName: 'Sunroof GNSS', revisionLabel: 'B', revisionDate: '2026-11-20' });
		const dxf = parse(toDxf(artwork, meta));
		// a single-stroke CAD font advances about one text height per character (from memory); TEXT height is group 40
		const boxes = dxf.entities
			.filter((e: { type: string }) => e.type === 'TEXT')
			.map((e: { text: string; startPoint: { x: number; y: number }; textHeight: number }) => ({
				text: e.text,
				x0: e.startPoint.x,
				y0: e.startPoint.y,
				x1: e.startPoint.x + [...e.text].length * e.textHeight,
				y1: e.startPoint.y + e.textHeight
			}));
		expect(boxes.length).toBeGreaterThan(artwork.dimensions.length);
		const overlaps: string[] = [];
		for (let i = 0; i < boxes.length; i++)
			for (let j = i + 1; j < boxes.length; j++) {
				const [a, b] = [boxes[i], boxes[j]];
				if (a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1) overlaps.push(`${a.text} × ${b.text}`);
			}
		expect(overlaps).toEqual([]);
		for (const b of boxes) expect(b.x1 <= dxf.header.$EXTMAX.x + 1e-6 && b.y1 <= dxf.header.$EXTMAX.y + 1e-6, b.text).toBe(true);
	});

	it('gives byte-identical text for the same artwork twice in one process', () => {
		expect(toDxf(cases[0].artwork)).toBe(toDxf(cases[0].artwork));
	});
});
