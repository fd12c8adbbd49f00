// The S11 traces the field-check plots draw (the model's prediction, the full-wave result, a measurement): one
// complex-reflection form for all three, decimation for long traces, extents without spreading big arrays, and the
// sentence that says where the patch resonates against its target.
import { cavityModelResponse, type ParallelRlc } from '../rf/cavity-input-impedance';
import type { FieldCheckResult } from '../schemas/field-check';

export interface TracePoint {
	frequencyHz: number;
	/** Γ = S11, real and imaginary parts. */
	re: number;
	im: number;
}

export type TraceId = 'model' | 'fullwave' | 'measured';

export interface S11Trace {
	id: TraceId;
	label: string;
	points: TracePoint[];
}

/** Points drawn per trace at most: enough for a 760-px-wide plot, where more only cost the browser. */
export const MAX_PLOTTED_POINTS = 600;

export const s11Db = (p: TracePoint): number => 10 * Math.log10(Math.max(1e-30, p.re * p.re + p.im * p.im));

/** Z = Z0·(1 + Γ)/(1 − Γ) (Pozar, Microwave Engineering 4th ed., eq. 2.35 rearranged; from memory). */
export function impedanceOf(p: TracePoint, referenceImpedanceOhm: number): { resistanceOhm: number; reactanceOhm: number } {
	const dRe = 1 - p.re;
	const dIm = -p.im;
	const d2 = dRe * dRe + dIm * dIm || 1e-30;
	const nRe = 1 + p.re;
	const nIm = p.im;
	return { resistanceOhm: (referenceImpedanceOhm * (nRe * dRe + nIm * dIm)) / d2, reactanceOhm: (referenceImpedanceOhm * (nIm * dRe - nRe * dIm)) / d2 };
}

/** [min, max] of the values, by a loop (no spreading into Math.min/max, which overflows the stack on long traces). */
export function extentOf(values: Iterable<number>): [number, number] {
	let lo = Infinity;
	let hi = -Infinity;
	for (const v of values) {
		if (!Number.isFinite(v)) continue;
		if (v < lo) lo = v;
		if (v > hi) hi = v;
	}
	return lo <= hi ? [lo, hi] : [0, 0];
}

/**
 * At most about `maxPoints` of the trace, in frequency order: the first and last point, and in each bucket between
 * them the points of least and greatest |S11|, so a narrow resonance dip survives decimation.
 */
export function decimateTrace(points: readonly TracePoint[], maxPoints = MAX_PLOTTED_POINTS): TracePoint[] {
	if (points.length <= maxPoints) return [...points];
	const buckets = Math.max(1, Math.floor((maxPoints - 2) / 2));
	const inner = points.length - 2;
	const out: TracePoint[] = [points[0]];
	for (let b = 0; b < buckets; b++) {
		const from = 1 + Math.floor((b * inner) / buckets);
		const to = 1 + Math.floor(((b + 1) * inner) / buckets);
		if (to <= from) continue;
		let lo = from;
		let hi = from;
		for (let i = from; i < to; i++) {
			const m = points[i].re * points[i].re + points[i].im * points[i].im;
			if (m < points[lo].re * points[lo].re + points[lo].im * points[lo].im) lo = i;
			if (m > points[hi].re * points[hi].re + points[hi].im * points[hi].im) hi = i;
		}
		if (lo === hi) out.push(points[lo]);
		else out.push(points[Math.min(lo, hi)], points[Math.max(lo, hi)]);
	}
	out.push(points[points.length - 1]);
	return out;
}

export function fullWaveTrace(result: FieldCheckResult): S11Trace {
	return { id: 'fullwave', label: `full-wave (${result.mode})`, points: result.samples.map((s) => ({ frequencyHz: s.frequencyHz, re: s.s11Re, im: s.s11Im })) };
}

export function measuredTrace(label: string, samples: readonly { frequencyHz: number; s11: { re: number; im: number } }[]): S11Trace {
	return { id: 'measured', label, points: samples.map((s) => ({ frequencyHz: s.frequencyHz, re: s.s11.re, im: s.s11.im })) };
}

/** The cavity model's prediction on `count` frequencies evenly spread over [lowHz, highHz]. */
export function modelTrace(rlc: ParallelRlc, lowHz: number, highHz: number, referenceImpedanceOhm: number, count = 201): S11Trace {
	const step = (highHz - lowHz) / (count - 1);
	const frequencies = Array.from({ length: count }, (_, i) => lowHz + i * step);
	return {
		id: 'model',
		label: 'model (cavity, parallel RLC)',
		points: cavityModelResponse(rlc, frequencies, referenceImpedanceOhm).map((s) => ({ frequencyHz: s.frequencyHz, re: s.s11Re, im: s.s11Im }))
	};
}

/** Within this fraction of the target the patch counts as on target (Homing's own stopping rule for the resonance). */
export const ON_TARGET_FRACTION = 0.003;

/** Where the simulated patch resonates against its target, in words: "resonates 1.8 % low; run Homing?". */
export function describeResonance(result: Pick<FieldCheckResult, 'resonance' | 'deviationFraction' | 's11AtTargetDb'>): { text: string; suggestHoming: boolean } {
	if (!result.resonance || result.deviationFraction === null) {
		return { text: `no resonance dip inside the simulated band (S11 ${result.s11AtTargetDb.toFixed(1)} dB at the target); run Homing?`, suggestHoming: true };
	}
	const pct = Math.abs(result.deviationFraction * 100).toFixed(1);
	if (Math.abs(result.deviationFraction) <= ON_TARGET_FRACTION) {
		const matched = result.s11AtTargetDb <= -10;
		return { text: `resonates on target (${pct} % ${result.deviationFraction < 0 ? 'low' : 'high'})${matched ? '' : `, but S11 is only ${result.s11AtTargetDb.toFixed(1)} dB there; run Homing?`}`, suggestHoming: !matched };
	}
	return { text: `resonates ${pct} % ${result.deviationFraction < 0 ? 'low' : 'high'}; run Homing?`, suggestHoming: true };
}

/** How each trace is drawn, the same in every plot and legend. */
export const traceStyle: Record<TraceId, { strokeClass: string; swatchClass: string; dash: string; width: number }> = {
	model: { strokeClass: 'stroke-copper-600', swatchClass: 'border-copper-600 border-dashed', dash: '6 4', width: 1.5 },
	fullwave: { strokeClass: 'stroke-ground-900', swatchClass: 'border-ground-900', dash: '', width: 2 },
	measured: { strokeClass: 'stroke-drill-600', swatchClass: 'border-drill-600', dash: '', width: 1.5 }
};

/** The point of the trace nearest `frequencyHz` (a marker at the target), or undefined for an empty trace. */
export function pointNearest(points: readonly TracePoint[], frequencyHz: number): TracePoint | undefined {
	let best: TracePoint | undefined;
	for (const p of points) if (!best || Math.abs(p.frequencyHz - frequencyHz) < Math.abs(best.frequencyHz - frequencyHz)) best = p;
	return best;
}
