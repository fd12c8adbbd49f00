// Array factor of a uniform rectangular array of isotropic elements: directivity, grating-lobe limit, beamwidths, pattern cuts.
import { halfPowerWidthDeg } from './half-power-width';
import { dbFromPowerRatio, radFromDeg } from '../units';

export interface ArrayGeometry {
	columns: number;
	rows: number;
	/** Pitch along x and y in free-space wavelengths. */
	spacingXWavelengths: number;
	spacingYWavelengths: number;
	/** Beam steered to θ0 from broadside in the x–z plane (progressive phase along x). */
	scanAngleDeg: number;
}

/**
 * Largest element spacing d/λ0 free of grating lobes when the beam scans to θ0:
 * d/λ0 < 1 / (1 + |sin θ0|) (Balanis, Antenna Theory, ch. 6, from memory). At equality a grating
 * lobe reaches the horizon (θ = ∓90°).
 */
export function gratingLobeLimitWavelengths(scanAngleDeg: number): number {
	return 1 / (1 + Math.abs(Math.sin(radFromDeg(scanAngleDeg))));
}

/** |AF| of N elements for the phase difference ψ between neighbours, normalised to 1 at ψ = 0. */
function linearFactor(n: number, psi: number): number {
	const half = psi / 2;
	const s = Math.sin(half);
	if (Math.abs(s) < 1e-12) return 1;
	return Math.abs(Math.sin(n * half) / (n * s));
}

/** Normalised |AF| in the direction with direction cosines (u, v) = (sinθ cosφ, sinθ sinφ). */
export function arrayFactorMagnitude(g: ArrayGeometry, u: number, v: number): number {
	const u0 = Math.sin(radFromDeg(g.scanAngleDeg));
	const psiX = 2 * Math.PI * g.spacingXWavelengths * (u - u0);
	const psiY = 2 * Math.PI * g.spacingYWavelengths * v;
	return linearFactor(g.columns, psiX) * linearFactor(g.rows, psiY);
}

const sinc = (x: number) => (Math.abs(x) < 1e-12 ? 1 : Math.sin(x) / x);

/**
 * Directivity of the array factor (isotropic elements), linear. Exact: integrating |AF|² over the
 * sphere term by term, each pair of elements a vector r apart gives 4π·sinc(k|r|)·cos(k r·û0), so
 * D = (NM)² / Σ_p Σ_q (M−|p|)(N−|q|) sinc(k ρ_pq) cos(k p dx u0). For a broadside line of N this is
 * Balanis's D0 = N / (1 + (2/N) Σ (N−n) sin(nkd)/(nkd)) (ch. 6, from memory).
 */
export function arrayFactorDirectivity(g: ArrayGeometry): number {
	const kx = 2 * Math.PI * g.spacingXWavelengths;
	const ky = 2 * Math.PI * g.spacingYWavelengths;
	const u0 = Math.sin(radFromDeg(g.scanAngleDeg));
	let sum = 0;
	for (let p = -(g.columns - 1); p <= g.columns - 1; p++) {
		const wx = g.columns - Math.abs(p);
		const steer = Math.cos(kx * p * u0);
		for (let q = -(g.rows - 1); q <= g.rows - 1; q++) {
			sum += wx * (g.rows - Math.abs(q)) * sinc(Math.hypot(kx * p, ky * q)) * steer;
		}
	}
	const n = g.columns * g.rows;
	return (n * n) / sum;
}

/** Power pattern (normalised |AF|², dB, floored at −80 dB) on a cut: xz through the scan plane, yz across it through the beam. */
export function arrayFactorCutDb(g: ArrayGeometry, cut: 'xz' | 'yz', angleDeg: number): number {
	const a = radFromDeg(angleDeg);
	const u0 = Math.sin(radFromDeg(g.scanAngleDeg));
	const m = cut === 'xz' ? arrayFactorMagnitude(g, Math.sin(a), 0) : arrayFactorMagnitude(g, Math.cos(a) * u0, Math.sin(a));
	return Math.max(dbFromPowerRatio(m * m), -80);
}

/** Full width between the −3 dB points around the beam on a cut (bisection); null when a side has none in view. */
export function halfPowerBeamwidthDeg(g: ArrayGeometry, cut: 'xz' | 'yz'): number | null {
	// walk out in 0.05° steps from the beam to the first crossing, then bisect
	return halfPowerWidthDeg((a) => arrayFactorCutDb(g, cut, a), cut === 'xz' ? g.scanAngleDeg : 0, 0.05);
}

/** Plot-ready cuts: angles −90°…90° in 1° steps and the normalised power pattern in dB on each cut. */
export function arrayPattern(g: ArrayGeometry): { anglesDeg: number[]; xzDb: number[]; yzDb: number[] } {
	const anglesDeg = Array.from({ length: 181 }, (_, i) => i - 90);
	const round = (v: number) => Math.round(v * 1000) / 1000;
	return {
		anglesDeg,
		xzDb: anglesDeg.map((a) => round(arrayFactorCutDb(g, 'xz', a))),
		yzDb: anglesDeg.map((a) => round(arrayFactorCutDb(g, 'yz', a)))
	};
}

/** Broadside large-array approximation D0 ≈ 2N·d/λ (Balanis ch. 6, from memory), for comparison in tests and reports. */
export function broadsideLineDirectivityApprox(count: number, spacingWavelengths: number): number {
	return 2 * count * spacingWavelengths;
}

/**
 * The grating-lobe condition of one axis as a true statement in words and a correct inequality, e.g.
 * "0.75 λ₀ < 1.000 λ₀: no grating lobe" or "1 λ₀ ≥ 1.000 λ₀: a grating lobe reaches visible space".
 * The limit is shown with enough digits that the printed numbers keep the relation they state.
 */
export function gratingLobeCondition(spacingWavelengths: number, limitWavelengths: number): { free: boolean; text: string } {
	const free = spacingWavelengths < limitWavelengths;
	let digits = 3;
	const show = (v: number) => String(Number(v.toFixed(digits)));
	// widen until the rounded numbers no longer look equal when they differ (or stay equal when they are)
	while (digits < 9 && free && show(spacingWavelengths) === show(limitWavelengths)) digits++;
	const limit = limitWavelengths.toFixed(Math.max(3, digits));
	const s = show(spacingWavelengths);
	return free
		? { free, text: `pitch ${s} λ₀ < limit ${limit} λ₀: no grating lobe` }
		: { free, text: `pitch ${s} λ₀ ≥ limit ${limit} λ₀: a grating lobe reaches visible space` };
}
