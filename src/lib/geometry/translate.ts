// Moving contours and regions by an offset: arcs keep their sense, centres move with them.
import type { Contour, Segment } from './contour';
import type { Point } from './point';
import type { Region } from './region';

export function translatePoint(p: Point, dxMm: number, dyMm: number): Point {
	return [p[0] + dxMm, p[1] + dyMm];
}

export function translateContour(c: Contour, dxMm: number, dyMm: number): Contour {
	return {
		start: translatePoint(c.start, dxMm, dyMm),
		segments: c.segments.map((s): Segment =>
			s.kind === 'line' ? { kind: 'line', to: translatePoint(s.to, dxMm, dyMm) } : { kind: 'arc', to: translatePoint(s.to, dxMm, dyMm), center: translatePoint(s.center, dxMm, dyMm), clockwise: s.clockwise }
		)
	};
}

export function translateRegion(r: Region, dxMm: number, dyMm: number): Region {
	return { outer: translateContour(r.outer, dxMm, dyMm), holes: r.holes.map((h) => translateContour(h, dxMm, dyMm)) };
}
