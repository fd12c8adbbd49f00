// Coaxial probe feed: the probe position along the resonant length for a target input resistance.
import { insetDepthMm, type InsetTarget } from './inset-depth';

/**
 * Offset of the probe from the patch centre along the resonant length, L/2 − y0, where y0 is the
 * distance from the radiating edge at which the cos² relation gives the target (the same
 * Rin(y) = Rin(0)·cos²(πy/L) as the inset; Balanis, Antenna Theory, §14.2.1). 0 means the centre (0 Ω).
 */
export function probeOffsetMm(target: InsetTarget): number {
	const fromEdgeMm = insetDepthMm(target);
	return Math.max(0, target.lengthMm / 2 - fromEdgeMm);
}
