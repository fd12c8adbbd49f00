// The signed angle an arc segment turns through, in radians (positive = counter-clockwise).
import type { Point } from './point';

export function arcSweepRad(from: Point, to: Point, center: Point, clockwise: boolean): number {
	const a0 = Math.atan2(from[1] - center[1], from[0] - center[0]);
	const a1 = Math.atan2(to[1] - center[1], to[0] - center[0]);
	let sweep = a1 - a0;
	if (clockwise) {
		while (sweep >= 0) sweep -= 2 * Math.PI;
	} else {
		while (sweep <= 0) sweep += 2 * Math.PI;
	}
	return sweep;
}
