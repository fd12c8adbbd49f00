// Inset feed: the notch depth y0 that brings the edge resistance down to a target, from the cos² relation.
import { InputError } from '../schemas';
import { requireInRange, requireObject, requirePositive } from './guard';

export interface InsetTarget {
	edgeResistanceOhm: number;
	targetResistanceOhm: number;
	/** Resonant length L of the patch. */
	lengthMm: number;
}

/**
 * Rin(y0) = Rin(0)·cos²(π·y0/L) (Balanis, Antenna Theory, §14.2.1), solved for y0:
 * y0 = (L/π)·acos(√(Rt/Rin(0))), which lies in [0, L/2]. Balanis' example: Rin(0) 228.3 Ω,
 * L 9.06 mm, 50 Ω → y0 ≈ 3.13 mm. A target above the edge resistance has no depth: InputError.
 */
export function insetDepthMm(target: InsetTarget): number {
	const t = requireObject('target', target);
	const edge = requirePositive('edgeResistanceOhm', t.edgeResistanceOhm);
	const lengthMm = requirePositive('lengthMm', t.lengthMm);
	const wanted = requireInRange('targetResistanceOhm', t.targetResistanceOhm, 0, Number.MAX_VALUE, { exclusiveMin: true });
	if (wanted > edge) {
		throw new InputError([
			{
				path: 'targetResistanceOhm',
				value: wanted,
				message: `no inset depth reaches it: the patch edge presents only ${edge.toFixed(2)} Ω (use an edge or quarter-wave feed); allowed range (0, ${edge.toFixed(2)}]`
			}
		]);
	}
	return (lengthMm / Math.PI) * Math.acos(Math.sqrt(wanted / edge));
}
