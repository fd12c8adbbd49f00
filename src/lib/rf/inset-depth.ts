// Inset feed: the notch depth y0 that brings the edge resistance down to a target, from the cos² or cos⁴ relation.
import { InputError } from '../schemas';
import { requireInRange, requireObject, requirePositive } from './guard';

/**
 * How the resonant input resistance falls from the radiating edge towards the centre.
 * 'cos2': Rin(y0) = Rin(0)·cos²(π·y0/L), the cavity/transmission-line relation (Balanis, Antenna
 * Theory, §14.2.1); measured to hold for a coaxial probe moved along the patch.
 * 'cos4': Rin(y0) = Rin(0)·cos⁴(π·y0/L), the fit to measured and simulated inset-fed patches
 * (Basilio, Khayat, Williams & Long, "The dependence of the input impedance on feed position of
 * probe and microstrip line-fed patch antennas", IEEE Trans. AP 49(1), 2001; from memory): the
 * notch removes current-carrying copper and lowers the resistance faster than cos².
 */
export type FeedPositionLaw = 'cos2' | 'cos4';

export interface InsetTarget {
	edgeResistanceOhm: number;
	targetResistanceOhm: number;
	/** Resonant length L of the patch. */
	lengthMm: number;
	/** Default 'cos2'. */
	law?: FeedPositionLaw;
}

/**
 * Solves Rin(y0) = Rt for y0 in [0, L/2]: y0 = (L/π)·acos((Rt/Rin(0))^(1/n)) with n = 2 (cos²) or
 * 4 (cos⁴). Balanis' example with cos²: Rin(0) 228.3 Ω, L 9.06 mm, 50 Ω → y0 ≈ 3.13 mm; the same
 * with cos⁴ → y0 ≈ 2.36 mm. A target above the edge resistance has no depth: InputError.
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
	const power = t.law === 'cos4' ? 4 : 2;
	return (lengthMm / Math.PI) * Math.acos((wanted / edge) ** (1 / power));
}
