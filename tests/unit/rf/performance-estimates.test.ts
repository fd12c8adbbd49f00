import { describe, expect, it } from 'vitest';
import { performanceEstimates } from '../../../src/lib/rf/performance-estimates';
import { size } from '../../../src/lib/rf/size';

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
		const d = size({ frequencyHz: 3e9, substrate: { relativePermittivity: er, heightMm: ratio * lambda, lossTangent: 0, copperConductivitySPerM: 1e8 }, feed: 'edge' });
		if (d.patch.kind !== 'rectangular') throw new Error('rectangular expected');
		const closedForm = ((3.771 * (er - 1)) / (er * er)) * ratio * (d.patch.widthMm / d.patch.lengthMm);
		expect(Math.abs(d.estimates.bandwidthFraction / closedForm - 1)).toBeLessThan(0.35);
	});

	// A half-wave patch radiates with roughly 6–8 dBi directivity (common practice, no source).
	it('gives a patch directivity between 5 and 9 dBi', () => {
		const d = size({ frequencyHz: 10e9, substrate: { relativePermittivity: 2.2, heightMm: 1.588 } });
		expect(d.estimates.directivityDbi).toBeGreaterThan(5);
		expect(d.estimates.directivityDbi).toBeLessThan(9);
	});
});
