// The narrowest width of one shape: the shortest span across it between two of its own boundary pieces.
import type { Point } from '../geometry';
import { arePiecesAdjacent, inwardNormal, type BoundaryPiece } from './boundary-piece';
import { closestPair } from './piece-distance';

/**
 * A span only counts when it crosses the shape face to face: from each end it must leave within
 * 60° of the inward normal. That skips the zero-length "widths" at corners and along collinear
 * pieces of one straight edge (cos 60° = 0.5; common practice, no source).
 */
const FACING_COSINE = 0.5;

export interface ShapeWidth {
	readonly widthMm: number;
	readonly from: Point;
	readonly to: Point;
}

/**
 * Narrowest face-to-face span between two non-adjacent pieces. `counts` can leave out pieces
 * (a feed line's ends, where it joins other copper, are not edges a fab etches). Null when no
 * pair faces each other (a full circle: its width is its diameter, measured by its caller).
 */
export function narrowestWidth(pieces: readonly BoundaryPiece[], counts: (piece: BoundaryPiece) => boolean = () => true): ShapeWidth | null {
	let best: ShapeWidth | null = null;
	const edges = pieces.filter(counts);
	for (let i = 0; i < edges.length; i++) {
		for (let j = i + 1; j < edges.length; j++) {
			const a = edges[i];
			const b = edges[j];
			if (arePiecesAdjacent(a, b)) continue;
			const c = closestPair(a, b);
			if (c.distanceMm > 0) {
				const ux = (c.onB[0] - c.onA[0]) / c.distanceMm;
				const uy = (c.onB[1] - c.onA[1]) / c.distanceMm;
				const na = inwardNormal(a, c.onA);
				const nb = inwardNormal(b, c.onB);
				if (ux * na[0] + uy * na[1] < FACING_COSINE || -(ux * nb[0] + uy * nb[1]) < FACING_COSINE) continue;
			}
			if (!best || c.distanceMm < best.widthMm) best = { widthMm: c.distanceMm, from: c.onA, to: c.onB };
		}
	}
	return best;
}
