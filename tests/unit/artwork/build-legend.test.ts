// The top legend: placed clear of copper, the patch's near field and the launch, inside the board, and stamped with the revision.
import { describe, expect, it } from 'vitest';
import { buildArtwork, revisionLegendText, shapeBounds, stampLegend, strokeTextWidthMm as textWidthMm, LEGEND_LAUNCH_KEEP_OUT, LEGEND_PATCH_KEEP_OUT_HEIGHTS, type Artwork } from '../../../src/lib/artwork';
import { checkArtwork } from '../../../src/lib/drc';
import { STANDARD_QUICK_TURN_PROFILE } from '../../../src/lib/schemas/fab-profile';
import { allShapeFeedCases, sizedCase } from '../../fixtures/designs/design-cases';

const H_MM = 1.524; // the fixture laminate's thickness
const withLegend = { solderMask: true, legend: {}, groundMarginMm: 8 } as const;
const legendOf = (a: Artwork) => a.layers.find((l) => l.id === 'legend-top')!;
const strokesOf = (a: Artwork) => legendOf(a).shapes.flatMap((s) => (s.geometry.kind === 'stroke' ? [{ id: s.id, points: s.geometry.points, w: s.geometry.strokeWidthMm }] : []));
/** Distance from a point to an axis-aligned box (0 inside). */
const toBox = (p: readonly [number, number], b: { minXMm: number; minYMm: number; maxXMm: number; maxYMm: number }) =>
	Math.hypot(Math.max(b.minXMm - p[0], 0, p[0] - b.maxXMm), Math.max(b.minYMm - p[1], 0, p[1] - b.maxYMm));

describe('the legend layer', () => {
	it.each(allShapeFeedCases)('on a $shape patch fed by $feed: every item placed, clean under the built-in profile', ({ shape, feed }) => {
		const a = buildArtwork(sizedCase(shape, feed, withLegend));
		const layer = legendOf(a);
		expect(layer.function).toEqual({ kind: 'legend', side: 'top' });
		expect(a.metadata.legend?.omitted).toEqual([]);
		expect(a.metadata.legend?.placed).toEqual(['feed-marker', 'name', 'revision', 'order-text', 'polarisation-mark']);
		expect(layer.voids.map((v) => v.role)).toEqual(['legend-slot']);
		// the legend rules (defaults: common practice, no source) hold, and nothing else fires
		expect(checkArtwork(a, STANDARD_QUICK_TURN_PROFILE)).toEqual([]);
	});

	it.each(allShapeFeedCases)('keeps ink 2 h from the $shape patch ($feed), clear of the feed, inside the board', ({ shape, feed }) => {
		const a = buildArtwork(sizedCase(shape, feed, withLegend));
		const top = a.layers.find((l) => l.id === 'copper-top')!;
		const patch = top.shapes.filter((s) => s.role === 'patch').map((s) => shapeBounds(s.geometry));
		const others = top.shapes.filter((s) => s.role !== 'patch').map((s) => shapeBounds(s.geometry));
		for (const s of strokesOf(a)) {
			for (const p of s.points) {
				for (const b of patch) expect(toBox(p, b) - s.w / 2).toBeGreaterThanOrEqual(LEGEND_PATCH_KEEP_OUT_HEIGHTS * H_MM - 1e-9);
				for (const b of others) expect(toBox(p, b) - s.w / 2).toBeGreaterThanOrEqual(0.3 - 1e-9);
				expect(Math.min(p[0], p[1], a.board.widthMm - p[0], a.board.lengthMm - p[1]) - s.w / 2).toBeGreaterThanOrEqual(0.4 - 1e-9);
			}
		}
	});

	it('keeps the launch free where an edge feed meets the board, and points the feed marker at the feed', () => {
		const a = buildArtwork(sizedCase('rectangular', 'inset', withLegend));
		const feedX = a.board.widthMm / 2;
		for (const s of strokesOf(a)) {
			for (const [x, y] of s.points) expect(Math.abs(x - feedX) < LEGEND_LAUNCH_KEEP_OUT.halfWidthMm && y < LEGEND_LAUNCH_KEEP_OUT.depthMm).toBe(false);
		}
		// the arrow's shaft runs from its tail to its tip; the feed point lies ahead of the tip
		const [tail, tip] = strokesOf(a).find((s) => s.id === 'legend-feed-marker-1')!.points;
		const ahead: [number, number] = [feedX - tip[0], 0 - tip[1]];
		const along = [tip[0] - tail[0], tip[1] - tail[1]];
		const cos = (ahead[0] * along[0] + ahead[1] * along[1]) / (Math.hypot(...ahead) * Math.hypot(along[0], along[1]));
		expect(cos).toBeGreaterThan(Math.SQRT1_2);
	});

	it('points the feed marker at the probe of a probe-fed patch', () => {
		const a = buildArtwork(sizedCase('circular', 'probe', withLegend));
		const probe = a.drills.find((d) => d.role === 'probe')!.center;
		const [tail, tip] = strokesOf(a).find((s) => s.id === 'legend-feed-marker-1')!.points;
		const ahead = [probe[0] - tip[0], probe[1] - tip[1]];
		const along = [tip[0] - tail[0], tip[1] - tail[1]];
		expect((ahead[0] * along[0] + ahead[1] * along[1]) / (Math.hypot(ahead[0], ahead[1]) * Math.hypot(along[0], along[1]))).toBeGreaterThan(Math.SQRT1_2);
	});

	it.each([
		// looking at the top side, the wave comes towards the viewer: RHCP turns counter-clockwise (IEEE Std 145 sense, from memory)
		{ handedness: 'rhcp' as const, sign: 1 },
		{ handedness: 'lhcp' as const, sign: -1 }
	])('turns the polarisation arrow of a $handedness patch the way its field turns', ({ handedness, sign }) => {
		const a = buildArtwork(sizedCase('truncated-corner', 'inset', { ...withLegend, handedness }));
		const arc = strokesOf(a).find((s) => s.id === 'legend-polarisation-mark-1')!.points;
		// the arc turns about its centre: the signed area it sweeps has the sense of rotation
		const c = [arc.reduce((x, p) => x + p[0], 0) / arc.length, arc.reduce((y, p) => y + p[1], 0) / arc.length];
		let turned = 0;
		for (let i = 1; i < arc.length; i++) turned += (arc[i - 1][0] - c[0]) * (arc[i][1] - c[1]) - (arc[i][0] - c[0]) * (arc[i - 1][1] - c[1]);
		expect(Math.sign(turned)).toBe(sign);
	});

	it('leaves out what does not fit on a board with a thin margin, and says so', () => {
		const a = buildArtwork(sizedCase('rectangular', 'probe', { solderMask: true, legend: {}, groundMarginMm: 1 }));
		expect(a.metadata.legend?.omitted.length).toBeGreaterThan(0);
		expect(checkArtwork(a, STANDARD_QUICK_TURN_PROFILE).filter((v) => v.ruleId.startsWith('legend'))).toEqual([]);
	});

	it('draws no legend and keeps the artwork as before when the document asks for none', () => {
		const a = buildArtwork(sizedCase('rectangular', 'inset', { solderMask: true }));
		expect(a.layers.some((l) => l.function.kind === 'legend')).toBe(false);
		expect(a.metadata.legend).toBeUndefined();
		expect(stampLegend(a, { revisionLabel: 'A', revisionDate: '2026-12-02' })).toBe(a);
	});
});

describe('stampLegend', () => {
	const a = buildArtwork(sizedCase('rectangular', 'inset', withLegend));
	const slot = shapeBounds(legendOf(a).voids[0].geometry);

	it.each([
		{ revisionLabel: 'B', revisionDate: '2026-12-02' },
		// a 16-character label is drawn narrower so that it stays in the box the design-rule check saw
		{ revisionLabel: 'Z9.8-7654321ABCD', revisionDate: '2107-12-31' }
	])('draws "REV $revisionLabel $revisionDate" inside the reserved box', (revision) => {
		const stamped = stampLegend(a, revision);
		const layer = legendOf(stamped);
		expect(layer.voids).toEqual([]);
		const rev = layer.shapes.filter((s) => s.id.startsWith('legend-revision-'));
		expect(rev.length).toBeGreaterThan(revisionLegendText(revision).replace(/ /g, '').length);
		for (const s of rev) {
			if (s.geometry.kind !== 'stroke') throw new Error('a revision mark is a stroke');
			for (const [x, y] of s.geometry.points) {
				expect(x).toBeGreaterThanOrEqual(slot.minXMm - 1e-3);
				expect(x).toBeLessThanOrEqual(slot.maxXMm + 1e-3);
				expect(y).toBeGreaterThanOrEqual(slot.minYMm - 1e-3);
				expect(y).toBeLessThanOrEqual(slot.maxYMm + 1e-3);
			}
		}
		// stamped or not, the check sees the same legend rules met
		expect(checkArtwork(stamped, STANDARD_QUICK_TURN_PROFILE)).toEqual([]);
	});

	it('reserves room for a four-character label at full width', () => {
		expect(slot.maxXMm - slot.minXMm).toBeCloseTo(textWidthMm('REV XXXX YYYY-MM-DD'.length, slot.maxYMm - slot.minYMm), 9);
	});
});
