// Exact inside test for a point against a shape bounded by segments and arcs: the winding number.
import type { Point } from '../geometry';
import type { BoundaryPiece } from './boundary-piece';

/**
 * Angle the piece subtends at p, signed. A line subtends its chord's angle; an arc subtends its
 * chord's angle plus a full turn (signed with the sweep) when p lies in the circular segment
 * between chord and arc, since arc + chord back then winds once around p.
 */
function subtendedRad(p: Point, piece: BoundaryPiece): number {
	const ax = piece.from[0] - p[0];
	const ay = piece.from[1] - p[1];
	const bx = piece.to[0] - p[0];
	const by = piece.to[1] - p[1];
	const chord = Math.atan2(ax * by - ay * bx, ax * bx + ay * by);
	if (piece.kind === 'line') return chord;
	const [cx, cy] = piece.center;
	if (Math.hypot(p[0] - cx, p[1] - cy) >= piece.radiusMm) return chord;
	const mid = piece.startRad + piece.sweepRad / 2;
	const mx = cx + piece.radiusMm * Math.cos(mid);
	const my = cy + piece.radiusMm * Math.sin(mid);
	const side = (q: Point) => (piece.to[0] - piece.from[0]) * (q[1] - piece.from[1]) - (piece.to[1] - piece.from[1]) * (q[0] - piece.from[0]);
	const inSegment = Math.sign(side(p)) === Math.sign(side([mx, my]));
	return inSegment ? chord + Math.sign(piece.sweepRad) * 2 * Math.PI : chord;
}

/** True when p lies in the filled part (inside the outer contour, outside every hole). Points on the boundary go either way. */
export function isPointInShape(p: Point, pieces: readonly BoundaryPiece[]): boolean {
	const byContour = new Map<number, number>();
	for (const piece of pieces) byContour.set(piece.contourIndex, (byContour.get(piece.contourIndex) ?? 0) + subtendedRad(p, piece));
	const winds = (i: number) => Math.abs(Math.round((byContour.get(i) ?? 0) / (2 * Math.PI))) % 2 === 1;
	if (!winds(0)) return false;
	for (const i of byContour.keys()) if (i !== 0 && winds(i)) return false;
	return true;
}
