// Even–odd point-in-polygon test (crossing number), for containment checks.
import type { Point } from './point';

/** True when `p` is strictly inside the ring; points on an edge may go either way. */
export function isPointInRing(p: Point, ring: readonly Point[]): boolean {
	let inside = false;
	for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
		const [xi, yi] = ring[i];
		const [xj, yj] = ring[j];
		if (yi > p[1] !== yj > p[1] && p[0] < ((xj - xi) * (p[1] - yi)) / (yj - yi) + xi) inside = !inside;
	}
	return inside;
}
