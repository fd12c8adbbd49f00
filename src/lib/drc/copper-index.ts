// A static spatial index (flatbush) over copper shapes' bounding boxes: each check compares a shape only with its neighbours.
import Flatbush from 'flatbush';
import { LENGTH_EPSILON_MM, type Point } from '../geometry';
import type { BoundaryPiece } from './boundary-piece';

/** Axis-aligned box in mm. */
export interface PieceBox {
	readonly minXMm: number;
	readonly minYMm: number;
	readonly maxXMm: number;
	readonly maxYMm: number;
}

/**
 * A box that holds every piece: segment ends, and an arc's whole circle (a little larger than the arc,
 * never smaller, so a neighbour is never missed; the exact distance decides afterwards). Null for no pieces.
 */
export function boxOfPieces(pieces: readonly BoundaryPiece[]): PieceBox | null {
	if (pieces.length === 0) return null;
	let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
	const add = (x: number, y: number) => {
		if (x < minX) minX = x;
		if (y < minY) minY = y;
		if (x > maxX) maxX = x;
		if (y > maxY) maxY = y;
	};
	for (const p of pieces) {
		add(p.from[0], p.from[1]);
		add(p.to[0], p.to[1]);
		if (p.kind === 'arc') {
			add(p.center[0] - p.radiusMm, p.center[1] - p.radiusMm);
			add(p.center[0] + p.radiusMm, p.center[1] + p.radiusMm);
		}
	}
	return { minXMm: minX, minYMm: minY, maxXMm: maxX, maxYMm: maxY };
}

export interface ShapeIndex {
	/** Indices (ascending) of the shapes whose box comes within `marginMm` of shape i's box; i itself left out. */
	neighboursOf(i: number, marginMm: number): number[];
	/** Indices (ascending) of the shapes whose box comes within `marginMm` of the point. */
	near(p: Point, marginMm: number): number[];
}

/**
 * Two shapes closer than d have boxes closer than d on both axes, and a point inside (or within d of)
 * a shape lies inside (or within d of) its box: querying the boxes grown by d finds every candidate.
 */
export function createShapeIndex(shapes: readonly (readonly BoundaryPiece[])[]): ShapeIndex {
	const boxes = shapes.map(boxOfPieces);
	const listed = boxes.flatMap((b, i) => (b ? [i] : []));
	const index = listed.length > 0 ? new Flatbush(listed.length) : null;
	if (index) {
		for (const i of listed) {
			const b = boxes[i]!;
			index.add(b.minXMm, b.minYMm, b.maxXMm, b.maxYMm);
		}
		index.finish();
	}
	// a nanometre of slack on every query, so round-off in the grown box never drops a candidate
	const s = LENGTH_EPSILON_MM;
	const search = (minX: number, minY: number, maxX: number, maxY: number): number[] =>
		index ? index.search(minX - s, minY - s, maxX + s, maxY + s).map((k) => listed[k]).sort((a, b) => a - b) : [];
	return {
		neighboursOf(i, marginMm) {
			const b = boxes[i];
			if (!b) return [];
			return search(b.minXMm - marginMm, b.minYMm - marginMm, b.maxXMm + marginMm, b.maxYMm + marginMm).filter((j) => j !== i);
		},
		near(p, marginMm) {
			return search(p[0] - marginMm, p[1] - marginMm, p[0] + marginMm, p[1] + marginMm);
		}
	};
}
