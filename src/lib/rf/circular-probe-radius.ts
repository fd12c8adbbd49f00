// Circular patch probe feed: the radial probe position for a target input resistance.
import { InputError } from '../schemas';
import { besselJ, TM11_EIGENVALUE } from './bessel';
import { requireInRange, requireObject, requirePositive } from './guard';

export interface CircularProbeTarget {
	edgeResistanceOhm: number;
	targetResistanceOhm: number;
	radiusMm: number;
	effectiveRadiusMm: number;
}

/**
 * Rin(ρ0) = Rin(a_e)·J1²(kρ0)/J1²(k·a_e) with k = χ′11/a_e (Balanis, Antenna Theory, §14.3),
 * solved for ρ0 by bisection (J1 rises monotonically on [0, χ′11]). The probe must sit on the
 * copper, ρ0 ≤ a; a target above Rin(a) is an InputError stating the reachable range.
 */
export function circularProbeRadiusMm(target: CircularProbeTarget): number {
	const t = requireObject('target', target);
	const edge = requirePositive('edgeResistanceOhm', t.edgeResistanceOhm);
	const wanted = requireInRange('targetResistanceOhm', t.targetResistanceOhm, 0, Number.MAX_VALUE, { exclusiveMin: true });
	const a = requirePositive('radiusMm', t.radiusMm);
	const ae = requireInRange('effectiveRadiusMm', t.effectiveRadiusMm, a, Number.MAX_VALUE);
	const jEdge = besselJ(1, TM11_EIGENVALUE);
	const resistanceAt = (rho: number) => (edge * besselJ(1, (TM11_EIGENVALUE * rho) / ae) ** 2) / (jEdge * jEdge);
	const reachable = resistanceAt(a);
	if (wanted > reachable) {
		throw new InputError([
			{
				path: 'targetResistanceOhm',
				value: wanted,
				message: `no probe position on the patch reaches it: the rim presents only ${reachable.toFixed(2)} Ω; allowed range (0, ${reachable.toFixed(2)}]`
			}
		]);
	}
	let lo = 0;
	let hi = a;
	for (let i = 0; i < 200 && hi - lo > 1e-13 * a; i++) {
		const mid = (lo + hi) / 2;
		if (resistanceAt(mid) < wanted) lo = mid;
		else hi = mid;
	}
	return (lo + hi) / 2;
}
