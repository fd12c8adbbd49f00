// Microstrip analysis: the Hammerstad–Jensen static model with the conductor-thickness correction.
import { FREE_SPACE_IMPEDANCE_OHM } from '../units';
import { requireNonNegative, requireObject, requirePositive, requireInRange } from './guard';

export interface MicrostripGeometry {
	/** Strip width W. */
	widthMm: number;
	/** Dielectric thickness h. */
	heightMm: number;
	/** Substrate εr. */
	relativePermittivity: number;
	/** Strip copper thickness t (0 for the zero-thickness model). */
	thicknessMm?: number;
}

export interface MicrostripModel {
	/** Quasi-static characteristic impedance Z0. */
	impedanceOhm: number;
	/** Quasi-static effective permittivity εeff(0). */
	effectivePermittivity: number;
}

/** Hammerstad–Jensen impedance of the strip in air, Z01(u) with u = W/h (HJ 1980, eq. 1–2). */
export function airImpedanceOhm(u: number): number {
	const f = 6 + (2 * Math.PI - 6) * Math.exp(-((30.666 / u) ** 0.7528));
	return (FREE_SPACE_IMPEDANCE_OHM / (2 * Math.PI)) * Math.log(f / u + Math.sqrt(1 + 4 / (u * u)));
}

/** Hammerstad–Jensen zero-thickness effective permittivity εe(u, εr) (HJ 1980, eq. 3–5). */
export function staticEffectivePermittivity(u: number, relativePermittivity: number): number {
	const er = relativePermittivity;
	const u4 = u ** 4;
	const a = 1 + Math.log((u4 + (u / 52) ** 2) / (u4 + 0.432)) / 49 + Math.log(1 + (u / 18.1) ** 3) / 18.7;
	const b = 0.564 * ((er - 0.9) / (er + 3)) ** 0.053;
	return (er + 1) / 2 + ((er - 1) / 2) * (1 + 10 / u) ** (-a * b);
}

/** Unchecked core of analyzeMicrostrip for callers that already validated their numbers. */
export function microstripModel(u: number, relativePermittivity: number, thicknessRatio: number): MicrostripModel {
	if (thicknessRatio <= 0) {
		const eps = staticEffectivePermittivity(u, relativePermittivity);
		return { impedanceOhm: airImpedanceOhm(u) / Math.sqrt(eps), effectivePermittivity: eps };
	}
	// Thickness widens the strip: Δu1 in air, Δur in the dielectric (HJ 1980, eq. 6–9).
	const t = thicknessRatio;
	const coth = 1 / Math.tanh(Math.sqrt(6.517 * u));
	// ln(1 + A/t) written as ln(t + A) − ln t, which stays finite for denormal t.
	const a = (4 * Math.E) / (coth * coth);
	const du1 = (t / Math.PI) * (Math.log(t + a) - Math.log(t));
	const dur = 0.5 * (1 + 1 / Math.cosh(Math.sqrt(relativePermittivity - 1))) * du1;
	const u1 = u + du1;
	const ur = u + dur;
	const epsR = staticEffectivePermittivity(ur, relativePermittivity);
	const zr = airImpedanceOhm(ur);
	const z1 = airImpedanceOhm(u1);
	return { impedanceOhm: zr / Math.sqrt(epsR), effectivePermittivity: epsR * (z1 / zr) ** 2 };
}

/**
 * Quasi-static Z0 and εeff of a microstrip line (Hammerstad & Jensen, "Accurate models for
 * microstrip computer-aided design", IEEE MTT-S 1980). Stated accuracy: better than 0.2 % for
 * 0.01 ≤ W/h ≤ 100 and εr ≤ 128 (zero thickness). Example: W = 3.0 mm, h = 1.6 mm, εr = 4.4 gives
 * about 50 Ω.
 */
export function analyzeMicrostrip(geometry: MicrostripGeometry): MicrostripModel {
	const g = requireObject('geometry', geometry);
	const widthMm = requirePositive('widthMm', g.widthMm);
	const heightMm = requirePositive('heightMm', g.heightMm);
	const er = requireInRange('relativePermittivity', g.relativePermittivity, 1, 1000);
	const thicknessMm = g.thicknessMm === undefined ? 0 : requireNonNegative('thicknessMm', g.thicknessMm);
	return microstripModel(widthMm / heightMm, er, thicknessMm / heightMm);
}
