// A design's connector launch read back from the files the writers make, with @tracespace/parser 5.0.0-next.0 (the
// outside reference): the edge launch's pads from the top-copper Gerber and its vias from the plated Excellon file, the
// back-side pad from the bottom-copper Gerber and the flange holes from the drill file, each within 1 µm.
import { createParser } from '@tracespace/parser';
import { describe, expect, it } from 'vitest';
import { buildArtwork, type Artwork } from '../../../../src/lib/artwork';
import { createExportMeta } from '../../../../src/lib/formats/export-meta';
import { toExcellon } from '../../../../src/lib/formats/excellon';
import { toGerber } from '../../../../src/lib/formats/gerber';
import { sizedCase } from '../../../fixtures/designs/design-cases';
import { readBackGerber, type ReadRegion } from '../gerber/read-back';

const UM = 1e-3;
const meta = createExportMeta({ designName: 'Launch read-back', revisionLabel: 'A', revisionDate: '2026-12-02' });

/** The box of a read-back region drawn of straight lines: [minX, minY, maxX, maxY]. */
function boxOf(region: ReadRegion): [number, number, number, number] {
	const pts = region.contour.flatMap((s) => [s.from, s.to]);
	return [Math.min(...pts.map((p) => p[0])), Math.min(...pts.map((p) => p[1])), Math.max(...pts.map((p) => p[0])), Math.max(...pts.map((p) => p[1]))];
}

function drillHits(text: string): { x: number; y: number; d: number; fn: string }[] {
	const p = createParser();
	p.feed(text);
	const tree = p.results();
	expect(tree.done).toBe(true);
	const tools = new Map<string, { d: number; fn: string }>();
	let pendingFn = '';
	let tool = '';
	const hits: { x: number; y: number; d: number; fn: string }[] = [];
	for (const n of tree.children) {
		if (n.type === 'comment' && n.comment.includes('TA.AperFunction')) pendingFn = n.comment;
		if (n.type === 'toolDefinition' && n.shape.type === 'circle') tools.set(n.code, { d: n.shape.diameter, fn: pendingFn });
		if (n.type === 'toolChange') tool = n.code;
		if (n.type === 'graphic') hits.push({ x: Number(n.coordinates.x), y: Number(n.coordinates.y), d: tools.get(tool)!.d, fn: tools.get(tool)!.fn });
	}
	return hits;
}

const edge: Artwork = buildArtwork(sizedCase('rectangular', 'inset', { launch: { kind: 'edge', lengthMm: 4, groundWidthMm: 2.5, viaDrillMm: 0.35, viaPitchMm: 0.9, viaRows: 2, viaInsetMm: 0.6 } }));

describe('an edge launch read back', () => {
	it('draws the signal pad and both ground pads in the top-copper Gerber at their dimensions, within 1 µm', () => {
		const launch = edge.metadata.launch!;
		if (launch.kind !== 'edge') throw new Error('expected an edge launch');
		const top = edge.layers.find((l) => l.id === 'copper-top')!;
		const read = readBackGerber(toGerber(edge, 'copper-top', meta));
		const boxes = read.regions.filter((r) => r.polarity === 'dark').map(boxOf);
		const signal = top.shapes.find((s) => s.id === 'launch-signal')!;
		expect(signal).toBeDefined();
		const xc = edge.board.widthMm / 2;
		const half = launch.signalWidthMm / 2;
		const want: [number, number, number, number][] = [
			[xc - half, 0, xc + half, 4],
			[xc - half - launch.gapMm - 2.5, 0, xc - half - launch.gapMm, 4],
			[xc + half + launch.gapMm, 0, xc + half + launch.gapMm + 2.5, 4]
		];
		for (const w of want) {
			const hit = boxes.find((b) => b.every((v, i) => Math.abs(v - w[i]) < UM));
			expect(hit, `a region at ${w.map((v) => v.toFixed(4)).join(', ')}`).toBeDefined();
		}
		// the gap read back is the solved gap: ground pad's inner edge to the signal pad's edge
		const right = boxes.find((b) => Math.abs(b[0] - want[2][0]) < UM)!;
		const sig = boxes.find((b) => Math.abs(b[0] - want[0][0]) < UM && Math.abs(b[3] - 4) < UM)!;
		expect(Math.abs(right[0] - sig[2] - launch.gapMm)).toBeLessThan(UM);
	});

	it('lists every via in the plated drill file at its place and size, as a via drill (Gerber X2 §5.6.10 ViaDrill), within 1 µm', () => {
		const vias = edge.drills.filter((d) => d.role === 'launch-via');
		// 4 mm of pad at a 0.9 mm pitch: 4 vias along, 2 rows, 2 pads
		expect(vias.length).toBe(16);
		const hits = drillHits(toExcellon(edge, true, meta));
		expect(hits.length).toBe(vias.length);
		for (const v of vias) {
			const hit = hits.find((h) => Math.abs(h.x - v.center[0]) < UM && Math.abs(h.y - v.center[1]) < UM);
			expect(hit, v.id).toBeDefined();
			expect(Math.abs(hit!.d - 0.35)).toBeLessThan(UM);
			expect(hit!.fn).toContain('ViaDrill');
		}
		// the first row sits viaInsetMm out from the gap edge, the second a pitch further
		const launch = edge.metadata.launch!;
		if (launch.kind !== 'edge') throw new Error('expected an edge launch');
		const gapEdge = edge.board.widthMm / 2 + launch.signalWidthMm / 2 + launch.gapMm;
		const xs = [...new Set(hits.filter((h) => h.x > edge.board.widthMm / 2).map((h) => h.x.toFixed(4)))].map(Number).sort((a, b) => a - b);
		expect(xs.length).toBe(2);
		expect(Math.abs(xs[0] - gapEdge - 0.6)).toBeLessThan(UM);
		expect(Math.abs(xs[1] - xs[0] - 0.9)).toBeLessThan(UM);
	});
});

describe('a back-side launch read back', () => {
	it('draws the square ground pad in the bottom-copper Gerber before the anti-pad that clears it', () => {
		const a = buildArtwork(sizedCase('rectangular', 'probe', { launch: { kind: 'back', padSideMm: 7.5 } }));
		const pin = a.drills.find((d) => d.role === 'probe')!;
		const read = readBackGerber(toGerber(a, 'copper-bottom', meta));
		const pad = read.regions.filter((r) => r.polarity === 'dark').map(boxOf).find((b) => Math.abs(b[2] - b[0] - 7.5) < UM);
		expect(pad).toBeDefined();
		expect(Math.abs((pad![0] + pad![2]) / 2 - pin.center[0])).toBeLessThan(UM);
		expect(Math.abs((pad![1] + pad![3]) / 2 - pin.center[1])).toBeLessThan(UM);
		const antiPad = read.flashes.find((f) => f.polarity === 'clear');
		expect(antiPad).toBeDefined();
		expect(Math.abs(antiPad!.diameterMm - 4.1)).toBeLessThan(UM);
		// the clear flash comes after the pad, so it opens the pad too
		expect(read.tree.children.findIndex((n) => n.type === 'loadPolarity' && n.polarity === 'clear')).toBeGreaterThan(0);
	});

	it('lists the four plated flange holes on their square, centred on the pin, within 1 µm', () => {
		const a = buildArtwork(sizedCase('rectangular', 'probe', { launch: { kind: 'back', mount: 'flange', flangeDrillMm: 2.2, flangeSpacingMm: 9 } }));
		const [px, py] = a.drills.find((d) => d.role === 'probe')!.center;
		const hits = drillHits(toExcellon(a, true, meta)).filter((h) => Math.abs(h.d - 2.2) < UM);
		expect(hits.length).toBe(4);
		for (const [sx, sy] of [[-1, -1], [1, -1], [1, 1], [-1, 1]]) {
			expect(hits.some((h) => Math.abs(h.x - (px + sx * 4.5)) < UM && Math.abs(h.y - (py + sy * 4.5)) < UM)).toBe(true);
		}
		expect(hits.every((h) => h.fn.includes('ComponentDrill'))).toBe(true);
	});
});
