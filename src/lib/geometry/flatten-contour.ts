// Turns a contour into a polyline whose chords stay within a sagitta tolerance of the true arcs.
import { arcSweepRad } from './arc-sweep';
import type { Contour } from './contour';
import type { Point } from './point';
import { CHORD_TOLERANCE_MM } from './tolerance';

/** Vertices of the flattened contour, first point not repeated at the end. */
export function flattenContour(contour: Contour, chordToleranceMm = CHORD_TOLERANCE_MM): Point[] {
	const out: Point[] = [contour.start];
	let from = contour.start;
	for (const seg of contour.segments) {
		if (seg.kind === 'arc') {
			const [cx, cy] = seg.center;
			const r = Math.hypot(from[0] - cx, from[1] - cy);
			const sweep = arcSweepRad(from, seg.to, seg.center, seg.clockwise);
			// sagitta s = r(1 − cos(φ/2)) ≤ tolerance gives the largest chord angle φ
			const maxStep = 2 * Math.acos(Math.max(-1, 1 - chordToleranceMm / Math.max(r, chordToleranceMm)));
			const steps = Math.max(2, Math.ceil(Math.abs(sweep) / maxStep));
			const a0 = Math.atan2(from[1] - cy, from[0] - cx);
			for (let i = 1; i < steps; i++) {
				const a = a0 + (sweep * i) / steps;
				out.push([cx + r * Math.cos(a), cy + r * Math.sin(a)]);
			}
		}
		out.push(seg.to);
		from = seg.to;
	}
	out.pop(); // the closing point equals the start
	return out;
}
