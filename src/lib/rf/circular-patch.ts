// Circular patch, cavity model: the physical radius whose fringing-corrected radius resonates TM11 at f0, and its radiation conductance.
import { InputError } from '../schemas';
import { FREE_SPACE_IMPEDANCE_OHM, freeSpaceWavelengthMm } from '../units';
import { besselJ, TM11_EIGENVALUE } from './bessel';
import { integrateGaussLegendre } from './gauss-legendre';
import { requireInRange, requireObject, requirePositive } from './guard';

export interface CircularPatchInput {
	frequencyHz: number;
	relativePermittivity: number;
	heightMm: number;
}

export interface CircularPatchSize {
	radiusMm: number;
	/** a_e: the radius of the cavity with the fringing fields included. */
	effectiveRadiusMm: number;
	/** Radiation conductance G_rad referred to the edge voltage at φ = 0. */
	radiationConductanceS: number;
	/** 1/G_rad: the input resistance at the edge (radiation only). */
	edgeResistanceOhm: number;
}

/** a_e = a·√(1 + 2h/(π·a·εr)·(ln(πa/2h) + 1.7726)) (Balanis, Antenna Theory, §14.3). */
export function effectiveRadiusMm(radiusMm: number, heightMm: number, relativePermittivity: number): number {
	const a = radiusMm;
	const h = heightMm;
	return a * Math.sqrt(1 + ((2 * h) / (Math.PI * a * relativePermittivity)) * (Math.log((Math.PI * a) / (2 * h)) + 1.7726));
}

/** TM11 resonance f = χ′11·c/(2π·a_e·√εr) (Balanis, Antenna Theory, §14.3), as the effective radius that resonates at f. */
export function resonantEffectiveRadiusMm(frequencyHz: number, relativePermittivity: number): number {
	return (TM11_EIGENVALUE * freeSpaceWavelengthMm(frequencyHz)) / (2 * Math.PI * Math.sqrt(relativePermittivity));
}

/**
 * G_rad = (k0·a_e)²·π/(4η0)·∫0^{π/2} [J′02² + cos²θ·J02²] sinθ dθ with J′02 = J0 − J2 and
 * J02 = J0 + J2 at k0·a_e·sinθ (Balanis, Antenna Theory, §14.3, where the prefactor reads (k0ae)²/480).
 */
export function circularRadiationConductanceS(effectiveRadiusMmValue: number, frequencyHz: number): number {
	const ka = (2 * Math.PI * effectiveRadiusMmValue) / freeSpaceWavelengthMm(frequencyHz);
	const integral = integrateGaussLegendre(
		(t) => {
			const x = ka * Math.sin(t);
			const j0 = besselJ(0, x);
			const j2 = besselJ(2, x);
			const c = Math.cos(t);
			return ((j0 - j2) ** 2 + c * c * (j0 + j2) ** 2) * Math.sin(t);
		},
		0,
		Math.PI / 2,
		1 + Math.floor(ka / 3)
	);
	return ((ka * ka * Math.PI) / (4 * FREE_SPACE_IMPEDANCE_OHM)) * integral;
}

/**
 * Sizes a circular patch for TM11 at f0: the physical radius a solves a_e(a) = χ′11·c/(2πf0√εr)
 * by bisection (a_e grows with a above a = (2h/π)·e^−1.7726, where a_e = a). Balanis'
 * closed-form design formula approximates the same root; his example (εr 2.2, h 1.588 mm, 10 GHz) gives
 * a ≈ 5.25 mm.
 */
export function circularPatch(input: CircularPatchInput): CircularPatchSize {
	const d = requireObject('input', input);
	const frequencyHz = requirePositive('frequencyHz', d.frequencyHz);
	const er = requireInRange('relativePermittivity', d.relativePermittivity, 1, 1000, { exclusiveMin: true });
	const heightMm = requirePositive('heightMm', d.heightMm);
	const wanted = resonantEffectiveRadiusMm(frequencyHz, er);
	let lo = ((2 * heightMm) / Math.PI) * Math.exp(-1.7726);
	if (!(wanted > lo * (1 + 1e-9))) {
		const maxMm = (wanted * Math.PI * Math.exp(1.7726)) / 2;
		throw new InputError([
			{ path: 'heightMm', value: heightMm, message: `too thick for a circular patch at this frequency and permittivity; allowed range (0, ${maxMm.toPrecision(4)})` }
		]);
	}
	let hi = wanted;
	for (let i = 0; i < 200 && hi - lo > 1e-13 * hi; i++) {
		const mid = (lo + hi) / 2;
		if (effectiveRadiusMm(mid, heightMm, er) < wanted) lo = mid;
		else hi = mid;
	}
	const radiusMm = (lo + hi) / 2;
	const ae = effectiveRadiusMm(radiusMm, heightMm, er);
	const g = circularRadiationConductanceS(ae, frequencyHz);
	return { radiusMm, effectiveRadiusMm: ae, radiationConductanceS: g, edgeResistanceOhm: 1 / g };
}
