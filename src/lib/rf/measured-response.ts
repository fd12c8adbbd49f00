// What a measured S11 sweep says about a built patch: return loss in dB, VSWR, resonance, the −10 dB band and its width.
import { InputError } from '../schemas/input-error';
import type { ReflectionSample, ReflectionValue } from '../schemas/reflection-sample';

export type { ReflectionSample, ReflectionValue };

/** One analysed frequency. */
export interface ResponsePoint {
	frequencyHz: number;
	/** |Γ| (linear). */
	reflectionMagnitude: number;
	/** 20·log10|Γ| in dB (≤ 0 for a passive antenna); floored at MIN_REFLECTION_DB for Γ = 0. */
	s11Db: number;
	/** (1+|Γ|)/(1−|Γ|); Infinity when |Γ| ≥ 1 (all power reflected). JSON writes Infinity as null. */
	vswr: number;
}

export interface MeasuredResonance {
	/** Frequency of the |S11| minimum, refined by a parabola through the three samples around it. */
	frequencyHz: number;
	/** |S11| at the refined minimum, dB. */
	s11Db: number;
	/** VSWR at the refined minimum. */
	vswr: number;
	/** Index of the lowest sample. */
	sampleIndex: number;
	/** How the frequency was found: parabolic refinement, or the bare sample (at a sweep edge or a flat top). */
	method: 'parabolic' | 'sample';
	/** The minimum is the first or last sample: the true resonance may lie outside the sweep. */
	atSweepEdge: boolean;
}

/**
 * The band around the resonance where |S11| ≤ thresholdDb, edges found by linear interpolation in dB
 * between the samples either side of each crossing. An edge that runs off the sweep is the sweep's end
 * and is flagged: the band is then at least that wide.
 */
export type MatchedBand =
	| {
			reached: true;
			thresholdDb: number;
			lowerHz: number;
			upperHz: number;
			/** The band still meets the threshold at the first sample: lowerHz is the sweep start. */
			lowerAtSweepEdge: boolean;
			/** The band still meets the threshold at the last sample: upperHz is the sweep stop. */
			upperAtSweepEdge: boolean;
			bandwidthHz: number;
			/** (lowerHz + upperHz)/2. */
			centreHz: number;
			/** bandwidthHz / centreHz (0.02 = 2 %). */
			fractionalBandwidth: number;
	  }
	| {
			reached: false;
			thresholdDb: number;
			/** The lowest |S11| measured, dB: above the threshold. */
			bestS11Db: number;
			/** A sentence for the user. */
			message: string;
	  };

export interface MeasuredResponse {
	points: ResponsePoint[];
	resonance: MeasuredResonance;
	band: MatchedBand;
	/** Lowest VSWR among the samples (the measured value, no interpolation). */
	minimumVswr: number;
	/** Frequency of that sample. */
	minimumVswrFrequencyHz: number;
}

export interface MeasuredResponseOptions {
	/** |S11| level that bounds the matched band; −10 dB (VSWR ≈ 1.92) by common practice, no source. */
	thresholdDb?: number;
}

/** Floor for 20·log10|Γ| when |Γ| is 0 (a perfect match): keeps the curve finite for the parabola. */
export const MIN_REFLECTION_DB = -300;
export const DEFAULT_MATCH_THRESHOLD_DB = -10;

export function reflectionDb(magnitude: number): number {
	return magnitude > 0 ? Math.max(MIN_REFLECTION_DB, 20 * Math.log10(magnitude)) : MIN_REFLECTION_DB;
}

/** VSWR = (1+|Γ|)/(1−|Γ|) (Pozar, Microwave Engineering, 4th ed., eq. 2.41). */
export function vswrFromReflection(magnitude: number): number {
	return magnitude >= 1 ? Infinity : (1 + magnitude) / (1 - magnitude);
}

function checkSamples(samples: readonly ReflectionSample[]): void {
	if (!Array.isArray(samples) || samples.length === 0) {
		throw new InputError([{ path: 'samples', value: samples, message: 'at least one frequency of S11 is needed' }]);
	}
	samples.forEach((s, i) => {
		if (typeof s?.frequencyHz !== 'number' || !Number.isFinite(s.frequencyHz) || s.frequencyHz < 0) {
			throw new InputError([{ path: `samples.${i}.frequencyHz`, value: s?.frequencyHz, message: 'must be a finite frequency; allowed range [0, ∞) Hz' }]);
		}
		if (i > 0 && !(s.frequencyHz > samples[i - 1].frequencyHz)) {
			throw new InputError([{ path: `samples.${i}.frequencyHz`, value: s.frequencyHz, message: `must be greater than the previous frequency (${samples[i - 1].frequencyHz} Hz)` }]);
		}
		if (typeof s.s11?.re !== 'number' || typeof s.s11?.im !== 'number' || !Number.isFinite(s.s11.re) || !Number.isFinite(s.s11.im)) {
			throw new InputError([{ path: `samples.${i}.s11`, value: s.s11, message: 'must have a finite real and imaginary part' }]);
		}
	});
}

/**
 * Vertex of the parabola through (x0,y0), (x1,y1), (x2,y2) for unevenly spaced x (Lagrange form);
 * undefined when the three points are collinear.
 */
function parabolaVertex(x0: number, y0: number, x1: number, y1: number, x2: number, y2: number): { x: number; y: number } | undefined {
	// Work relative to the middle sample so that GHz-scale abscissae keep their precision.
	const a = x0 - x1;
	const b = x2 - x1;
	const da = y0 - y1;
	const db = y2 - y1;
	const denominator = a * b * (a - b);
	// y − y1 = c1·t + c2·t² with t = x − x1.
	const c2 = (b * da - a * db) / denominator;
	const c1 = (a * a * db - b * b * da) / denominator;
	if (!(c2 > 0) || !Number.isFinite(c1)) return undefined;
	const t = Math.min(b, Math.max(a, -c1 / (2 * c2)));
	return { x: x1 + t, y: y1 + c1 * t + c2 * t * t };
}

/** Frequency where the dB curve crosses `level` between two samples, by linear interpolation in dB. */
function crossingHz(fA: number, dbA: number, fB: number, dbB: number, level: number): number {
	return fA + ((level - dbA) / (dbB - dbA)) * (fB - fA);
}

/** Analyses a measured S11 sweep. Throws InputError for empty, unordered or non-finite samples. */
export function analyzeMeasuredResponse(samples: readonly ReflectionSample[], options: MeasuredResponseOptions = {}): MeasuredResponse {
	checkSamples(samples);
	const thresholdDb = options.thresholdDb ?? DEFAULT_MATCH_THRESHOLD_DB;
	if (!Number.isFinite(thresholdDb) || thresholdDb >= 0 || thresholdDb < MIN_REFLECTION_DB) {
		throw new InputError([{ path: 'thresholdDb', value: thresholdDb, message: `allowed range [${MIN_REFLECTION_DB}, 0) dB` }]);
	}
	const points: ResponsePoint[] = samples.map((s) => {
		const reflectionMagnitude = Math.hypot(s.s11.re, s.s11.im);
		return { frequencyHz: s.frequencyHz, reflectionMagnitude, s11Db: reflectionDb(reflectionMagnitude), vswr: vswrFromReflection(reflectionMagnitude) };
	});

	let k = 0;
	for (let i = 1; i < points.length; i++) if (points[i].s11Db < points[k].s11Db) k = i;
	const last = points.length - 1;

	let resonance: MeasuredResonance = {
		frequencyHz: points[k].frequencyHz,
		s11Db: points[k].s11Db,
		vswr: points[k].vswr,
		sampleIndex: k,
		method: 'sample',
		atSweepEdge: points.length > 1 && (k === 0 || k === last)
	};
	if (k > 0 && k < last) {
		const [p0, p1, p2] = [points[k - 1], points[k], points[k + 1]];
		const vertex = parabolaVertex(p0.frequencyHz, p0.s11Db, p1.frequencyHz, p1.s11Db, p2.frequencyHz, p2.s11Db);
		if (vertex) {
			const s11Db = Math.max(MIN_REFLECTION_DB, vertex.y);
			resonance = { ...resonance, frequencyHz: vertex.x, s11Db, vswr: vswrFromReflection(10 ** (s11Db / 20)), method: 'parabolic' };
		}
	}

	let band: MatchedBand;
	if (points[k].s11Db > thresholdDb) {
		band = {
			reached: false,
			thresholdDb,
			bestS11Db: points[k].s11Db,
			message: `|S11| never reaches ${thresholdDb} dB in this sweep (best ${points[k].s11Db.toFixed(2)} dB at ${points[k].frequencyHz} Hz): no matched band`
		};
	} else {
		let lo = k;
		while (lo > 0 && points[lo - 1].s11Db <= thresholdDb) lo--;
		let hi = k;
		while (hi < last && points[hi + 1].s11Db <= thresholdDb) hi++;
		const lowerAtSweepEdge = lo === 0;
		const upperAtSweepEdge = hi === last;
		const lowerHz = lowerAtSweepEdge
			? points[0].frequencyHz
			: crossingHz(points[lo - 1].frequencyHz, points[lo - 1].s11Db, points[lo].frequencyHz, points[lo].s11Db, thresholdDb);
		const upperHz = upperAtSweepEdge
			? points[last].frequencyHz
			: crossingHz(points[hi].frequencyHz, points[hi].s11Db, points[hi + 1].frequencyHz, points[hi + 1].s11Db, thresholdDb);
		const bandwidthHz = upperHz - lowerHz;
		const centreHz = (lowerHz + upperHz) / 2;
		band = {
			reached: true,
			thresholdDb,
			lowerHz,
			upperHz,
			lowerAtSweepEdge,
			upperAtSweepEdge,
			bandwidthHz,
			centreHz,
			fractionalBandwidth: centreHz > 0 ? bandwidthHz / centreHz : 0
		};
	}

	return { points, resonance, band, minimumVswr: points[k].vswr, minimumVswrFrequencyHz: points[k].frequencyHz };
}
