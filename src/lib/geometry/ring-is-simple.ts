// Whether a closed polyline is simple: no two non-adjacent edges touch, no adjacent edges fold back.
import type { Point } from './point';

function orient(a: Point, b: Point, c: Point): number {
	return (b[0] - a[0]) * (c[1] - a[1]) - (b[1] - a[1]) * (c[0] - a[0]);
}

function onSegment(a: Point, b: Point, p: Point): boolean {
	return Math.min(a[0], b[0]) <= p[0] && p[0] <= Math.max(a[0], b[0]) && Math.min(a[1], b[1]) <= p[1] && p[1] <= Math.max(a[1], b[1]);
}

/** Segment intersection test including touching and collinear overlap (standard orientation test). */
export function segmentsIntersect(a: Point, b: Point, c: Point, d: Point): boolean {
	const o1 = orient(a, b, c);
	const o2 = orient(a, b, d);
	const o3 = orient(c, d, a);
	const o4 = orient(c, d, b);
	if (((o1 > 0 && o2 < 0) || (o1 < 0 && o2 > 0)) && ((o3 > 0 && o4 < 0) || (o3 < 0 && o4 > 0))) return true;
	if (o1 === 0 && onSegment(a, b, c)) return true;
	if (o2 === 0 && onSegment(a, b, d)) return true;
	if (o3 === 0 && onSegment(c, d, a)) return true;
	if (o4 === 0 && onSegment(c, d, b)) return true;
	return false;
}

/** O(n²) check; fine for the tens to thousands of vertices an antenna has. Vertices without the closing repeat. */
export function isSimpleRing(points: readonly Point[]): boolean {
	const n = points.length;
	if (n < 3) return false;
	for (let i = 0; i < n; i++) {
		const a = points[i];
		const b = points[(i + 1) % n];
		if (a[0] === b[0] && a[1] === b[1]) return false;
		for (let j = i + 1; j < n; j++) {
			const c = points[j];
			const d = points[(j + 1) % n];
			const adjacent = j === i + 1 || (i === 0 && j === n - 1);
			if (adjacent) {
				// adjacent edges share one vertex; they must not fold back onto each other
				const shared = j === i + 1 ? b : a;
				const other1 = j === i + 1 ? a : b;
				const other2 = j === i + 1 ? d : c;
				if (orient(other1, shared, other2) === 0 && (other2[0] - shared[0]) * (other1[0] - shared[0]) + (other2[1] - shared[1]) * (other1[1] - shared[1]) > 0) return false;
				continue;
			}
			if (segmentsIntersect(a, b, c, d)) return false;
		}
	}
	return true;
}
