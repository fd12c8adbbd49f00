// Shortest distance between the boundaries of two shapes, with the closest points: exact on segments and arcs.
import type { BoundaryPiece } from './boundary-piece';
import { closestPair, type ClosestPair } from './piece-distance';

export function boundaryDistance(a: readonly BoundaryPiece[], b: readonly BoundaryPiece[]): ClosestPair | null {
	let best: ClosestPair | null = null;
	for (const pa of a) {
		for (const pb of b) {
			const c = closestPair(pa, pb);
			if (!best || c.distanceMm < best.distanceMm) best = c;
			if (best.distanceMm === 0) return best;
		}
	}
	return best;
}
