// The −3 dB (half-power) width of a cut of a radiation pattern: walk out from the beam in small steps to the first
// angle below half power on each side, then bisect to the crossing. Shared by the array factor and the element pattern.
import { dbFromPowerRatio } from '../units';

/**
 * Full width in degrees between the half-power points either side of `peakDeg` on `cutDb` (power in dB relative to
 * the beam at that angle); null when a side stays above −3 dB out to ±90°.
 */
export function halfPowerWidthDeg(cutDb: (angleDeg: number) => number, peakDeg: number, stepDeg: number): number | null {
	const level = dbFromPowerRatio(0.5);
	const edge = (dir: 1 | -1): number | null => {
		let inside = peakDeg;
		for (let a = peakDeg + dir * stepDeg; Math.abs(a) <= 90; a += dir * stepDeg) {
			if (cutDb(a) < level) {
				let lo = inside;
				let hi = a;
				for (let i = 0; i < 40; i++) {
					const mid = (lo + hi) / 2;
					if (cutDb(mid) < level) hi = mid;
					else lo = mid;
				}
				return (lo + hi) / 2;
			}
			inside = a;
		}
		return null;
	};
	const up = edge(1);
	const down = edge(-1);
	return up === null || down === null ? null : up - down;
}
