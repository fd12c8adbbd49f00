// Closed contours made of straight and circular-arc segments: what Gerber regions, DXF polylines and SVG paths share.
import type { Point } from './point';

/** A straight segment from the previous end point to `to`. */
export interface LineSegment {
	readonly kind: 'line';
	readonly to: Point;
}

/**
 * A circular arc from the previous end point to `to` about `center`, turning clockwise or
 * counter-clockwise. Sweeps are below a full turn; a full circle is two half arcs.
 */
export interface ArcSegment {
	readonly kind: 'arc';
	readonly to: Point;
	readonly center: Point;
	readonly clockwise: boolean;
}

export type Segment = LineSegment | ArcSegment;

/**
 * A closed contour: starts at `start`, follows `segments`, and the last segment ends at `start`.
 * Outer contours run counter-clockwise, holes clockwise.
 */
export interface Contour {
	readonly start: Point;
	readonly segments: readonly Segment[];
}

/** Axis-aligned rectangle from its lower-left corner, counter-clockwise. */
export function createRectangleContour(xMm: number, yMm: number, widthMm: number, heightMm: number): Contour {
	return createPolygonContour([
		[xMm, yMm],
		[xMm + widthMm, yMm],
		[xMm + widthMm, yMm + heightMm],
		[xMm, yMm + heightMm]
	]);
}

/** Full circle as two counter-clockwise half arcs, starting at its rightmost point. */
export function createCircleContour(center: Point, radiusMm: number): Contour {
	const [cx, cy] = center;
	const right: Point = [cx + radiusMm, cy];
	const left: Point = [cx - radiusMm, cy];
	return {
		start: right,
		segments: [
			{ kind: 'arc', to: left, center, clockwise: false },
			{ kind: 'arc', to: right, center, clockwise: false }
		]
	};
}

/** Closed polygon through the given vertices (the closing edge is implied; a repeated first point is dropped). */
export function createPolygonContour(points: readonly Point[]): Contour {
	const pts = points.length > 1 && samePoint(points[0], points[points.length - 1]) ? points.slice(0, -1) : points;
	return { start: pts[0], segments: [...pts.slice(1), pts[0]].map((to) => ({ kind: 'line' as const, to })) };
}

/** The same contour walked the other way. */
export function reverseContour(contour: Contour): Contour {
	const points = [contour.start, ...contour.segments.map((s) => s.to)];
	const segments: Segment[] = [];
	for (let i = contour.segments.length - 1; i >= 0; i--) {
		const seg = contour.segments[i];
		const to = points[i];
		segments.push(seg.kind === 'line' ? { kind: 'line', to } : { kind: 'arc', to, center: seg.center, clockwise: !seg.clockwise });
	}
	return { start: contour.segments[contour.segments.length - 1].to, segments };
}

/** True when the contour only has straight segments. */
export function isPolygonContour(contour: Contour): boolean {
	return contour.segments.every((s) => s.kind === 'line');
}

/** Vertices of a straight contour (without repeating the start). */
export function contourVertices(contour: Contour): Point[] {
	return [contour.start, ...contour.segments.slice(0, -1).map((s) => s.to)];
}

function samePoint(a: Point, b: Point): boolean {
	return a[0] === b[0] && a[1] === b[1];
}
