// Frequency-dependent effective permittivity of microstrip: the Kirschning–Jansen dispersion model.
import { ghzFromHz } from '../units';
import { requireInRange, requireObject, requirePositive } from './guard';

export interface DispersionInput {
	widthMm: number;
	heightMm: number;
	relativePermittivity: number;
	/** The quasi-static εeff(0) of the same line (from analyzeMicrostrip). */
	staticEffectivePermittivity: number;
	frequencyHz: number;
}

/** Unchecked core: εeff(f) from u = W/h, εr, εeff(0) and the normalised frequency fn = f[GHz]·h[mm]. */
export function kirschningJansen(u: number, er: number, eps0: number, fnGhzMm: number): number {
	const fn = fnGhzMm;
	const p1 = 0.27488 + (0.6315 + 0.525 / (1 + 0.0157 * fn) ** 20) * u - 0.065683 * Math.exp(-8.7513 * u);
	const p2 = 0.33622 * (1 - Math.exp(-0.03442 * er));
	const p3 = 0.0363 * Math.exp(-4.6 * u) * (1 - Math.exp(-((fn / 38.7) ** 4.97)));
	const p4 = 1 + 2.751 * (1 - Math.exp(-((er / 15.916) ** 8)));
	const p = p1 * p2 * ((0.1844 + p3 * p4) * fn) ** 1.5763;
	return er - (er - eps0) / (1 + p);
}

/**
 * εeff(f) of a microstrip line (Kirschning & Jansen, Electronics Letters 18(6), 1982). Stated
 * accuracy 0.6 % for 0.1 ≤ W/h ≤ 100, 1 ≤ εr ≤ 20 and h/λ0 ≤ 0.13. It rises from εeff(0) towards εr
 * as the frequency grows, e.g. a 50 Ω line on εr 4.4, h 1.6 mm: 3.34 at DC, about 3.5 at 6 GHz.
 */
export function dispersivePermittivity(input: DispersionInput): number {
	const d = requireObject('input', input);
	const widthMm = requirePositive('widthMm', d.widthMm);
	const heightMm = requirePositive('heightMm', d.heightMm);
	const er = requireInRange('relativePermittivity', d.relativePermittivity, 1, 1000);
	const eps0 = requireInRange('staticEffectivePermittivity', d.staticEffectivePermittivity, 1, er);
	const frequencyHz = requireInRange('frequencyHz', d.frequencyHz, 0, 1e15);
	return kirschningJansen(widthMm / heightMm, er, eps0, ghzFromHz(frequencyHz) * heightMm);
}
