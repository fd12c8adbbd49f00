// Exact contours for a circular patch meeting a straight feed: arcs kept as arcs, no flattening.
import type { Contour, Point } from '../geometry';

/**
 * The circle with a rectangular channel cut up from its bottom: the channel spans
 * x ∈ [cx − halfWidth, cx + halfWidth] and reaches up to y = topYMm. Counter-clockwise.
 * Needs halfWidth < r and topYMm above the circle at the channel's sides.
 */
export function circleWithChannelContour(center: Point, radiusMm: number, halfWidthMm: number, topYMm: number): Contour {
	const [cx, cy] = center;
	const sideY = cy - Math.sqrt(radiusMm * radiusMm - halfWidthMm * halfWidthMm);
	const right: Point = [cx + halfWidthMm, sideY];
	const left: Point = [cx - halfWidthMm, sideY];
	return {
		start: right,
		segments: [
			{ kind: 'arc', to: left, center, clockwise: false },
			{ kind: 'line', to: [cx - halfWidthMm, topYMm] },
			{ kind: 'line', to: [cx + halfWidthMm, topYMm] },
			{ kind: 'line', to: right }
		]
	};
}

/**
 * A strip of half width `halfWidthMm` from y = bottomYMm up to where it meets the circle's lower
 * arc, its top following that arc so strip and circle share an edge without overlapping. Counter-clockwise.
 */
export function stripUnderCircleContour(center: Point, radiusMm: number, halfWidthMm: number, bottomYMm: number): Contour {
	const [cx, cy] = center;
	const sideY = cy - Math.sqrt(radiusMm * radiusMm - halfWidthMm * halfWidthMm);
	const bl: Point = [cx - halfWidthMm, bottomYMm];
	return {
		start: bl,
		segments: [
			{ kind: 'line', to: [cx + halfWidthMm, bottomYMm] },
			{ kind: 'line', to: [cx + halfWidthMm, sideY] },
			{ kind: 'arc', to: [cx - halfWidthMm, sideY], center, clockwise: true },
			{ kind: 'line', to: bl }
		]
	};
}
