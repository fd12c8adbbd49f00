// A shape's boundary as exact pieces (straight segments and circular arcs), each knowing which side is copper.
import { arcSweepRad, contourArea, createCircleContour, type Contour, type Point } from '../geometry';
import type { ArtworkShape } from '../artwork';

interface PieceBase {
	readonly from: Point;
	readonly to: Point;
	/** +1 when the filled side is on the left of the direction of travel, −1 when on the right. */
	readonly fillSide: 1 | -1;
	/** Which contour of the shape (0 = outer) and the index along it: pieces next to each other are adjacent. */
	readonly contourIndex: number;
	readonly index: number;
	readonly contourLength: number;
}

export type BoundaryPiece =
	| (PieceBase & { readonly kind: 'line' })
	| (PieceBase & {
			readonly kind: 'arc';
			readonly center: Point;
			readonly radiusMm: number;
			/** Angle of `from` about the centre, radians. */
			readonly startRad: number;
			/** Signed sweep, positive counter-clockwise, |sweep| < 2π. */
			readonly sweepRad: number;
	  });

function contourPieces(contour: Contour, isOuter: boolean, contourIndex: number): BoundaryPiece[] {
	const area = contourArea(contour);
	// outer: filled inside (left of a counter-clockwise walk); hole: filled outside (left of a clockwise walk)
	const fillSide: 1 | -1 = isOuter === area > 0 ? 1 : -1;
	const pieces: BoundaryPiece[] = [];
	let from = contour.start;
	const contourLength = contour.segments.length;
	contour.segments.forEach((seg, index) => {
		if (seg.kind === 'line') {
			pieces.push({ kind: 'line', from, to: seg.to, fillSide, contourIndex, index, contourLength });
		} else {
			const [cx, cy] = seg.center;
			pieces.push({
				from,
				to: seg.to,
				fillSide,
				contourIndex,
				index,
				contourLength,
				kind: 'arc',
				center: seg.center,
				radiusMm: Math.hypot(from[0] - cx, from[1] - cy),
				startRad: Math.atan2(from[1] - cy, from[0] - cx),
				sweepRad: arcSweepRad(from, seg.to, seg.center, seg.clockwise)
			});
		}
		from = seg.to;
	});
	return pieces;
}

/** The boundary of a filled shape; an outline (the board profile) has no filled side and gives none. */
export function boundaryPieces(shape: ArtworkShape): BoundaryPiece[] {
	const g = shape.geometry;
	if (g.kind === 'circle') return contourPieces(createCircleContour(g.center, g.diameterMm / 2), true, 0);
	if (g.kind === 'region') return [g.region.outer, ...g.region.holes].flatMap((c, i) => contourPieces(c, i === 0, i));
	return [];
}

/** Two pieces of one contour that share an end point (consecutive, cyclically). */
export function arePiecesAdjacent(a: BoundaryPiece, b: BoundaryPiece): boolean {
	if (a.contourIndex !== b.contourIndex) return false;
	const n = a.contourLength;
	const d = Math.abs(a.index - b.index);
	return d === 1 || d === n - 1 || d === 0;
}

/** Unit normal pointing into the filled side at a point of the piece. */
export function inwardNormal(piece: BoundaryPiece, at: Point): Point {
	if (piece.kind === 'line') {
		const dx = piece.to[0] - piece.from[0];
		const dy = piece.to[1] - piece.from[1];
		const len = Math.hypot(dx, dy) || 1;
		return [(-dy / len) * piece.fillSide, (dx / len) * piece.fillSide];
	}
	const rx = at[0] - piece.center[0];
	const ry = at[1] - piece.center[1];
	const len = Math.hypot(rx, ry) || 1;
	// walking counter-clockwise the left side faces the centre; clockwise it faces away
	const left = piece.sweepRad > 0 ? -1 : 1;
	return [((left * rx) / len) * piece.fillSide, ((left * ry) / len) * piece.fillSide];
}

/** The point halfway along the piece. */
export function pieceMidpoint(piece: BoundaryPiece): Point {
	if (piece.kind === 'line') return [(piece.from[0] + piece.to[0]) / 2, (piece.from[1] + piece.to[1]) / 2];
	const a = piece.startRad + piece.sweepRad / 2;
	return [piece.center[0] + piece.radiusMm * Math.cos(a), piece.center[1] + piece.radiusMm * Math.sin(a)];
}
