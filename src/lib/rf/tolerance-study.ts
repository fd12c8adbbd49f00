// Seeded Monte Carlo over εr, thickness and etch tolerances: the spread of the resonant frequency and the share of boards in band.
import { InputError, type DesignInput } from '../schemas';
import { requireInRange } from './guard';
import { resonantFrequencyHz } from './resonant-frequency';
import type { SizedPatch } from './sized-design';
import { size } from './size';

export interface ToleranceOptions {
	/** PRNG seed, an integer in [0, 2³² − 1]; the same seed gives the same study. Default 1. */
	seed?: number;
	/** Number of simulated boards, 1–100 000. Default 1000. */
	samples?: number;
	/** ± shift of every copper edge by etching (a dimension changes by twice it). Default 0. */
	etchToleranceMm?: number;
}

export interface ToleranceStudy {
	seed: number;
	samples: number;
	etchToleranceMm: number;
	relativePermittivityTolerance: number;
	heightToleranceMm: number;
	/** Design target f0. */
	targetFrequencyHz: number;
	/** Resonance of the nominal board recomputed from its dimensions. */
	nominalFrequencyHz: number;
	meanFrequencyHz: number;
	/** Population standard deviation of the simulated resonances. */
	standardDeviationHz: number;
	minFrequencyHz: number;
	maxFrequencyHz: number;
	/** The estimated VSWR ≤ 2 band f0·(1 ± B/2), B from the estimates. */
	bandLowHz: number;
	bandHighHz: number;
	/** Share of simulated boards whose resonance lies inside the band, 0..1. */
	shareInBand: number;
	/** Every simulated resonance, in sample order. */
	frequenciesHz: number[];
}

/** mulberry32: a 32-bit state PRNG returning uniforms in [0, 1); small, fast and reproducible. */
function mulberry32(seed: number): () => number {
	let state = seed >>> 0;
	return () => {
		state = (state + 0x6d2b79f5) | 0;
		let t = Math.imul(state ^ (state >>> 15), 1 | state);
		t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
		return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
	};
}

/** Standard normal deviates by the Box–Muller transform. */
function normals(uniform: () => number): () => number {
	return () => {
		const u1 = 1 - uniform();
		const u2 = uniform();
		return Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * u2);
	};
}

/** Datasheet ± tolerances are read as ±3σ of a normal spread (common practice, no source). */
const SIGMAS_PER_TOLERANCE = 3;

function etched(patch: SizedPatch, shiftMm: number): SizedPatch {
	const grow = (x: number) => Math.max(x + 2 * shiftMm, 1e-9 * x);
	switch (patch.kind) {
		case 'rectangular':
			return { ...patch, widthMm: grow(patch.widthMm), lengthMm: grow(patch.lengthMm) };
		case 'nearly-square':
			return { ...patch, widthMm: grow(patch.widthMm), lengthMm: grow(patch.lengthMm) };
		case 'truncated-corner':
			return { ...patch, sideMm: grow(patch.sideMm) };
		case 'circular':
			return { ...patch, radiusMm: Math.max(patch.radiusMm + shiftMm, 1e-9 * patch.radiusMm) };
	}
}

function optionsOf(options: unknown): Required<ToleranceOptions> {
	if (options === undefined) return { seed: 1, samples: 1000, etchToleranceMm: 0 };
	if (options === null || typeof options !== 'object' || Array.isArray(options)) {
		throw new InputError([{ path: 'options', value: options, message: 'must be an object with seed, samples, etchToleranceMm' }]);
	}
	const o = options as Record<string, unknown>;
	const seed = o.seed === undefined ? 1 : requireInRange('seed', o.seed, 0, 2 ** 32 - 1);
	const samples = o.samples === undefined ? 1000 : requireInRange('samples', o.samples, 1, 100_000);
	const etch = o.etchToleranceMm === undefined ? 0 : requireInRange('etchToleranceMm', o.etchToleranceMm, 0, 1);
	if (!Number.isInteger(seed)) throw new InputError([{ path: 'seed', value: seed, message: 'must be an integer; allowed range [0, 4294967295]' }]);
	if (!Number.isInteger(samples)) throw new InputError([{ path: 'samples', value: samples, message: 'must be an integer; allowed range [1, 100000]' }]);
	return { seed, samples, etchToleranceMm: etch };
}

/**
 * Simulates `samples` boards: εr, h (the input's ± tolerances) and one etch shift per board, each
 * normal with σ = tolerance/3, and recomputes each board's resonance from its dimensions. The
 * same input and seed always give the same numbers; zero tolerances give zero spread.
 */
export function toleranceStudy(input: DesignInput, options?: ToleranceOptions): ToleranceStudy {
	const opts = optionsOf(options);
	const sized = size(input);
	const s = sized.input.substrate;
	const er = s.relativePermittivity;
	const h = s.heightMm;
	const normal = normals(mulberry32(opts.seed));
	const nominal = resonantFrequencyHz(sized.patch, { relativePermittivity: er, heightMm: h });
	const half = (sized.estimates.bandwidthFraction / 2) * sized.frequencyHz;
	const bandLowHz = sized.frequencyHz - half;
	const bandHighHz = sized.frequencyHz + half;
	const frequenciesHz: number[] = new Array(opts.samples);
	let inBand = 0;
	let sumDeviation = 0;
	let min = Infinity;
	let max = -Infinity;
	for (let i = 0; i < opts.samples; i++) {
		const erSample = Math.max(er + (s.relativePermittivityTolerance / SIGMAS_PER_TOLERANCE) * normal(), 1 + 1e-9);
		const hSample = Math.max(h + (s.heightToleranceMm / SIGMAS_PER_TOLERANCE) * normal(), 1e-9 * h);
		const shift = (opts.etchToleranceMm / SIGMAS_PER_TOLERANCE) * normal();
		const f = resonantFrequencyHz(etched(sized.patch, shift), { relativePermittivity: erSample, heightMm: hSample });
		frequenciesHz[i] = f;
		sumDeviation += f - nominal;
		if (f < min) min = f;
		if (f > max) max = f;
		if (f >= bandLowHz && f <= bandHighHz) inBand++;
	}
	// Deviations from the nominal keep identical samples at exactly zero spread.
	const meanDeviation = sumDeviation / opts.samples;
	let sumSquares = 0;
	for (const f of frequenciesHz) sumSquares += (f - nominal - meanDeviation) ** 2;
	return {
		seed: opts.seed,
		samples: opts.samples,
		etchToleranceMm: opts.etchToleranceMm,
		relativePermittivityTolerance: s.relativePermittivityTolerance,
		heightToleranceMm: s.heightToleranceMm,
		targetFrequencyHz: sized.frequencyHz,
		nominalFrequencyHz: nominal,
		meanFrequencyHz: nominal + meanDeviation,
		standardDeviationHz: Math.sqrt(sumSquares / opts.samples),
		minFrequencyHz: min,
		maxFrequencyHz: max,
		bandLowHz,
		bandHighHz,
		shareInBand: inBand / opts.samples,
		frequenciesHz
	};
}
