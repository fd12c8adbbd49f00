// Grounded (conductor-backed) coplanar waveguide: the quasi-static conformal-mapping closed form and the gap that gives a target Z0.
import { requireInRange, requirePositive } from './guard';

/** Arithmetic–geometric mean of 1 and x (0 ≤ x ≤ 1); converges quadratically to 1e-15 relative. */
function agm(x: number): number {
	let a = 1;
	let b = x;
	for (let i = 0; i < 60 && Math.abs(a - b) > 1e-15 * a; i++) [a, b] = [(a + b) / 2, Math.sqrt(a * b)];
	return a;
}

/**
 * Complete elliptic integral of the first kind K(k) of modulus k (0 ≤ k < 1), by the arithmetic–geometric
 * mean: K(k) = π / (2·AGM(1, k′)) with k′ = √(1 − k²) (Abramowitz & Stegun 17.6).
 */
export function completeEllipticK(k: number): number {
	if (!(k >= 0 && k < 1)) throw new RangeError(`completeEllipticK: modulus must be in [0, 1) (got ${k})`);
	return Math.PI / (2 * agm(Math.sqrt(1 - k * k)));
}

/**
 * K(k)/K(k′) from k and its complement k′ given apart: AGM(1, k)/AGM(1, k′). Taking k′ as computed, not
 * as √(1 − k²), keeps the ratio exact when k rounds to 1 (a strip wide against a thin substrate).
 */
export function ellipticRatio(k: number, kPrime: number): number {
	return agm(k) / agm(kPrime);
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
 * Worked number: S = 3.0, W = 0.5, h = 1.6 mm, εr = 4.4 gives about 42 Ω.
 */
export function analyzeGroundedCoplanar(g: GroundedCoplanarGeometry): GroundedCoplanarModel {
	requirePositive('stripWidthMm', g.stripWidthMm);
	requirePositive('gapMm', g.gapMm);
	requirePositive('heightMm', g.heightMm);
	requireInRange('relativePermittivity', g.relativePermittivity, 1, 1000);
	const s = g.stripWidthMm;
	const w = g.gapMm;
	const outer = s + 2 * w;
	// k = S/(S + 2W), k′ = 2√(W(S + W))/(S + 2W)
	const top = ellipticRatio(s / outer, (2 * Math.sqrt(w * (s + w))) / outer);
	// k₃ = tanh(a)/tanh(b), k₃′ = √((tanh b − tanh a)(tanh b + tanh a))/tanh(b), a = πS/4h, b = π(S + 2W)/4h, with
	// tanh b − tanh a = −2e^(−2a)·expm1(−2(b − a)) / ((1 + e^(−2a))(1 + e^(−2b))): no cancellation for small or large a
	const a = (Math.PI * s) / (4 * g.heightMm);
	const b = (Math.PI * outer) / (4 * g.heightMm);
	const ea = Math.exp(-2 * a);
	const eb = Math.exp(-2 * b);
	const difference = (-2 * ea * Math.expm1(-2 * (b - a))) / ((1 + ea) * (1 + eb));
	const back = ellipticRatio(Math.tanh(a) / Math.tanh(b), Math.sqrt(difference * (Math.tanh(b) + Math.tanh(a))) / Math.tanh(b));
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
