import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyzeMicrostrip } from '../../../src/lib/rf/analyze-microstrip';
import { synthesizeMicrostrip } from '../../../src/lib/rf/synthesize-microstrip';
import { InputError } from '../../../src/lib/schemas';

// The supported range: εr (1, 30] (from 1.001, where the strict inequalities stay above rounding),
// h from 0.05 to 100 mm, copper 0–210 µm, Z0 10–200 Ω.
const er = fc.double({ min: 1.001, max: 30, noNaN: true });
const heightMm = fc.double({ min: 0.05, max: 100, noNaN: true });
const copperMm = fc.double({ min: 0, max: 0.21, noNaN: true });

describe('synthesizeMicrostrip', () => {
	// Rule of thumb: 50 Ω on FR-4 (εr 4.4, h 1.6 mm) is about 3 mm wide (common practice, no source).
	it('gives about 3 mm for 50 Ω on 1.6 mm FR-4', () => {
		const w = synthesizeMicrostrip({ impedanceOhm: 50, heightMm: 1.6, relativePermittivity: 4.4, thicknessMm: 0.035 }).widthMm;
		expect(w).toBeGreaterThan(2.8);
		expect(w).toBeLessThan(3.2);
	});

	// Pozar, Microwave Engineering, ch. 3 microstrip design example; from memory: W/d ≈ 3.08, εe ≈ 1.87.
	it("finds Pozar's W/d ≈ 3.08 for 50 Ω on εr 2.2, d 1.27 mm", () => {
		const line = synthesizeMicrostrip({ impedanceOhm: 50, heightMm: 1.27, relativePermittivity: 2.2 });
		expect(Math.abs(line.widthMm / 1.27 / 3.081 - 1)).toBeLessThan(0.005);
		expect(Math.abs(line.effectivePermittivity / 1.87 - 1)).toBeLessThan(0.01);
	});

	it('returns the target within 1e-6 when analysed again, over the whole range', () => {
		let realised = 0;
		fc.assert(
			fc.property(fc.double({ min: 10, max: 200, noNaN: true }), heightMm, er, copperMm, (z, h, e, t) => {
				let w: number;
				try {
					w = synthesizeMicrostrip({ impedanceOhm: z, heightMm: h, relativePermittivity: e, thicknessMm: t }).widthMm;
				} catch (err) {
					// Only honest refusals: copper much thicker than the dielectric caps Z0 even for a hair-thin strip.
					expect(err).toBeInstanceOf(InputError);
					expect(analyzeMicrostrip({ widthMm: 1e-5 * h, heightMm: h, relativePermittivity: e, thicknessMm: t }).impedanceOhm).toBeLessThan(z);
					return;
				}
				realised++;
				const back = analyzeMicrostrip({ widthMm: w, heightMm: h, relativePermittivity: e, thicknessMm: t }).impedanceOhm;
				expect(Math.abs(back / z - 1)).toBeLessThan(1e-6);
			}),
			{ numRuns: 400 }
		);
		expect(realised).toBeGreaterThan(300);
	});

	it('has Z0 strictly falling as W grows, and (εr+1)/2 < εeff < εr at zero thickness', () => {
		fc.assert(
			fc.property(fc.double({ min: 0.01, max: 100, noNaN: true }), fc.double({ min: 1.0001, max: 2, noNaN: true }), heightMm, er, copperMm, (u, grow, h, e, t) => {
				const narrow = analyzeMicrostrip({ widthMm: u * h, heightMm: h, relativePermittivity: e, thicknessMm: t });
				const wide = analyzeMicrostrip({ widthMm: u * h * grow, heightMm: h, relativePermittivity: e, thicknessMm: t });
				expect(wide.impedanceOhm).toBeLessThan(narrow.impedanceOhm);
				const bare = analyzeMicrostrip({ widthMm: u * h, heightMm: h, relativePermittivity: e });
				expect(bare.effectivePermittivity).toBeGreaterThan((e + 1) / 2);
				expect(bare.effectivePermittivity).toBeLessThan(e);
			}),
			{ numRuns: 400 }
		);
	});

	it('throws only InputError for unusable arguments', () => {
		fc.assert(
			fc.property(fc.anything(), fc.anything(), fc.anything(), (z, h, e) => {
				try {
					synthesizeMicrostrip({ impedanceOhm: z as number, heightMm: h as number, relativePermittivity: e as number });
				} catch (err) {
					expect(err).toBeInstanceOf(InputError);
				}
			}),
			{ numRuns: 300 }
		);
		expect(() => synthesizeMicrostrip({ impedanceOhm: 50, heightMm: 0, relativePermittivity: 4.4 })).toThrow(/heightMm/);
	});
});
