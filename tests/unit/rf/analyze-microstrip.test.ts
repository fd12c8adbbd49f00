import { describe, expect, it } from 'vitest';
import { analyzeMicrostrip } from '../../../src/lib/rf/analyze-microstrip';
import { InputError } from '../../../src/lib/schemas';

describe('analyzeMicrostrip', () => {
	// Pozar, Microwave Engineering, ch. 3 microstrip design example; from memory: εr 2.2, d 0.127 cm,
	// 50 Ω → W/d 3.081, εe 1.87 (Pozar's εe uses the simpler 1/√(1+12d/W) form, so εe agrees to ~1 %).
	it("gives Pozar's 50 Ω line on εr 2.2 at W/d = 3.081", () => {
		const line = analyzeMicrostrip({ widthMm: 3.081 * 1.27, heightMm: 1.27, relativePermittivity: 2.2 });
		expect(line.impedanceOhm).toBeGreaterThan(49.75);
		expect(line.impedanceOhm).toBeLessThan(50.25);
		expect(Math.abs(line.effectivePermittivity / 1.87 - 1)).toBeLessThan(0.01);
	});

	// Rule of thumb: a 50 Ω line on FR-4 (εr 4.4, h 1.6 mm) is about 3 mm wide (common practice, no source).
	it('puts 50 Ω near 3 mm on 1.6 mm FR-4', () => {
		const line = analyzeMicrostrip({ widthMm: 3.0, heightMm: 1.6, relativePermittivity: 4.4, thicknessMm: 0.035 });
		expect(line.impedanceOhm).toBeGreaterThan(48);
		expect(line.impedanceOhm).toBeLessThan(52);
	});

	it('lowers the impedance when the copper gets thicker', () => {
		const thin = analyzeMicrostrip({ widthMm: 1, heightMm: 0.8, relativePermittivity: 3.5, thicknessMm: 0 });
		const thick = analyzeMicrostrip({ widthMm: 1, heightMm: 0.8, relativePermittivity: 3.5, thicknessMm: 0.07 });
		expect(thick.impedanceOhm).toBeLessThan(thin.impedanceOhm);
	});

	it('rejects a negative height with an InputError naming it', () => {
		expect(() => analyzeMicrostrip({ widthMm: 1, heightMm: -1, relativePermittivity: 3 })).toThrow(InputError);
		expect(() => analyzeMicrostrip({ widthMm: 1, heightMm: -1, relativePermittivity: 3 })).toThrow(/heightMm/);
	});
});
