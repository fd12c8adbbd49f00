// Homing's step rules: the feed point's resistance from the port's Zin, the secant, the cavity-model first step.
import type { SizedDesign } from '../../lib/rf/sized-design';
import type { FieldCheckResult } from '../../lib/schemas/field-check';

export type FeedKey = 'insetDepthMm' | 'probeOffsetMm';

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
	const z0 = result.referenceImpedanceOhm;
	const beta = (2 * Math.PI * result.targetFrequencyHz * Math.sqrt(line.effectivePermittivity)) / 299_792_458_000;
	const t = Math.tan(beta * line.lengthMm);
	// (r + jx − jZ0·t) / (Z0 − j(r + jx)·t) = (r + j(x − Z0 t)) / ((Z0 + x t) − j r t)
	const nr = r;
	const ni = x - z0 * t;
	const dr = z0 + x * t;
	const di = -r * t;
	const den = dr * dr + di * di;
	return (z0 * (nr * dr + ni * di)) / den;
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

