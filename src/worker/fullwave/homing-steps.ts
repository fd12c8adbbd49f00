// Homing's step rules: the feed point's resistance from the port's Zin, the secant, the cavity-model first step,
// the quarter-wave section's impedance from the de-embedded patch edge.
import type { SizedDesign } from '../../lib/rf/sized-design';
import type { FieldCheckResult } from '../../lib/schemas/field-check';

export type FeedKey = 'insetDepthMm' | 'probeOffsetMm' | 'transformerImpedanceOhm';

const SPEED_OF_LIGHT_MM_PER_S = 299_792_458_000;

interface Complex {
	re: number;
	im: number;
}

/** Zin at the target, interpolated between the two samples around it. */
export function impedanceAtTarget(result: FieldCheckResult): { r: number; x: number } {
	const s = result.samples;
	const f = result.targetFrequencyHz;
	let i = 0;
	while (i + 2 < s.length && s[i + 1].frequencyHz < f) i++;
	const t = (f - s[i].frequencyHz) / (s[i + 1].frequencyHz - s[i].frequencyHz);
	return { r: s[i].resistanceOhm + t * (s[i + 1].resistanceOhm - s[i].resistanceOhm), x: s[i].reactanceOhm + t * (s[i + 1].reactanceOhm - s[i].reactanceOhm) };
}

/**
 * The resistance the feed point presents at the target: for an inset feed the port's Zin is moved
 * back along the lossless feed line (Z_L = Z0·(Zin − jZ0·tanβl)/(Z0 − jZin·tanβl), Pozar, Microwave
 * Engineering 4th ed., eq. 2.44 solved for the load; from memory); a probe's port is at the feed point.
 */
export function feedPointResistance(sized: SizedDesign, result: FieldCheckResult): number {
	const { r, x } = impedanceAtTarget(result);
	if (sized.feed.kind !== 'inset') return r;
	const line = sized.feed.line;
	return loadThroughLine({ re: r, im: x }, result.referenceImpedanceOhm, electricalLength(line, result.targetFrequencyHz)).re;
}

/** βl of a microstrip section at f: 2πf·√εeff·l / c. */
function electricalLength(line: { lengthMm: number; effectivePermittivity: number }, frequencyHz: number): number {
	return (2 * Math.PI * frequencyHz * Math.sqrt(line.effectivePermittivity) * line.lengthMm) / SPEED_OF_LIGHT_MM_PER_S;
}

/**
 * The load at the far end of a lossless line of impedance z0 and electrical length βl whose input
 * shows zin: Z_L = Z0·(Zin − jZ0·tanβl)/(Z0 − jZin·tanβl) (Pozar, Microwave Engineering 4th ed.,
 * eq. 2.44 solved for the load; from memory).
 */
export function loadThroughLine(zin: Complex, z0: number, betaL: number): Complex {
	const t = Math.tan(betaL);
	const num = { re: zin.re, im: zin.im - z0 * t };
	const den = { re: z0 + zin.im * t, im: -zin.re * t };
	const d = den.re * den.re + den.im * den.im;
	return { re: (z0 * (num.re * den.re + num.im * den.im)) / d, im: (z0 * (num.im * den.re - num.re * den.im)) / d };
}

/**
 * The quarter-wave feed's next section impedance: the simulated Zin at the target is moved back
 * through the feed line and the present λg/4 section to the patch edge (loadThroughLine twice),
 * and the section that presents Z0 is Zt = √(Z0·|Z_L|) — for a real load exactly the λ/4 rule
 * Zin = Zt²/Z_L, and for a complex one the real Zt of least |Γ| (|Zt²/Z0 − Z_L|/|Zt²/Z0 + Z_L| is
 * least where Zt²/Z0 = |Z_L|). The sizing keeps the section λg/4 long at its new width, so the
 * patch edge seen through it is the same load and the step lands in one go when the load does not
 * move; the resonant correction that runs beside it moves the load a little, hence a few steps.
 */
export function transformerStep(sized: SizedDesign, result: FieldCheckResult): number {
	if (sized.feed.kind !== 'quarter-wave') throw new RangeError(`transformerStep: a quarter-wave feed is needed, not ${sized.feed.kind}`);
	const { r, x } = impedanceAtTarget(result);
	const f = result.targetFrequencyHz;
	const z0 = result.referenceImpedanceOhm;
	const { line, transformer } = sized.feed;
	const atJoin = loadThroughLine({ re: r, im: x }, z0, electricalLength(line, f));
	const atEdge = loadThroughLine(atJoin, transformer.impedanceOhm, electricalLength(transformer, f));
	return Math.sqrt(z0 * Math.hypot(atEdge.re, atEdge.im));
}

/**
 * The next section impedance from the trials so far: each trial's own Zt and the Zt its transformerStep
 * proposes (residual = proposal − Zt). The first step takes the proposal (exact when the patch edge does
 * not move with the section). Once two residuals bracket the root, the secant between them; while they
 * share a sign, half the way to the current proposal. A quick real run showed why: the edge load moves
 * with the section's width, so the bare step swung 77 ↔ 85 Ω, and an unbracketed secant through two far
 * trials jumped to the 40 % clamp.
 */
export function nextTransformerImpedance(current: { impedanceOhm: number; proposedOhm: number }, previous: { impedanceOhm: number; proposedOhm: number } | null): number {
	const r1 = current.proposedOhm - current.impedanceOhm;
	if (!previous) return current.proposedOhm;
	const r0 = previous.proposedOhm - previous.impedanceOhm;
	const halfWay = current.impedanceOhm + r1 / 2;
	if (r0 * r1 >= 0) return halfWay;
	return secant(previous.impedanceOhm, r0, current.impedanceOhm, r1, halfWay);
}

/** Next value by the secant through the last two points, or `fallback` when they cannot give one. */
export function secant(x0: number, y0: number, x1: number, y1: number, fallback: number): number {
	const slope = (y1 - y0) / (x1 - x0);
	if (!Number.isFinite(slope) || slope === 0) return fallback;
	return x1 - y1 / slope;
}

/**
 * The first feed step from the cavity model's standing wave: an inset at depth y sees
 * R(y) = R_edge·cos²(πy/L), a probe at offset p from the centre R(p) = R_edge·sin²(πp/L)
 * (Balanis, Antenna Theory 4th ed., eq. 14-20a; from memory). Solved for the depth that turns the
 * simulated R into the reference.
 */
export function cosineModelStep(sized: SizedDesign, key: FeedKey, valueMm: number, resistanceOhm: number, wantOhm: number): number {
	const lengthMm = sized.patch.kind === 'rectangular' ? sized.patch.lengthMm : sized.patch.kind === 'circular' ? 2 * sized.patch.radiusMm : valueMm * 3;
	const r = Math.max(resistanceOhm, 1e-3);
	const ratio = Math.sqrt(wantOhm / r);
	if (key === 'insetDepthMm') {
		const c = Math.min(1, ratio * Math.cos((Math.PI * valueMm) / lengthMm));
		return (lengthMm / Math.PI) * Math.acos(c);
	}
	const s = Math.min(1, ratio * Math.sin((Math.PI * valueMm) / lengthMm));
	return (lengthMm / Math.PI) * Math.asin(s);
}

