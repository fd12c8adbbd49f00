import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { VACUUM_PERMEABILITY_H_PER_M } from '../../../src/lib/units';
import { performanceEstimates } from '../../../src/lib/rf/performance-estimates';
import { sizeDocument } from '../../fixtures/designs/size-document';

describe('performanceEstimates', () => {
	it('has 100 % efficiency and BW = 1/(Q√2) when there are no losses', () => {
		// εr 1: no dielectric, so no surface wave either
		const e = performanceEstimates({ frequencyHz: 1e9, heightMm: 1, relativePermittivity: 1, lossTangent: 0, copperConductivitySPerM: 1e300, radiationQualityFactor: 40, directivity: 4 });
		expect(e.radiationEfficiency).toBeCloseTo(1, 9);
		expect(e.bandwidthFraction).toBeCloseTo(1 / (40 * Math.SQRT2), 9);
		expect(e.gainDbi).toBeCloseTo(10 * Math.log10(4), 6);
	});

	it('loses efficiency and gains bandwidth with a lossy laminate', () => {
		const low = performanceEstimates({ frequencyHz: 2.45e9, heightMm: 1.6, relativePermittivity: 4.4, lossTangent: 0.001, copperConductivitySPerM: 5.8e7, radiationQualityFactor: 60, directivity: 4 });
		const high = performanceEstimates({ frequencyHz: 2.45e9, heightMm: 1.6, relativePermittivity: 4.4, lossTangent: 0.02, copperConductivitySPerM: 5.8e7, radiationQualityFactor: 60, directivity: 4 });
		expect(high.radiationEfficiency).toBeLessThan(low.radiationEfficiency);
		expect(high.bandwidthFraction).toBeGreaterThan(low.bandwidthFraction);
	});

	// Jackson & Alexopoulos, IEEE Trans. AP 39(3), 1991 (from memory), thin-substrate closed form:
	// BW(VSWR 2) ≈ 3.771·(εr − 1)/εr²·(h/λ0)·(W/L). An independent route to the same quantity; the
	// two agree only roughly, so this checks the order of our cavity Q, not its digits.
	it.each([
		[2.2, 0.01],
		[2.2, 0.02],
		[4.4, 0.01],
		[3.5, 0.015]
	])('lands within 35 %% of the Jackson–Alexopoulos bandwidth for εr %f, h/λ0 %f', (er, ratio) => {
		const lambda = 299.792458 / 3;
		const d = sizeDocument({ frequencyHz: 3e9, substrate: { relativePermittivity: er, heightMm: ratio * lambda, lossTangent: 0, copperConductivitySPerM: 1e8 }, feed: 'edge' });
		if (d.patch.kind !== 'rectangular') throw new Error('rectangular expected');
		const closedForm = ((3.771 * (er - 1)) / (er * er)) * ratio * (d.patch.widthMm / d.patch.lengthMm);
		expect(Math.abs(d.estimates.bandwidthFraction / closedForm - 1)).toBeLessThan(0.35);
	});

	// A half-wave patch radiates with roughly 6–8 dBi directivity (common practice, no source).
	it('gives a patch directivity between 5 and 9 dBi', () => {
		const d = sizeDocument({ frequencyHz: 10e9, substrate: { relativePermittivity: 2.2, heightMm: 1.588 } });
		expect(d.estimates.directivityDbi).toBeGreaterThan(5);
		expect(d.estimates.directivityDbi).toBeLessThan(9);
	});

	const laminate = fc.record({
		relativePermittivity: fc.double({ min: 2, max: 10.2, noNaN: true }),
		heightMm: fc.double({ min: 0.25, max: 1.6, noNaN: true }),
		lossTangent: fc.double({ min: 0.005, max: 0.03, noNaN: true })
	});
	const sizeOn = (frequencyHz: number, substrate: { relativePermittivity: number; heightMm: number; lossTangent: number }) =>
		sizeDocument({ frequencyHz, feed: 'quarter-wave', substrate: { ...substrate, copperConductivitySPerM: 5.8e7 } });

	it('loses efficiency as tanδ grows at fixed geometry (property)', () => {
		fc.assert(
			fc.property(laminate, fc.double({ min: 0.4e9, max: 6e9, noNaN: true }), fc.double({ min: 1.1, max: 5, noNaN: true }), (sub, f, k) => {
				const lower = sizeOn(f, sub);
				const higher = sizeOn(f, { ...sub, lossTangent: sub.lossTangent * k });
				// same input geometry: the patch does not depend on tanδ
				expect(higher.patch).toEqual(lower.patch);
				expect(higher.estimates.radiationEfficiency).toBeLessThan(lower.estimates.radiationEfficiency);
			}),
			{ numRuns: 60 }
		);
	});

	// The radiation-Q trend alone (η0 = 1/(1 + Q_rad·(tanδ + 1/Q_c)), Balanis §14.2.5, from memory) lets the
	// efficiency of a lossy laminate rise with frequency as Q_rad falls; the surface wave must take back at
	// least its share: η/η0 never rises with frequency, and η ≤ η0.
	it('never lets the efficiency rise with frequency beyond the radiation-Q trend on a fixed lossy laminate (property)', () => {
		const trend = (d: ReturnType<typeof sizeOn>, f: number, sub: { heightMm: number; lossTangent: number }) => {
			const qc = (sub.heightMm / 1000) * Math.sqrt(Math.PI * f * VACUUM_PERMEABILITY_H_PER_M * 5.8e7);
			return 1 / (1 + d.estimates.radiationQualityFactor * (sub.lossTangent + 1 / qc));
		};
		let checked = 0;
		fc.assert(
			fc.property(laminate, fc.double({ min: 0.4e9, max: 4e9, noNaN: true }), fc.double({ min: 1.05, max: 2.5, noNaN: true }), (sub, f1, k) => {
				const f2 = f1 * k;
				const lo = sizeOn(f1, sub);
				const hi = sizeOn(f2, sub);
				const r1 = lo.estimates.radiationEfficiency / trend(lo, f1, sub);
				const r2 = hi.estimates.radiationEfficiency / trend(hi, f2, sub);
				expect(r1).toBeLessThanOrEqual(1 + 1e-12);
				expect(r2).toBeLessThan(r1);
				checked++;
			}),
			{ numRuns: 60 }
		);
		expect(checked).toBe(60);
	});

	it('turns the efficiency of 1.6 mm glass-epoxy down at high frequency (surface waves counted)', () => {
		const sub = { relativePermittivity: 4.4, heightMm: 1.6, lossTangent: 0.02 };
		const eff = (f: number) => sizeOn(f, sub).estimates.radiationEfficiency;
		expect(eff(12e9)).toBeLessThan(eff(8e9));
	});
});

