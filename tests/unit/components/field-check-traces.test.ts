import { describe, expect, it } from 'vitest';
import { decimateTrace, describeResonance, extentOf, impedanceOf, modelTrace, s11Db, type TracePoint } from '../../../src/lib/components/field-check-traces';

describe('extentOf', () => {
	it('finds the range of a million values without overflowing the stack', () => {
		const values = Array.from({ length: 1_000_000 }, (_, i) => Math.sin(i));
		const [lo, hi] = extentOf(values);
		expect(lo).toBeLessThan(-0.9999);
		expect(hi).toBeGreaterThan(0.9999);
	});
	it('skips values that are not finite', () => {
		expect(extentOf([3, Infinity, -2, NaN])).toEqual([-2, 3]);
	});
});

describe('decimateTrace', () => {
	const trace: TracePoint[] = Array.from({ length: 100_001 }, (_, i) => ({ frequencyHz: 2e9 + i * 1e4, re: i === 61_234 ? 0.001 : 0.9, im: 0 }));

	it('keeps at most the limit, the ends, frequency order, and a one-sample dip', () => {
		const out = decimateTrace(trace, 600);
		expect(out.length).toBeLessThanOrEqual(600);
		expect(out[0]).toBe(trace[0]);
		expect(out.at(-1)).toBe(trace.at(-1));
		for (let i = 1; i < out.length; i++) expect(out[i].frequencyHz).toBeGreaterThan(out[i - 1].frequencyHz);
		expect(out).toContain(trace[61_234]);
	});
	it('leaves a short trace alone', () => {
		expect(decimateTrace(trace.slice(0, 10), 600)).toEqual(trace.slice(0, 10));
	});
});

describe('impedanceOf', () => {
	// Pozar, Microwave Engineering 4th ed., eq. 2.35 (from memory): Γ = (Z − Z0)/(Z + Z0), so Γ = 1/3 ↔ 100 Ω on 50 Ω.
	it('inverts the reflection coefficient', () => {
		const z = impedanceOf({ frequencyHz: 1, re: -0.2, im: -0.4 }, 50);
		expect(z.resistanceOhm).toBeCloseTo(25, 10);
		expect(z.reactanceOhm).toBeCloseTo(-25, 10);
		expect(impedanceOf({ frequencyHz: 1, re: 1 / 3, im: 0 }, 50).resistanceOhm).toBeCloseTo(100, 10);
	});
});

describe('modelTrace', () => {
	it('dips at the resonance it was given', () => {
		const t = modelTrace({ resonantFrequencyHz: 2.45e9, qualityFactor: 30, resistanceOhm: 50 }, 2.3e9, 2.6e9, 50, 301);
		let best = t.points[0];
		for (const p of t.points) if (s11Db(p) < s11Db(best)) best = p;
		expect(best.frequencyHz).toBeCloseTo(2.45e9, -3);
	});
});

describe('describeResonance', () => {
	it.each([
		[-0.018, -7, 'resonates 1.8 % low; run Homing?', true],
		[0.025, -4, 'resonates 2.5 % high; run Homing?', true],
		[0.002, -22, 'resonates on target (0.2 % high)', false],
		[-0.001, -6, 'resonates on target (0.1 % low), but S11 is only -6.0 dB there; run Homing?', true]
	])('deviation %f with S11 %f dB at target reads "%s"', (deviationFraction, s11AtTargetDb, text, suggestHoming) => {
		expect(describeResonance({ resonance: { frequencyHz: 2.45e9 * (1 + deviationFraction), s11Db: -20 }, deviationFraction, s11AtTargetDb })).toEqual({ text, suggestHoming });
	});
	it('says so when no dip lies in the band', () => {
		expect(describeResonance({ resonance: null, deviationFraction: null, s11AtTargetDb: -1.2 }).text).toMatch(/^no resonance dip/);
	});
});
