import { describe, expect, it } from 'vitest';
import { analyzeMicrostrip } from '../../../src/lib/rf/analyze-microstrip';
import { quarterWaveTransformer } from '../../../src/lib/rf/quarter-wave-transformer';
import { InputError } from '../../../src/lib/schemas';

describe('quarterWaveTransformer', () => {
	const t = quarterWaveTransformer({ loadResistanceOhm: 228.3, sourceResistanceOhm: 50, frequencyHz: 10e9, heightMm: 1.588, relativePermittivity: 2.2, thicknessMm: 0.035 });

	// Pozar, Microwave Engineering, §2.5: Z1 = √(Z0·RL).
	it('has the geometric-mean impedance √(50·228.3) ≈ 106.8 Ω', () => {
		expect(t.impedanceOhm).toBeCloseTo(Math.sqrt(50 * 228.3), 6);
		const back = analyzeMicrostrip({ widthMm: t.widthMm, heightMm: 1.588, relativePermittivity: 2.2, thicknessMm: 0.035 });
		expect(back.impedanceOhm).toBeCloseTo(t.impedanceOhm, 6);
	});

	it('is a quarter of the guided wavelength with the dispersive εeff, longer than with εr', () => {
		const lambda0 = 299_792_458 / 10e9 * 1000;
		expect(t.lengthMm).toBeCloseTo(lambda0 / (4 * Math.sqrt(t.effectivePermittivity)), 9);
		expect(t.lengthMm).toBeGreaterThan(lambda0 / (4 * Math.sqrt(2.2)));
		expect(t.lengthMm).toBeLessThan(lambda0 / 4);
	});

	it('rejects a zero load with an InputError', () => {
		expect(() => quarterWaveTransformer({ loadResistanceOhm: 0, sourceResistanceOhm: 50, frequencyHz: 1e9, heightMm: 1, relativePermittivity: 3 })).toThrow(InputError);
	});
});
