// What the drawing dimensions: each span lies on the geometry the artwork draws (the shape's own bounds, the drill's
// centre), and its value is the sized quantity.
import { describe, expect, it } from 'vitest';
import { buildArtwork, type Artwork, type ArtworkDimension, type ArtworkShape } from '../../../src/lib/artwork';
import { contourBounds, type Bounds } from '../../../src/lib/geometry';
import { sizedCase } from '../../fixtures/designs/design-cases';
import { layeredCases } from '../../fixtures/designs/layered-cases';
import { sizeDocument } from '../../fixtures/designs/size-document';

const boundsOf = (s: ArtworkShape): Bounds => {
	const g = s.geometry;
	if (g.kind === 'circle') return { minXMm: g.center[0] - g.diameterMm / 2, minYMm: g.center[1] - g.diameterMm / 2, maxXMm: g.center[0] + g.diameterMm / 2, maxYMm: g.center[1] + g.diameterMm / 2 };
	if (g.kind === 'stroke') {
		const xs = g.points.map((p) => p[0]);
		const ys = g.points.map((p) => p[1]);
		return { minXMm: Math.min(...xs), minYMm: Math.min(...ys), maxXMm: Math.max(...xs), maxYMm: Math.max(...ys) };
	}
	return contourBounds(g.kind === 'region' ? g.region.outer : g.contour);
};
const shape = (a: Artwork, id: string) => a.layers.flatMap((l) => l.shapes).find((s) => s.id === id)!;
const dim = (a: Artwork, id: ArtworkDimension['id']) => {
	const d = a.dimensions.find((x) => x.id === id);
	expect(d, id).toBeDefined();
	return d!;
};
/** A horizontal span [x0, x1] or a vertical one [y0, y1]. */
const spanX = (d: ArtworkDimension) => [Math.min(d.from[0], d.to[0]), Math.max(d.from[0], d.to[0])];
const spanY = (d: ArtworkDimension) => [Math.min(d.from[1], d.to[1]), Math.max(d.from[1], d.to[1])];

describe('buildDimensions', () => {
	it('measures the probe centre from datum A, the board corner (0, 0), where the drill is', () => {
		const a = buildArtwork(sizedCase('rectangular', 'probe'));
		const [x, y] = a.drills[0].center;
		const px = dim(a, 'probe-x');
		const py = dim(a, 'probe-y');
		expect(px.from).toEqual([0, 0]);
		expect(py.from).toEqual([0, 0]);
		expect(px.valueMm).toBeCloseTo(x, 9);
		expect(py.valueMm).toBeCloseTo(y, 9);
		expect(spanX(px)[1]).toBeCloseTo(x, 9);
		expect(spanY(py)[1]).toBeCloseTo(y, 9);
	});

	it('measures the inset notch: its gap beside the feed line and its depth into the patch', () => {
		const sized = sizedCase('rectangular', 'inset');
		if (sized.feed.kind !== 'inset') throw new Error('expected an inset feed');
		const a = buildArtwork(sized);
		const notch = boundsOf(a.layers[0].voids.find((v) => v.id === 'notch-right')!);
		const g = dim(a, 'notch-gap');
		expect(g.valueMm).toBeCloseTo(sized.feed.notchGapMm, 9);
		expect(spanX(g)[0]).toBeCloseTo(notch.minXMm, 9);
		expect(spanX(g)[1]).toBeCloseTo(notch.maxXMm, 9);
		const y0 = dim(a, 'inset-depth');
		expect(y0.valueMm).toBeCloseTo(sized.feed.insetDepthMm, 9);
		expect(spanY(y0)[1]).toBeCloseTo(notch.maxYMm, 9);
	});

	it('measures a corner cut along the top edge of the corner-cut patch', () => {
		const sized = sizedCase('truncated-corner', 'inset');
		if (sized.patch.kind !== 'truncated-corner') throw new Error('expected a corner-cut patch');
		const a = buildArtwork(sized);
		const patch = boundsOf(shape(a, 'patch'));
		const c = dim(a, 'corner-cut');
		expect(c.valueMm).toBeCloseTo(sized.patch.truncationLegMm, 9);
		expect(c.from[1]).toBeCloseTo(patch.maxYMm, 9);
	});

	it('measures the quarter-wave section where it is drawn', () => {
		const a = buildArtwork(sizedCase('rectangular', 'quarter-wave'));
		const t = boundsOf(shape(a, 'transformer'));
		expect(spanY(dim(a, 'transformer-length'))).toEqual([t.minYMm, t.maxYMm].map((v) => expect.closeTo(v, 9)));
		expect(spanX(dim(a, 'transformer-width'))).toEqual([t.minXMm, t.maxXMm].map((v) => expect.closeTo(v, 9)));
	});

	it('measures an aperture’s slot in the ground and the stub past it', () => {
		const a = buildArtwork(sizeDocument(layeredCases.find((c) => c.name === 'aperture-coupled patch')!.doc));
		const slot = boundsOf(shape(a, 'coupling-slot'));
		expect(spanX(dim(a, 'slot-length'))).toEqual([slot.minXMm, slot.maxXMm].map((v) => expect.closeTo(v, 9)));
		expect(spanY(dim(a, 'slot-width'))).toEqual([slot.minYMm, slot.maxYMm].map((v) => expect.closeTo(v, 9)));
		const stub = boundsOf(shape(a, 'tuning-stub'));
		expect(spanY(dim(a, 'stub-length'))).toEqual([stub.minYMm, stub.maxYMm].map((v) => expect.closeTo(v, 9)));
	});

	it('measures a stacked parasitic patch and, in an array, the pitch between neighbouring patches', () => {
		const a = buildArtwork(sizeDocument(layeredCases.find((c) => c.name === '2×2 stacked parasitic array')!.doc));
		const parasitics = a.layers.flatMap((l) => l.shapes).filter((s) => s.role === 'parasitic-patch').map(boundsOf);
		// the upper right one
		const p = parasitics.reduce((best, b) => (b.maxXMm + b.maxYMm > best.maxXMm + best.maxYMm ? b : best));
		expect(spanX(dim(a, 'parasitic-width'))).toEqual([p.minXMm, p.maxXMm].map((v) => expect.closeTo(v, 9)));
		expect(spanY(dim(a, 'parasitic-length'))).toEqual([p.minYMm, p.maxYMm].map((v) => expect.closeTo(v, 9)));
		const patches = a.layers.flatMap((l) => l.shapes).filter((s) => s.role === 'patch').map(boundsOf);
		const xs = [...new Set(patches.map((b) => Number(b.minXMm.toFixed(6))))].sort((u, v) => u - v);
		const ys = [...new Set(patches.map((b) => Number(b.minYMm.toFixed(6))))].sort((u, v) => u - v);
		expect(dim(a, 'pitch-x').valueMm).toBeCloseTo(xs[1] - xs[0], 5);
		expect(dim(a, 'pitch-y').valueMm).toBeCloseTo(ys[1] - ys[0], 5);
	});

	it('gives a single element no pitch and a probe feed no feed width', () => {
		const a = buildArtwork(sizedCase('circular', 'probe'));
		const ids = a.dimensions.map((d) => d.id);
		expect(ids).not.toContain('pitch-x');
		expect(ids).not.toContain('feed-width');
		expect(ids).toEqual(expect.arrayContaining(['patch-diameter', 'probe-x', 'probe-y', 'ground-width', 'ground-length']));
	});
});
