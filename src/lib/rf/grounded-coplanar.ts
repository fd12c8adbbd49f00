// Grounded (conductor-backed) coplanar waveguide: the quasi-static conformal-mapping closed form and the gap that gives a target Z0.
import { requireInRange, requirePositive } from './guard';

/**
 * Complete elliptic integral of the first kind K(k) of modulus k (0 ≤ k < 1), by the arithmetic–geometric
 * mean: K(k) = π / (2·AGM(1, √(1 − k²))) (Abramowitz & Stegun 17.6). Converges quadratically; 1e-15 relative.
 */
export function completeEllipticK(k: number): number {
	if (!(k >= 0 && k < 1)) throw new RangeError(`completeEllipticK: modulus must be in [0, 1) (got ${k})`);
	let a = 1;
	let b = Math.sqrt(1 - k * k);
	for (let i = 0; i < 40 && Math.abs(a - b) > 1e-15 * a; i++) [a, b] = [(a + b) / 2, Math.sqrt(a * b)];
	return Math.PI / (2 * a);
}

/** K(k)/K(k′) with k′ = √(1 − k²): the ratio every conformal-mapping CPW formula is built of. */
export function ellipticRatio(k: number): number {
	return completeEllipticK(k) / completeEllipticK(Math.sqrt(1 - k * k));
}

export interface GroundedCoplanarGeometry {
	/** Centre strip width S (the signal pad). */
	stripWidthMm: number;
	/** Copper-free gap W between the strip and each top ground. */
	gapMm: number;
	/** Dielectric thickness h to the backing ground. */
	heightMm: number;
	/** Substrate εr. */
	relativePermittivity: number;
}

export interface GroundedCoplanarModel {
	impedanceOhm: number;
	effectivePermittivity: number;
}

/**
 * Quasi-static Z0 and εeff of a conductor-backed CPW with wide top grounds and zero-thickness copper
 * (conformal mapping: Wadell, "Transmission Line Design Handbook", 1991, §3.4.3, and Simons, "Coplanar
 * Waveguide Circuits, Components, and Systems", 2001, eq. 2.36–2.38; from memory):
 *   k = S/(S + 2W),   k₃ = tanh(πS/4h) / tanh(π(S + 2W)/4h),
 *   q = [K(k₃)/K(k₃′)] / [K(k)/K(k′)],   εeff = (1 + εr·q)/(1 + q),
 *   Z0 = 60π / √εeff · 1 / (K(k)/K(k′) + K(k₃)/K(k₃′)).
 * Worked number: S = 3.0, W = 0.5, h = 1.6 mm, εr = 4.4 gives about 46 Ω.
 */
export function analyzeGroundedCoplanar(g: GroundedCoplanarGeometry): GroundedCoplanarModel {
	requirePositive('stripWidthMm', g.stripWidthMm);
	requirePositive('gapMm', g.gapMm);
	requirePositive('heightMm', g.heightMm);
	requireInRange('relativePermittivity', g.relativePermittivity, 1, 1000);
	const s = g.stripWidthMm;
	const outer = s + 2 * g.gapMm;
	const k = s / outer;
	const k3 = Math.tanh((Math.PI * s) / (4 * g.heightMm)) / Math.tanh((Math.PI * outer) / (4 * g.heightMm));
	const top = ellipticRatio(k);
	const back = ellipticRatio(k3);
	const q = back / top;
	const effectivePermittivity = (1 + g.relativePermittivity * q) / (1 + q);
	const impedanceOhm = (60 * Math.PI) / Math.sqrt(effectivePermittivity) / (top + back);
	return { impedanceOhm, effectivePermittivity };
}

/** Widest gap the solver tries, in strip widths: past it the top grounds no longer matter (Z0 has met its conductor-backed limit). */
export const MAX_GAP_STRIP_WIDTHS = 20;

/**
 * The gap W that gives `impedanceOhm` for the strip and substrate (Z0 rises monotonically with W, so
 * bisection). Null when the target is not reachable between a gap of 1 µm and MAX_GAP_STRIP_WIDTHS
 * strip widths (a target above the line's conductor-backed limit, or one too low for any real gap).
 */
export function groundedCoplanarGapMm(target: Omit<GroundedCoplanarGeometry, 'gapMm'> & { impedanceOhm: number }): number | null {
	requirePositive('impedanceOhm', target.impedanceOhm);
	const z = (gapMm: number) => analyzeGroundedCoplanar({ ...target, gapMm }).impedanceOhm;
	let lo = 0.001;
	let hi = MAX_GAP_STRIP_WIDTHS * target.stripWidthMm;
	if (z(lo) > target.impedanceOhm || z(hi) < target.impedanceOhm) return null;
	for (let i = 0; i < 100 && hi - lo > 1e-9; i++) {
		const mid = (lo + hi) / 2;
		if (z(mid) < target.impedanceOhm) lo = mid;
		else hi = mid;
	}
	return (lo + hi) / 2;
}
