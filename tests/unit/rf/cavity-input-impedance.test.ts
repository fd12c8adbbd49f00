import { describe, expect, it } from 'vitest';
import { cavityModelResponse, cavityModelRlc, parallelRlcImpedance, reflectionFromImpedance } from '../../../src/lib/rf/cavity-input-impedance';
import { sizeDocument } from '../../fixtures/designs/size-document';

const rlc = { resonantFrequencyHz: 2.45e9, qualityFactor: 40, resistanceOhm: 50 };

describe('parallelRlcImpedance', () => {
	it('is purely resistive and equal to R at resonance', () => {
		const z = parallelRlcImpedance(rlc, 2.45e9);
		expect(z.resistanceOhm).toBeCloseTo(50, 12);
		expect(z.reactanceOhm).toBeCloseTo(0, 12);
	});

	// Pozar, Microwave Engineering 4th ed., §6.1 (from memory): the half-power points of a parallel resonator lie where
	// Q·(f/f0 − f0/f) = ±1; there |Z| = R/√2 and the phase is ∓45°, inductive below resonance and capacitive above.
	it('has |Z| = R/√2 at ±45° at its half-power points', () => {
		const q = rlc.qualityFactor;
		const f0 = rlc.resonantFrequencyHz;
		for (const sign of [-1, 1]) {
			// f/f0 − f0/f = s/Q  →  f = f0·(s/(2Q) + √(1 + 1/(4Q²)))
			const f = f0 * (sign / (2 * q) + Math.sqrt(1 + 1 / (4 * q * q)));
			const z = parallelRlcImpedance(rlc, f);
			expect(Math.hypot(z.resistanceOhm, z.reactanceOhm)).toBeCloseTo(50 / Math.SQRT2, 9);
			expect(Math.atan2(z.reactanceOhm, z.resistanceOhm)).toBeCloseTo((-sign * Math.PI) / 4, 9);
		}
	});

	it('refuses a non-positive quality factor with a typed error naming it', () => {
		expect(() => parallelRlcImpedance({ ...rlc, qualityFactor: 0 }, 2.45e9)).toThrow(/qualityFactor/);
	});
});

describe('reflectionFromImpedance', () => {
	// Pozar, Microwave Engineering 4th ed., eq. 2.35 (from memory): Γ = (ZL − Z0)/(ZL + Z0).
	it.each([
		[50, 0, 0, 0], // matched
		[100, 0, 1 / 3, 0], // 2:1 resistive
		[0, 50, 0, 1], // a pure reactance equal to Z0: |Γ| = 1 at +90°
		[25, -25, -0.2, -0.4] // (−25 − 25j)/(75 − 25j) = −0.2 − 0.4j
	])('Z = %f + j%f Ω against 50 Ω gives Γ = %f + j%f', (r, x, re, im) => {
		const g = reflectionFromImpedance(r, x, 50);
		expect(g.re).toBeCloseTo(re, 12);
		expect(g.im).toBeCloseTo(im, 12);
	});
});

describe('the cavity-model prediction of a sized design', () => {
	const sized = sizeDocument({ frequencyHz: 2.45e9, shape: 'rectangular', feed: 'inset', substrate: { relativePermittivity: 3.55, heightMm: 1.524, lossTangent: 0.0027 } });

	it('resonates at the design frequency, matched to the target impedance', () => {
		const model = cavityModelRlc(sized);
		expect(model.resonantFrequencyHz).toBe(2.45e9);
		expect(model.resistanceOhm).toBe(50);
		expect(model.qualityFactor).toBe(sized.estimates.qualityFactor);
		const [at] = cavityModelResponse(model, [2.45e9]);
		expect(Math.hypot(at.s11Re, at.s11Im)).toBeLessThan(1e-12);
	});

	// The VSWR ≤ 2 bandwidth of a matched parallel resonator is (S − 1)/(Q·√S) in the narrow-band limit (Pozar §6.1 with
	// the VSWR circle; from memory): the same closed form the sizing estimates use, reached here through the curve.
	it('is matched to VSWR 2 over the bandwidth the sizing estimates give', () => {
		const model = cavityModelRlc(sized);
		const fs = Array.from({ length: 20001 }, (_, i) => 2.3e9 + i * 15e3);
		const inBand = cavityModelResponse(model, fs).filter((s) => {
			const g = Math.hypot(s.s11Re, s.s11Im);
			return (1 + g) / (1 - g) <= 2;
		});
		const width = (inBand.at(-1)!.frequencyHz - inBand[0].frequencyHz) / 2.45e9;
		expect(width).toBeCloseTo(sized.estimates.bandwidthFraction, 3);
	});

	it('uses the radiating-edge resistance for an edge feed', () => {
		const edge = sizeDocument({ frequencyHz: 2.45e9, feed: 'edge', substrate: { relativePermittivity: 3.55, heightMm: 1.524 } });
		expect(cavityModelRlc(edge).resistanceOhm).toBe(edge.edgeResistanceOhm);
	});
});
