// Signed area of a contour with exact arc contributions (positive when counter-clockwise).
import { arcSweepRad } from './arc-sweep';
import type { Contour } from './contour';

/**
 * Shoelace over the chords plus, for each arc, the circular segment between chord and arc
 * (r²/2 · (θ − sin θ), signed with the sweep). Green's theorem, any calculus text.
 */
export function contourArea(contour: Contour): number {
	let twice = 0;
	let from = contour.start;
	for (const seg of contour.segments) {
		twice += from[0] * seg.to[1] - seg.to[0] * from[1];
		if (seg.kind === 'arc') {
			const r = Math.hypot(from[0] - seg.center[0], from[1] - seg.center[1]);
			const theta = arcSweepRad(from, seg.to, seg.center, seg.clockwise);
			twice += r * r * (theta - Math.sin(theta));
		}
		from = seg.to;
	}
	return twice / 2;
}
