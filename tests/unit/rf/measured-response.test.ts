// Measured-S11 analysis on synthetic sweeps whose resonance and −10 dB edges are known in closed form.
import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/lib/schemas/input-error';
import {
	analyzeMeasuredResponse,
	vswrFromReflection,
	MIN_REFLECTION_DB,
	type ReflectionSample
} from '../../../src/lib/rf/measured-response';

const Z0_OHM = 50;

/**
 * Γ of a series RLC resonator seen from a Z0 line: Z = R + jX, X = Q·R·(f/f0 − f0/f).
 * |Γ|² = ((R−Z0)² + X²)/((R+Z0)² + X²) grows with X², so the minimum is exactly at f0
 * (a resonator model standing in for a patch near resonance; Pozar, Microwave Engineering, §6.1, from memory).
 */
function seriesRlcReflection(frequencyHz: number, resonanceHz: number, resistanceOhm: number, q: number) {
	const x = q * resistanceOhm * (frequencyHz / resonanceHz - resonanceHz / frequencyHz);
	// Γ = (Z − Z0)/(Z + Z0) with Z = R + jx.
	const nr = resistanceOhm - Z0_OHM;
	const dr = resistanceOhm + Z0_OHM;
	const d = dr * dr + x * x;
	return { re: (nr * dr + x * x) / d, im: (x * dr - nr * x) / d };
}

/** Frequencies where the series RLC's |S11| is exactly `levelDb`: solve X = ±Xc for f. */
function seriesRlcEdgesHz(resonanceHz: number, resistanceOhm: number, q: number, levelDb: number): [number, number] {
	const g2 = 10 ** (levelDb / 10);
	const xc = Math.sqrt((g2 * (resistanceOhm + Z0_OHM) ** 2 - (resistanceOhm - Z0_OHM) ** 2) / (1 - g2));
	const edge = (sign: number) => {
		const u = (sign * xc) / (q * resistanceOhm);
		return (resonanceHz * (u + Math.sqrt(u * u + 4))) / 2;
	};
	return [edge(-1), edge(1)];
}

function sweep(startHz: number, stepHz: number, count: number, s11: (f: number) => { re: number; im: number }): ReflectionSample[] {
	return Array.from({ length: count }, (_, i) => {
		const frequencyHz = startHz + i * stepHz;
		return { frequencyHz, s11: s11(frequencyHz) };
	});
}

/** A reflection of a given dB level with a phase that turns with frequency (the analysis uses |Γ| only). */
function fromDb(db: number, frequencyHz: number) {
	const m = 10 ** (db / 20);
	const phase = frequencyHz * 1e-9;
	return { re: m * Math.cos(phase), im: m * Math.sin(phase) };
}

describe('analyzeMeasuredResponse on a series-RLC dip', () => {
	const resonanceHz = 2.4517e9; // off the 1 MHz grid on purpose
	const stepHz = 1e6;
	const samples = sweep(2.3e9, stepHz, 301, (f) => seriesRlcReflection(f, resonanceHz, 40, 30));
	const result = analyzeMeasuredResponse(samples);

	it('finds the resonance within one frequency step, refined between the samples', () => {
		expect(Math.abs(result.resonance.frequencyHz - resonanceHz)).toBeLessThan(stepHz);
		expect(result.resonance.method).toBe('parabolic');
		// The refinement lands closer than the nearest sample does (0.3 MHz away).
		expect(Math.abs(result.resonance.frequencyHz - resonanceHz)).toBeLessThan(0.1 * stepHz);
		expect(result.resonance.atSweepEdge).toBe(false);
	});

	it('reports the depth of the dip: |Γ| = |R−Z0|/(R+Z0) = 1/9 at resonance', () => {
		expect(result.resonance.s11Db).toBeCloseTo(20 * Math.log10(1 / 9), 2);
		expect(result.minimumVswr).toBeCloseTo(vswrFromReflection(1 / 9), 3);
		expect(result.minimumVswr).toBeCloseTo(1.25, 3); // 50/40 for a resistive mismatch
	});

	it('puts the −10 dB edges where the closed form does, within a twentieth of a step', () => {
		const [lowerHz, upperHz] = seriesRlcEdgesHz(resonanceHz, 40, 30, -10);
		expect(result.band.reached).toBe(true);
		if (!result.band.reached) return;
		expect(Math.abs(result.band.lowerHz - lowerHz)).toBeLessThan(0.05 * stepHz);
		expect(Math.abs(result.band.upperHz - upperHz)).toBeLessThan(0.05 * stepHz);
		expect(result.band.bandwidthHz).toBeCloseTo(upperHz - lowerHz, -5);
		expect(result.band.fractionalBandwidth).toBeCloseTo((upperHz - lowerHz) / ((upperHz + lowerHz) / 2), 4);
		expect(result.band.lowerAtSweepEdge || result.band.upperAtSweepEdge).toBe(false);
	});

	it('gives every point its dB and VSWR', () => {
		expect(result.points).toHaveLength(samples.length);
		const p = result.points[0];
		expect(p.s11Db).toBeCloseTo(20 * Math.log10(Math.hypot(samples[0].s11.re, samples[0].s11.im)), 12);
		expect(p.vswr).toBeCloseTo((1 + p.reflectionMagnitude) / (1 - p.reflectionMagnitude), 12);
	});
});

describe('analyzeMeasuredResponse on shapes with exact answers', () => {
	it('recovers the vertex of an exactly parabolic dB curve on an uneven grid', () => {
		const fr = 5.8123e9;
		const freqs = [5.70e9, 5.75e9, 5.79e9, 5.80e9, 5.83e9, 5.9e9];
		const db = (f: number) => -30 + 4e-18 * (f - fr) ** 2;
		const result = analyzeMeasuredResponse(freqs.map((f) => ({ frequencyHz: f, s11: fromDb(db(f), f) })));
		expect(result.resonance.frequencyHz).toBeCloseTo(fr, -1);
		expect(result.resonance.s11Db).toBeCloseTo(-30, 8);
	});

	it('finds band edges exactly where a piecewise-linear dB curve crosses −10 dB', () => {
		// dB(f) = −25 + 30·|f − 2 GHz|/100 MHz crosses −10 dB at 2 GHz ± 50 MHz, between samples 20 MHz apart.
		const db = (f: number) => -25 + (30 * Math.abs(f - 2e9)) / 1e8;
		const result = analyzeMeasuredResponse(sweep(1.83e9, 2e7, 18, (f) => fromDb(db(f), f)));
		expect(result.band.reached).toBe(true);
		if (!result.band.reached) return;
		expect(result.band.lowerHz).toBeCloseTo(1.95e9, 0);
		expect(result.band.upperHz).toBeCloseTo(2.05e9, 0);
		expect(result.band.centreHz).toBeCloseTo(2e9, 0);
		expect(result.band.fractionalBandwidth).toBeCloseTo(0.05, 12);
	});

	it('says plainly when |S11| never reaches −10 dB', () => {
		const result = analyzeMeasuredResponse(sweep(1e9, 1e7, 21, (f) => fromDb(-6 - 2 * Math.exp(-(((f - 1.1e9) / 3e7) ** 2)), f)));
		expect(result.band.reached).toBe(false);
		if (result.band.reached) return;
		expect(result.band.bestS11Db).toBeCloseTo(-8, 6);
		expect(result.band.message).toMatch(/never reaches -10 dB/);
		expect(result.resonance.frequencyHz).toBeCloseTo(1.1e9, -5);
	});

	it('flags a band that runs off the end of the sweep', () => {
		const result = analyzeMeasuredResponse(sweep(1e9, 1e7, 11, (f) => fromDb(-20 + (2 * (f - 1e9)) / 1e7, f)));
		expect(result.resonance.atSweepEdge).toBe(true);
		expect(result.resonance.method).toBe('sample');
		expect(result.band.reached).toBe(true);
		if (!result.band.reached) return;
		expect(result.band.lowerAtSweepEdge).toBe(true);
		expect(result.band.lowerHz).toBe(1e9);
		expect(result.band.upperAtSweepEdge).toBe(false);
		expect(result.band.upperHz).toBeCloseTo(1.05e9, 0);
	});

	it('uses a custom threshold (−6 dB)', () => {
		const db = (f: number) => -25 + (30 * Math.abs(f - 2e9)) / 1e8;
		const result = analyzeMeasuredResponse(sweep(1.83e9, 2e7, 18, (f) => fromDb(db(f), f)), { thresholdDb: -6 });
		if (!result.band.reached) throw new Error('band expected');
		expect(result.band.upperHz - result.band.lowerHz).toBeCloseTo((2 * 19 * 1e8) / 30, 0);
	});

	it('handles a perfect match (Γ = 0) with a finite dB floor and VSWR 1', () => {
		const result = analyzeMeasuredResponse([
			{ frequencyHz: 1e9, s11: { re: 0.5, im: 0 } },
			{ frequencyHz: 2e9, s11: { re: 0, im: 0 } },
			{ frequencyHz: 3e9, s11: { re: 0.5, im: 0 } }
		]);
		expect(result.points[1].s11Db).toBe(MIN_REFLECTION_DB);
		expect(result.minimumVswr).toBe(1);
		expect(result.resonance.frequencyHz).toBeCloseTo(2e9, 0);
	});

	it('analyses a single sample without refining', () => {
		const result = analyzeMeasuredResponse([{ frequencyHz: 1e9, s11: { re: 1 / 3, im: 0 } }]);
		expect(result.resonance.method).toBe('sample');
		expect(result.resonance.atSweepEdge).toBe(false);
		expect(result.minimumVswr).toBeCloseTo(2, 12); // |Γ| = 1/3 ↔ VSWR 2 (Pozar eq. 2.41, from memory)
	});

	it('gives VSWR Infinity for total reflection', () => {
		expect(vswrFromReflection(1)).toBe(Infinity);
	});
});

describe('analyzeMeasuredResponse input checks', () => {
	const bad: { name: string; samples: unknown; path: string; thresholdDb?: number }[] = [
		{ name: 'no samples', samples: [], path: 'samples' },
		{ name: 'unordered frequencies', samples: [{ frequencyHz: 2, s11: { re: 0, im: 0 } }, { frequencyHz: 1, s11: { re: 0, im: 0 } }], path: 'samples.1.frequencyHz' },
		{ name: 'a NaN reflection', samples: [{ frequencyHz: 1, s11: { re: NaN, im: 0 } }], path: 'samples.0.s11' },
		{ name: 'a negative frequency', samples: [{ frequencyHz: -1, s11: { re: 0, im: 0 } }], path: 'samples.0.frequencyHz' },
		{ name: 'a positive threshold', samples: [{ frequencyHz: 1, s11: { re: 0, im: 0 } }], path: 'thresholdDb', thresholdDb: 3 }
	];
	for (const b of bad) {
		it(`rejects ${b.name} with an InputError`, () => {
			let caught: unknown;
			try {
				analyzeMeasuredResponse(b.samples as ReflectionSample[], { thresholdDb: b.thresholdDb });
			} catch (err) {
				caught = err;
			}
			expect(caught).toBeInstanceOf(InputError);
			expect((caught as InputError).first.path).toBe(b.path);
		});
	}
});
