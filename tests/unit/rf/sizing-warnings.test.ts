import { describe, expect, it } from 'vitest';
import { RECTANGULAR_ACCURACY } from '../../../src/lib/rf/first-pass-accuracy';
import { sizingWarnings } from '../../../src/lib/rf/sizing-warnings';
import { sizeDocument } from '../../fixtures/designs/size-document';

const codes = (raw: unknown) => sizeDocument(raw).warnings.map((w) => w.code);
const fr4 = { relativePermittivity: 4.4, heightMm: 1.6, lossTangent: 0.02 };
const ptfe = { relativePermittivity: 2.2, heightMm: 1.575, lossTangent: 0.0009 };

describe('sizing warnings', () => {
	it('stays quiet for a low-loss inset patch at 2.45 GHz on a large enough ground', () => {
		expect(codes({ frequencyHz: 2.45e9, groundMarginMm: 40, substrate: ptfe })).toEqual([]);
	});

	// Surface-wave criterion h/λ0 ≤ 0.3/(2π√εr) (James & Hall 1989, from memory): 0.032 at εr 2.2, 0.015 at εr 10.2.
	it('judges a thick substrate by the εr-dependent surface-wave limit', () => {
		const at = (er: number, ratio: number) => codes({ frequencyHz: 3e9, feed: 'probe', probe: { drillDiameterMm: 1.4, clearanceDiameterMm: 4.1 }, groundMarginMm: 50, substrate: { relativePermittivity: er, heightMm: ratio * 99.93, lossTangent: 0.001 } });
		expect(at(2.2, 0.031)).not.toContain('thick-substrate');
		expect(at(2.2, 0.033)).toContain('thick-substrate');
		// the same h/λ0 is thick on a high-εr laminate
		expect(at(10.2, 0.02)).toContain('thick-substrate');
		expect(at(10.2, 0.014)).not.toContain('thick-substrate');
	});

	it('flags glass-epoxy at 2.45 GHz and at 433 MHz, where the dielectric loses more than the patch radiates', () => {
		const at245 = sizeDocument({ frequencyHz: 2.45e9, substrate: fr4 });
		expect(at245.estimates.radiationEfficiency).toBeLessThan(0.6);
		expect(at245.warnings.map((w) => w.code)).toEqual(expect.arrayContaining(['lossy-laminate', 'low-efficiency']));
		expect(codes({ frequencyHz: 433e6, feed: 'quarter-wave', substrate: fr4 })).toEqual(expect.arrayContaining(['lossy-laminate', 'low-efficiency']));
	});

	it('flags an inset deeper than 0.4·L and a notch wider than half the edge', () => {
		// a narrow patch has a high edge resistance, so 10 Ω lies deep inside it
		expect(codes({ frequencyHz: 2.45e9, targetImpedanceOhm: 10, patchWidthMm: 10, substrate: ptfe })).toContain('inset-too-deep');
		expect(codes({ frequencyHz: 10e9, substrate: { relativePermittivity: 2.2, heightMm: 1.588 } })).toContain('feed-wider-than-notch');
	});

	it('flags a feed point of 35 Ω under a 50 Ω line, and an edge feed straight into the edge resistance', () => {
		expect(codes({ frequencyHz: 2.45e9, targetImpedanceOhm: 35, groundMarginMm: 40, substrate: ptfe })).toContain('feed-mismatch');
		expect(codes({ frequencyHz: 2.45e9, targetImpedanceOhm: 48, groundMarginMm: 40, substrate: ptfe })).not.toContain('feed-mismatch');
		expect(codes({ frequencyHz: 2.45e9, feed: 'edge', groundMarginMm: 40, substrate: ptfe })).toContain('feed-mismatch');
	});

	it('flags a ground under λ0/2 even when the margin exceeds h (3h at 433–915 MHz)', () => {
		for (const f of [433e6, 915e6]) {
			const d = sizeDocument({ frequencyHz: f, feed: 'probe', probe: { drillDiameterMm: 1.4, clearanceDiameterMm: 4.1 }, substrate: { ...ptfe, heightMm: 1.524 } });
			expect(d.ground.marginMm).toBeGreaterThan(1.524);
			expect(d.warnings.map((w) => w.code)).toContain('small-ground');
		}
	});

	it('flags a ground margin under h, a narrow band, and a probe whose pad overhangs the edge', () => {
		expect(codes({ frequencyHz: 2.45e9, groundMarginMm: 1, substrate: fr4 })).toContain('ground-margin-small');
		expect(codes({ frequencyHz: 2.45e9, substrate: { relativePermittivity: 2.2, heightMm: 0.254, lossTangent: 0.0009 } })).toContain('narrow-bandwidth');
		expect(codes({ frequencyHz: 2.45e9, feed: 'probe', targetImpedanceOhm: 200, substrate: { relativePermittivity: 2.2, heightMm: 1.6 }, probe: { drillDiameterMm: 3, padDiameterMm: 15, clearanceDiameterMm: 16 } })).toContain('probe-near-edge');
	});

	// A 1.3 mm plated hole at −0.08 mm (common practice, no source) is 1.22 mm, under a 1.27 mm pin (from memory).
	it('flags a probe hole that can finish smaller than a common connector pin', () => {
		const probe = (drillDiameterMm: number) => codes({ frequencyHz: 2.45e9, feed: 'probe', groundMarginMm: 40, substrate: ptfe, probe: { drillDiameterMm, clearanceDiameterMm: 4.1 } });
		expect(probe(1.3)).toContain('probe-pin-fit');
		expect(probe(1.4)).not.toContain('probe-pin-fit');
	});

	it('names the assumed tanδ when the document gives none', () => {
		const d = sizeDocument({ frequencyHz: 2.45e9, substrate: { relativePermittivity: 4.3, heightMm: 1.6 } });
		const w = d.warnings.find((x) => x.code === 'assumed-loss-tangent');
		expect(w?.message).toContain('0.02');
		expect(d.input.substrate.lossTangent).toBe(0.02);
		expect(codes({ frequencyHz: 2.45e9, substrate: fr4 })).not.toContain('assumed-loss-tangent');
	});

	it('says when the design lies outside the data behind the resonance band', () => {
		expect(codes({ frequencyHz: 2.45e9, groundMarginMm: 40, substrate: { relativePermittivity: 1.5, heightMm: 1.6, lossTangent: 0.001 } })).toContain('outside-model-range');
		expect(codes({ frequencyHz: 2.45e9, groundMarginMm: 40, substrate: ptfe })).not.toContain('outside-model-range');
	});

	it('flags circular polarisation on a low-Q patch', () => {
		expect(codes({ frequencyHz: 10e9, shape: 'truncated-corner', feed: 'probe', substrate: { relativePermittivity: 2.2, heightMm: 3 } })).toContain('cp-outside-validity');
		expect(codes({ frequencyHz: 2.45e9, shape: 'truncated-corner', feed: 'probe', substrate: fr4 })).not.toContain('cp-outside-validity');
	});

	it('explains every warning in a sentence', () => {
		const all = sizingWarnings({
			heightMm: 10,
			freeSpaceWavelengthMm: 30,
			frequencyHz: 10e9,
			relativePermittivity: 4.4,
			lossTangent: 0.02,
			assumedLossTangent: { value: 0.02, materialClass: 'glass-epoxy (FR-4) class' },
			radiationEfficiency: 0.3,
			radiationQualityFactor: 80,
			marginMm: 1,
			groundWidthMm: 12,
			groundLengthMm: 12,
			bandwidthFraction: 0.001,
			qualityFactor: 5,
			circularlyPolarised: true,
			accuracy: RECTANGULAR_ACCURACY,
			inset: { depthMm: 5, lengthMm: 10 },
			feedWidth: { widthMm: 9, edgeMm: 10, notch: true },
			probe: { edgeDistanceMm: 0.1, padRadiusMm: 1, drillDiameterMm: 1.3 },
			feedPoint: { resistanceOhm: 35, lineImpedanceOhm: 50 }
		});
		expect(all.map((w) => w.code)).toEqual([
			'assumed-loss-tangent',
			'thick-substrate',
			'outside-model-range',
			'lossy-laminate',
			'low-efficiency',
			'inset-too-deep',
			'feed-wider-than-notch',
			'feed-mismatch',
			'ground-margin-small',
			'small-ground',
			'narrow-bandwidth',
			'probe-near-edge',
			'probe-pin-fit',
			'cp-outside-validity'
		]);
		for (const w of all) expect(w.message.length).toBeGreaterThan(40);
	});
});
