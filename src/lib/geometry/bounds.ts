// Axis-aligned bounds of contours, counting the extreme points an arc passes through.
import { arcSweepRad } from './arc-sweep';
import type { Contour } from './contour';
import type { Point } from './point';

export interface Bounds {
	readonly minXMm: number;
	readonly minYMm: number;
	readonly maxXMm: number;
	readonly maxYMm: number;
}

export const emptyBounds: Bounds = { minXMm: Infinity, minYMm: Infinity, maxXMm: -Infinity, maxYMm: -Infinity };

export function boundsOfPoints(points: readonly Point[], start: Bounds = emptyBounds): Bounds {
	let { minXMm, minYMm, maxXMm, maxYMm } = start;
	for (const [x, y] of points) {
		minXMm = Math.min(minXMm, x);
		minYMm = Math.min(minYMm, y);
		maxXMm = Math.max(maxXMm, x);
		maxYMm = Math.max(maxYMm, y);
	}
	return { minXMm, minYMm, maxXMm, maxYMm };
}

export function mergeBounds(a: Bounds, b: Bounds): Bounds {
	return {
		minXMm: Math.min(a.minXMm, b.minXMm),
		minYMm: Math.min(a.minYMm, b.minYMm),
		maxXMm: Math.max(a.maxXMm, b.maxXMm),
		maxYMm: Math.max(a.maxYMm, b.maxYMm)
	};
}

/** Bounds of a contour: its vertices plus every axis crossing (0°, 90°, 180°, 270°) inside an arc's sweep. */
export function contourBounds(contour: Contour): Bounds {
	const points: Point[] = [contour.start];
	let from = contour.start;
	for (const seg of contour.segments) {
		points.push(seg.to);
		if (seg.kind === 'arc') {
			const [cx, cy] = seg.center;
			const r = Math.hypot(from[0] - cx, from[1] - cy);
			const sweep = arcSweepRad(from, seg.to, seg.center, seg.clockwise);
			const a0 = Math.atan2(from[1] - cy, from[0] - cx);
			for (let k = 0; k < 4; k++) {
				const axis = (k * Math.PI) / 2;
				let rel = (axis - a0) % (2 * Math.PI);
				if (sweep > 0) {
					if (rel < 0) rel += 2 * Math.PI;
					if (rel <= sweep) points.push([cx + r * Math.cos(axis), cy + r * Math.sin(axis)]);
				} else {
					if (rel > 0) rel -= 2 * Math.PI;
					if (rel >= sweep) points.push([cx + r * Math.cos(axis), cy + r * Math.sin(axis)]);
				}
			}
		}
		from = seg.to;
	}
	return boundsOfPoints(points);
}
