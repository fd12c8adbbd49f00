// Geometry primitives against closed forms (πr², rectangle area, circular-segment area) and polygon-clipping.
import { describe, expect, it } from 'vitest';
import {
	arcSweepRad,
	contourArea,
	contourBounds,
	createCircleContour,
	createPolygonContour,
	createRectangleContour,
	differenceRegions,
	flattenContour,
	isPointInRing,
	isSimpleRing,
	regionArea,
	reverseContour,
	unionRegions,
	GeometryError,
	CHORD_TOLERANCE_MM,
	type Contour
} from '../../../src/lib/geometry';

describe('contourArea', () => {
	it.each([
		// unit square, counter-clockwise
		{ name: 'a 10 × 4 rectangle', contour: createRectangleContour(1, 2, 10, 4), area: 40 },
		// πr² (any geometry text)
		{ name: 'a circle of radius 3', contour: createCircleContour([5, 5], 3), area: Math.PI * 9 },
		// half disc: r²π/2
		{
			name: 'a half disc of radius 2',
			contour: { start: [2, 0], segments: [{ kind: 'arc', to: [-2, 0], center: [0, 0], clockwise: false }, { kind: 'line', to: [2, 0] }] } as Contour,
			area: 2 * Math.PI
		}
	])('gives the closed-form area of $name', ({ contour, area }) => {
		expect(contourArea(contour)).toBeCloseTo(area, 10);
	});

	it('is negative for a clockwise contour', () => {
		expect(contourArea(reverseContour(createCircleContour([0, 0], 1)))).toBeCloseTo(-Math.PI, 10);
		expect(contourArea(reverseContour(createRectangleContour(0, 0, 2, 3)))).toBeCloseTo(-6, 12);
	});
});

describe('arcSweepRad', () => {
	it('sweeps +π/2 counter-clockwise and −3π/2 clockwise between the same quarter points', () => {
		expect(arcSweepRad([1, 0], [0, 1], [0, 0], false)).toBeCloseTo(Math.PI / 2, 12);
		expect(arcSweepRad([1, 0], [0, 1], [0, 0], true)).toBeCloseTo((-3 * Math.PI) / 2, 12);
	});
});

describe('flattenContour', () => {
	it('keeps every chord within the sagitta tolerance of the true circle', () => {
		const pts = flattenContour(createCircleContour([0, 0], 10));
		for (let i = 0; i < pts.length; i++) {
			const a = pts[i];
			const b = pts[(i + 1) % pts.length];
			const mid = Math.hypot((a[0] + b[0]) / 2, (a[1] + b[1]) / 2);
			expect(Math.abs(Math.hypot(a[0], a[1]) - 10)).toBeLessThan(1e-9);
			expect(10 - mid).toBeLessThanOrEqual(CHORD_TOLERANCE_MM * 1.0001);
		}
		expect(isSimpleRing(pts)).toBe(true);
	});
});

describe('contourBounds', () => {
	it('includes the extreme points a circle passes through', () => {
		expect(contourBounds(createCircleContour([5, 6], 2))).toEqual({ minXMm: 3, minYMm: 4, maxXMm: 7, maxYMm: 8 });
	});
});

describe('isSimpleRing', () => {
	it.each([
		// a square
		{ name: 'a square', ring: [[0, 0], [1, 0], [1, 1], [0, 1]], simple: true },
		// a bow tie crosses itself
		{ name: 'a bow tie', ring: [[0, 0], [1, 1], [1, 0], [0, 1]], simple: false },
		// a spike that folds back on itself
		{ name: 'a folded spike', ring: [[0, 0], [2, 0], [1, 0], [1, 1]], simple: false },
		// a repeated vertex gives a zero-length edge
		{ name: 'a zero-length edge', ring: [[0, 0], [1, 0], [1, 0], [0, 1]], simple: false }
	] as const)('says $simple for $name', ({ ring, simple }) => {
		expect(isSimpleRing(ring as unknown as [number, number][])).toBe(simple);
	});
});

describe('boolean operations through polygon-clipping', () => {
	const rect = (x: number, y: number, w: number, h: number) => ({ outer: createRectangleContour(x, y, w, h), holes: [] });

	it('cuts a notch out of a patch and keeps the area arithmetic exact', () => {
		const [cut] = differenceRegions([rect(0, 0, 10, 10)], [rect(4, -1, 2, 4)]);
		expect(regionArea(cut)).toBeCloseTo(100 - 6, 10);
		expect(contourArea(cut.outer)).toBeGreaterThan(0);
	});

	it('returns holes clockwise and the outer ring counter-clockwise', () => {
		const [withHole] = differenceRegions([rect(0, 0, 10, 10)], [rect(2, 2, 1, 1)]);
		expect(withHole.holes.length).toBe(1);
		expect(contourArea(withHole.holes[0])).toBeLessThan(0);
		expect(regionArea(withHole)).toBeCloseTo(99, 10);
	});

	it('unions abutting rectangles into one region', () => {
		expect(unionRegions([rect(0, 0, 1, 1)], [rect(1, 0, 1, 1)]).length).toBe(1);
	});

	it('refuses arcs rather than flattening them silently', () => {
		expect(() => unionRegions([{ outer: createCircleContour([0, 0], 1), holes: [] }])).toThrow(GeometryError);
	});
});

describe('isPointInRing', () => {
	it('finds the centre inside and a far point outside', () => {
		const ring = flattenContour(createPolygonContour([[0, 0], [4, 0], [4, 4], [0, 4]]));
		expect(isPointInRing([2, 2], ring)).toBe(true);
		expect(isPointInRing([5, 2], ring)).toBe(false);
	});
});
