// Exact piece distances against hand-worked geometry and against dense sampling (the brute-force reference).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { boundaryPieces, closestPair, isPointInShape, narrowestWidth, type BoundaryPiece } from '../../../src/lib/drc';
import type { ArtworkShape } from '../../../src/lib/artwork';
import type { Contour, Point } from '../../../src/lib/geometry';

/** Pieces of an open path given as a contour (only the listed segments are used). */
function piecesOf(contour: Contour): BoundaryPiece[] {
	const shape: ArtworkShape = { id: 's', role: 'patch', polarity: 'dark', geometry: { kind: 'region', region: { outer: contour, holes: [] } } };
	return boundaryPieces(shape);
}
const line = (a: Point, b: Point) => piecesOf({ start: a, segments: [{ kind: 'line', to: b }] })[0];
const arc = (from: Point, to: Point, center: Point, clockwise = false) => piecesOf({ start: from, segments: [{ kind: 'arc', to, center, clockwise }] })[0];

function samples(p: BoundaryPiece, n = 4000): Point[] {
	const out: Point[] = [];
	for (let k = 0; k <= n; k++) {
		const t = k / n;
		if (p.kind === 'line') out.push([p.from[0] + t * (p.to[0] - p.from[0]), p.from[1] + t * (p.to[1] - p.from[1])]);
		else {
			const a = p.startRad + t * p.sweepRad;
			out.push([p.center[0] + p.radiusMm * Math.cos(a), p.center[1] + p.radiusMm * Math.sin(a)]);
		}
	}
	return out;
}
/** Brute force: closest of sampled points on A to the exact closest point on B (upper bound, tight as n grows). */
function sampledDistance(a: BoundaryPiece, b: BoundaryPiece): number {
	let best = Infinity;
	const sa = samples(a, 400);
	const sb = samples(b, 400);
	for (const p of sa) for (const q of sb) best = Math.min(best, Math.hypot(p[0] - q[0], p[1] - q[1]));
	return best;
}

describe('closest pair of pieces (hand-worked)', () => {
	it.each([
		// parallel segments 1 mm apart, overlapping
		['segment–segment parallel', line([0, 0], [4, 0]), line([1, 1], [5, 1]), 1],
		// crossing segments
		['segment–segment crossing', line([0, 0], [2, 2]), line([0, 2], [2, 0]), 0],
		// end point to the interior of the other
		['segment–segment end to interior', line([0, 0], [4, 0]), line([2, 3], [2, 1]), 1],
		// quarter arc r=1 about the origin vs a segment on the diagonal beyond it: 2√2 − 1
		['segment–arc interior', line([2, 2], [3, 3]), arc([1, 0], [0, 1], [0, 0]), 2 * Math.SQRT2 - 1],
		// a horizontal segment under an upper half circle: the arc's ends are nearest (it bends away)
		['segment–arc ends', line([-3, -1], [3, -1]), arc([1, 0], [-1, 0], [0, 0]), 1],
		// the same segment under the lower half circle: the arc bottom touches y=-1 at 0 distance
		['segment–arc tangent', line([-3, -1], [3, -1]), arc([-1, 0], [1, 0], [0, 0]), 0],
		// a segment through the circle
		['segment–arc crossing', line([0, -2], [0, 2]), arc([1, 0], [-1, 0], [0, 0]), 0],
		// two unit circles' facing halves, centres 4 apart: 2
		['arc–arc facing', arc([-2, -1], [-2, 1], [-2, 0]), arc([2, 1], [2, -1], [2, 0]), 2],
		// concentric arcs r=1 and r=3 with overlapping sweeps: 2
		['arc–arc concentric', arc([1, 0], [0, 1], [0, 0]), arc([0, 3], [3, 0], [0, 0], true), 2],
		// concentric arcs with disjoint sweeps: nearest ends
		['arc–arc concentric apart', arc([1, 0], [0, 1], [0, 0]), arc([-3, 0], [0, -3], [0, 0]), Math.hypot(1, 3)],
		// overlapping circles cross
		['arc–arc crossing', arc([1, 0], [-1, 0], [0, 0]), arc([2.5, 0], [0.5, 0], [1.5, 0]), 0]
	])('%s', (_name, a, b, expected) => {
		const c = closestPair(a, b);
		expect(c.distanceMm).toBeCloseTo(expected, 12);
		expect(Math.hypot(c.onB[0] - c.onA[0], c.onB[1] - c.onA[1])).toBeCloseTo(c.distanceMm, 12);
		expect(closestPair(b, a).distanceMm).toBeCloseTo(expected, 12);
	});
});

const coord = fc.double({ min: -10, max: 10, noNaN: true });
const pointArb = fc.tuple(coord, coord) as fc.Arbitrary<Point>;
const lineArb = fc.tuple(pointArb, pointArb).filter(([a, b]) => Math.hypot(a[0] - b[0], a[1] - b[1]) > 1e-3).map(([a, b]) => line(a, b));
const arcArb = fc
	.record({ c: pointArb, r: fc.double({ min: 0.1, max: 8, noNaN: true }), a0: fc.double({ min: -Math.PI, max: Math.PI, noNaN: true }), sweep: fc.double({ min: 0.05, max: 6.2, noNaN: true }), cw: fc.boolean() })
	.map(({ c, r, a0, sweep, cw }) => {
		const a1 = a0 + (cw ? -sweep : sweep);
		return arc([c[0] + r * Math.cos(a0), c[1] + r * Math.sin(a0)], [c[0] + r * Math.cos(a1), c[1] + r * Math.sin(a1)], c, cw);
	});
const pieceArb = fc.oneof(lineArb, arcArb);

describe('closest pair of pieces (against dense sampling)', () => {
	it('never exceeds the sampled distance and stays within the sampling step of it', () => {
		fc.assert(
			fc.property(pieceArb, pieceArb, (a, b) => {
				const exact = closestPair(a, b).distanceMm;
				const sampled = sampledDistance(a, b);
				// the sampling step: at most the longest piece (≤ 2π·8 or 28 mm) over 400 steps, ≈ 0.126 mm
				expect(exact).toBeLessThanOrEqual(sampled + 1e-9);
				expect(sampled - exact).toBeLessThan(0.13);
			}),
			{ seed: 20261201, numRuns: 150 }
		);
	});
});

describe('inside test and width with arcs', () => {
	const circle: ArtworkShape = { id: 'c', role: 'patch', polarity: 'dark', geometry: { kind: 'circle', center: [0, 0], diameterMm: 2 } };
	it('finds points inside a circle exactly, including inside its circular segments', () => {
		const pieces = boundaryPieces(circle);
		expect(isPointInShape([0, 0.999], pieces)).toBe(true);
		expect(isPointInShape([0.7, -0.7], pieces)).toBe(true);
		expect(isPointInShape([0, 1.001], pieces)).toBe(false);
		expect(isPointInShape([0.71, 0.71], pieces)).toBe(false);
	});

	it('measures a strip under an arc across its straight sides', () => {
		// 1 mm wide strip from y = -5 up to the bottom of a circle r = 3 about the origin
		const sideY = -Math.sqrt(9 - 0.25);
		const strip = piecesOf({
			start: [-0.5, -5],
			segments: [
				{ kind: 'line', to: [0.5, -5] },
				{ kind: 'line', to: [0.5, sideY] },
				{ kind: 'arc', to: [-0.5, sideY], center: [0, 0], clockwise: true },
				{ kind: 'line', to: [-0.5, -5] }
			]
		});
		expect(narrowestWidth(strip)!.widthMm).toBeCloseTo(1, 12);
	});
});
