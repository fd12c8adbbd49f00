// Port time series → S11, Zin, resonance, −10 dB band and VSWR, by a direct DFT of voltage and current.
import type { FieldCheckResult, S11Sample } from '../schemas/field-check';
import type { PortSeries } from './types';
import { maxOf } from '../geometry';

/** Frequencies evaluated across the check band. */
export const DEFAULT_POINT_COUNT = 301;
/** The matched-band threshold, dB. */
export const MATCH_THRESHOLD_DB = -10;

export interface PortAnalysisInput {
	voltage: PortSeries;
	current: PortSeries;
	referenceImpedanceOhm: number;
	targetFrequencyHz: number;
	/** Frequencies to evaluate: lowHz to highHz in `pointCount` equal steps. */
	band: { lowHz: number; highHz: number };
	pointCount?: number;
}

export type PortAnalysis = Pick<FieldCheckResult, 'samples' | 'resonance' | 'deviationFraction' | 's11AtTargetDb' | 'band' | 'minimumVswr'>;

interface Complex {
	re: number;
	im: number;
}

/**
 * X(f) = Σ x(t_k)·e^(−j2πf·t_k)·Δt at the series' own instants t_k. Using each series' own time
 * stamps keeps the half-timestep offset of the engine's current samples (the leapfrog scheme
 * updates H half a step after E) in the phase, so Z = V/I is not skewed by it.
 */
export function dft(series: PortSeries, frequencyHz: number): Complex {
	const { timeS, values } = series;
	const dt = timeS.length > 1 ? timeS[1] - timeS[0] : 1;
	let re = 0;
	let im = 0;
	const w = 2 * Math.PI * frequencyHz;
	for (let k = 0; k < values.length; k++) {
		const phase = w * timeS[k];
		re += values[k] * Math.cos(phase);
		im -= values[k] * Math.sin(phase);
	}
	return { re: re * dt, im: im * dt };
}

const div = (a: Complex, b: Complex): Complex => {
	const d = b.re * b.re + b.im * b.im;
	return { re: (a.re * b.re + a.im * b.im) / d, im: (a.im * b.re - a.re * b.im) / d };
};
const magnitudeDb = (c: { s11Re: number; s11Im: number }) => 20 * Math.log10(Math.max(Math.hypot(c.s11Re, c.s11Im), 1e-12));

/** S11 and Zin at one frequency. */
function sampleAt(input: PortAnalysisInput, frequencyHz: number): S11Sample {
	const z = div(dft(input.voltage, frequencyHz), dft(input.current, frequencyHz));
	const zRef = input.referenceImpedanceOhm;
	const s = div({ re: z.re - zRef, im: z.im }, { re: z.re + zRef, im: z.im });
	return { frequencyHz, s11Re: s.re, s11Im: s.im, resistanceOhm: z.re, reactanceOhm: z.im };
}

/** The vertex of the parabola through three equally spaced points (x offset in steps, value). */
function parabolaVertex(ym: number, y0: number, yp: number): { offset: number; value: number } {
	const denominator = ym - 2 * y0 + yp;
	if (denominator <= 0) return { offset: 0, value: y0 };
	const offset = (0.5 * (ym - yp)) / denominator;
	return { offset, value: y0 - 0.25 * (ym - yp) * offset };
}

/** Where the dB curve crosses `thresholdDb` between samples i and i+1 (linear in dB). */
function crossing(samples: readonly S11Sample[], db: readonly number[], i: number, thresholdDb: number): number {
	const f0 = samples[i].frequencyHz;
	const f1 = samples[i + 1].frequencyHz;
	return f0 + ((thresholdDb - db[i]) / (db[i + 1] - db[i])) * (f1 - f0);
}

/**
 * S11 = (Z − Zref)/(Z + Zref) with Z = V(f)/I(f) across the band; the resonance is the |S11|
 * minimum refined by a parabola through it and its neighbours (in dB); the −10 dB band is the
 * crossing pair around that minimum; VSWR = (1 + |S11|)/(1 − |S11|) at the minimum.
 */
export function analyzePortSeries(input: PortAnalysisInput): PortAnalysis {
	const n = input.pointCount ?? DEFAULT_POINT_COUNT;
	const { lowHz, highHz } = input.band;
	const samples: S11Sample[] = Array.from({ length: n }, (_, i) => sampleAt(input, lowHz + ((highHz - lowHz) * i) / (n - 1)));
	const db = samples.map(magnitudeDb);
	let iMin = 0;
	for (let i = 1; i < n; i++) if (db[i] < db[iMin]) iMin = i;
	const step = (highHz - lowHz) / (n - 1);
	// a dip is a minimum inside the band, not at its ends
	const isDip = iMin > 0 && iMin < n - 1;
	let resonance: PortAnalysis['resonance'] = null;
	if (isDip) {
		const v = parabolaVertex(db[iMin - 1], db[iMin], db[iMin + 1]);
		resonance = { frequencyHz: samples[iMin].frequencyHz + v.offset * step, s11Db: v.value };
	}
	let band: PortAnalysis['band'] = null;
	if (db[iMin] <= MATCH_THRESHOLD_DB) {
		let lo = iMin;
		while (lo > 0 && db[lo - 1] <= MATCH_THRESHOLD_DB) lo--;
		let hi = iMin;
		while (hi < n - 1 && db[hi + 1] <= MATCH_THRESHOLD_DB) hi++;
		const lowEdge = lo > 0 ? crossing(samples, db, lo - 1, MATCH_THRESHOLD_DB) : samples[0].frequencyHz;
		const highEdge = hi < n - 1 ? crossing(samples, db, hi, MATCH_THRESHOLD_DB) : samples[n - 1].frequencyHz;
		band = { lowHz: lowEdge, highHz: highEdge };
	}
	const target = sampleAt(input, input.targetFrequencyHz);
	const minMagnitude = Math.min(10 ** ((resonance?.s11Db ?? db[iMin]) / 20), 0.999999);
	return {
		samples,
		resonance,
		deviationFraction: resonance ? (resonance.frequencyHz - input.targetFrequencyHz) / input.targetFrequencyHz : null,
		s11AtTargetDb: magnitudeDb(target),
		band,
		minimumVswr: (1 + minMagnitude) / (1 - minMagnitude)
	};
}

/** Reads a port voltage or current text file ("%" comment lines, then "t value" rows). */
export function parsePortSeries(text: string): PortSeries {
	const timeS: number[] = [];
	const values: number[] = [];
	for (const line of text.split('\n')) {
		const trimmed = line.trim();
		if (trimmed === '' || trimmed.startsWith('%')) continue;
		const [t, v] = trimmed.split(/\s+/).map(Number);
		if (!Number.isFinite(t) || !Number.isFinite(v)) throw new RangeError(`port series: cannot read the row "${trimmed.slice(0, 60)}"`);
		timeS.push(t);
		values.push(v);
	}
	if (timeS.length < 2) throw new RangeError('port series: fewer than two samples');
	return { timeS, values };
}

/** The resonance of a sampled Zin by its two impedance definitions. */
export interface ImpedanceResonance {
	maxResistanceHz: number | null;
	maxResistanceOhm: number;
	zeroReactanceHz: number | null;
}

/**
 * The resonance of a sampled Zin by the two impedance definitions (beside the S11 minimum, which
 * depends on the reference impedance): the local maximum of the input resistance nearest to
 * `nearHz` (the cavity's parallel resonance; a probe's series reactance does not move it; a higher
 * mode or the probe's own rise at the band's top is another maximum) refined by a parabola through
 * it and its neighbours, and the zero crossing of the reactance from + to − nearest to it (linear
 * between samples; null when the reactance never crosses, as behind an inductive probe).
 */
export function impedanceResonance(samples: readonly Pick<S11Sample, 'frequencyHz' | 'resistanceOhm' | 'reactanceOhm'>[], nearHz: number): ImpedanceResonance {
	if (samples.length < 3) throw new RangeError('impedance resonance: fewer than three samples');
	const r = samples.map((s) => s.resistanceOhm);
	let iR = -1;
	for (let i = 1; i + 1 < samples.length; i++) {
		if (!(r[i] >= r[i - 1] && r[i] > r[i + 1])) continue;
		if (iR < 0 || Math.abs(samples[i].frequencyHz - nearHz) < Math.abs(samples[iR].frequencyHz - nearHz)) iR = i;
	}
	let maxResistanceHz: number | null = null;
	let maxResistanceOhm = maxOf(r);
	if (iR > 0) {
		// the vertex of a maximum: the parabola of the negated values
		const v = parabolaVertex(-r[iR - 1], -r[iR], -r[iR + 1]);
		maxResistanceHz = samples[iR].frequencyHz + v.offset * (samples[iR + 1].frequencyHz - samples[iR].frequencyHz);
		maxResistanceOhm = -v.value;
	}
	let zeroReactanceHz: number | null = null;
	const near = maxResistanceHz ?? nearHz;
	for (let i = 0; i + 1 < samples.length; i++) {
		const a = samples[i];
		const b = samples[i + 1];
		if (!(a.reactanceOhm > 0 && b.reactanceOhm <= 0)) continue;
		const f = a.frequencyHz + (a.reactanceOhm / (a.reactanceOhm - b.reactanceOhm)) * (b.frequencyHz - a.frequencyHz);
		if (zeroReactanceHz === null || Math.abs(f - near) < Math.abs(zeroReactanceHz - near)) zeroReactanceHz = f;
	}
	return { maxResistanceHz, maxResistanceOhm, zeroReactanceHz };
}
