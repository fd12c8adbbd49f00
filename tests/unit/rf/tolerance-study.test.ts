import { describe, expect, it } from 'vitest';
import { toleranceStudy as studyOf, type ToleranceOptions } from '../../../src/lib/rf/tolerance-study';
import { InputError, parseDesignInput } from '../../../src/lib/schemas';

/** The study of a document as a user writes it: parsed at the edge, then studied. */
const toleranceStudy = (doc: unknown, options?: ToleranceOptions) => studyOf(parseDesignInput(doc), options);

const fr4 = { frequencyHz: 2.45e9, substrate: { relativePermittivity: 4.4, heightMm: 1.6, relativePermittivityTolerance: 0.2, heightToleranceMm: 0.08 } };

describe('toleranceStudy', () => {
	it('gives identical results for the same seed and different ones for another seed', () => {
		const a = toleranceStudy(fr4, { seed: 42, samples: 500, etchToleranceMm: 0.03 });
		const b = toleranceStudy(fr4, { seed: 42, samples: 500, etchToleranceMm: 0.03 });
		const c = toleranceStudy(fr4, { seed: 43, samples: 500, etchToleranceMm: 0.03 });
		expect(b).toEqual(a);
		expect(c.frequenciesHz).not.toEqual(a.frequenciesHz);
	});

	it('has exactly zero spread with zero tolerances', () => {
		const s = toleranceStudy({ frequencyHz: 2.45e9, substrate: { relativePermittivity: 4.4, heightMm: 1.6 } }, { seed: 1, samples: 200 });
		expect(s.standardDeviationHz).toBe(0);
		expect(s.minFrequencyHz).toBe(s.maxFrequencyHz);
		expect(s.meanFrequencyHz).toBe(s.nominalFrequencyHz);
		expect(Math.abs(s.nominalFrequencyHz / 2.45e9 - 1)).toBeLessThan(1e-9);
		expect(s.shareInBand).toBe(1);
	});

	it('spreads more with a wider εr tolerance, roughly as f ∝ 1/√εr predicts', () => {
		const narrow = toleranceStudy({ ...fr4, substrate: { ...fr4.substrate, heightToleranceMm: 0, relativePermittivityTolerance: 0.1 } }, { seed: 5, samples: 4000 });
		const wide = toleranceStudy({ ...fr4, substrate: { ...fr4.substrate, heightToleranceMm: 0, relativePermittivityTolerance: 0.3 } }, { seed: 5, samples: 4000 });
		expect(wide.standardDeviationHz).toBeGreaterThan(2.5 * narrow.standardDeviationHz);
		// σf/f ≈ ½·σεr/εr·(∂ln εeff/∂ln εr ≈ 0.95) with σεr = 0.1/3 (± read as 3σ): about 0.36 %.
		expect(narrow.standardDeviationHz / 2.45e9).toBeGreaterThan(0.0025);
		expect(narrow.standardDeviationHz / 2.45e9).toBeLessThan(0.0045);
		expect(wide.shareInBand).toBeLessThan(narrow.shareInBand);
	});

	it('rejects bad options with InputError naming them', () => {
		expect(() => toleranceStudy(fr4, { samples: 0 })).toThrow(/samples/);
		expect(() => toleranceStudy(fr4, { seed: 1.5 })).toThrow(InputError);
		expect(() => toleranceStudy(fr4, { etchToleranceMm: -1 })).toThrow(/etchToleranceMm/);
		expect(() => toleranceStudy({}, { seed: 1 })).toThrow(InputError);
	});
});
