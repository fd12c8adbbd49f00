import { describe, expect, it } from 'vitest';
import { size } from '../../../src/lib/rf/size';
import { sizingWarnings } from '../../../src/lib/rf/sizing-warnings';

const codes = (raw: unknown) => size(raw).warnings.map((w) => w.code);
const fr4 = { relativePermittivity: 4.4, heightMm: 1.6, lossTangent: 0.02 };

describe('sizing warnings', () => {
	it('stays quiet for an ordinary FR-4 inset patch at 2.45 GHz', () => {
		expect(codes({ frequencyHz: 2.45e9, substrate: fr4 })).toEqual([]);
	});

	it('flags an electrically thick substrate (h/λ0 > 0.05)', () => {
		expect(codes({ frequencyHz: 10e9, feed: 'probe', substrate: { relativePermittivity: 2.2, heightMm: 1.588 } })).toContain('thick-substrate');
		expect(codes({ frequencyHz: 9e9, feed: 'probe', substrate: { relativePermittivity: 2.2, heightMm: 1.588 } })).not.toContain('thick-substrate');
	});

	it('flags a lossy laminate at 6 GHz and above (tanδ ≥ 0.01, common practice)', () => {
		expect(codes({ frequencyHz: 6e9, feed: 'probe', substrate: { ...fr4, heightMm: 0.8 } })).toContain('lossy-laminate');
		expect(codes({ frequencyHz: 5.9e9, feed: 'probe', substrate: { ...fr4, heightMm: 0.8 } })).not.toContain('lossy-laminate');
	});

	it('flags an inset deeper than 0.4·L and a notch wider than half the edge', () => {
		expect(codes({ frequencyHz: 2.45e9, targetImpedanceOhm: 15, substrate: fr4 })).toContain('inset-too-deep');
		expect(codes({ frequencyHz: 10e9, substrate: { relativePermittivity: 2.2, heightMm: 1.588 } })).toContain('feed-wider-than-notch');
	});

	it('flags a ground margin under h, a narrow band, and a probe whose pad overhangs the edge', () => {
		expect(codes({ frequencyHz: 2.45e9, groundMarginMm: 1, substrate: fr4 })).toContain('ground-margin-small');
		expect(codes({ frequencyHz: 2.45e9, substrate: { relativePermittivity: 2.2, heightMm: 0.254, lossTangent: 0.0009 } })).toContain('narrow-bandwidth');
		expect(codes({ frequencyHz: 2.45e9, feed: 'probe', targetImpedanceOhm: 200, substrate: { relativePermittivity: 2.2, heightMm: 1.6 }, probe: { drillDiameterMm: 3, padDiameterMm: 15, clearanceDiameterMm: 16 } })).toContain('probe-near-edge');
	});

	it('flags circular polarisation on a low-Q patch', () => {
		expect(codes({ frequencyHz: 10e9, shape: 'truncated-corner', feed: 'probe', substrate: { relativePermittivity: 2.2, heightMm: 3 } })).toContain('cp-outside-validity');
		expect(codes({ frequencyHz: 2.45e9, shape: 'truncated-corner', feed: 'probe', substrate: fr4 })).not.toContain('cp-outside-validity');
	});

	it('explains every warning in a sentence', () => {
		const all = sizingWarnings({ heightMm: 10, freeSpaceWavelengthMm: 30, frequencyHz: 10e9, lossTangent: 0.02, marginMm: 1, bandwidthFraction: 0.001, qualityFactor: 5, circularlyPolarised: true, inset: { depthMm: 5, lengthMm: 10 }, feedWidth: { widthMm: 9, edgeMm: 10, notch: true }, probe: { edgeDistanceMm: 0.1, padRadiusMm: 1 } });
		expect(all.map((w) => w.code)).toEqual(['thick-substrate', 'lossy-laminate', 'inset-too-deep', 'feed-wider-than-notch', 'ground-margin-small', 'narrow-bandwidth', 'probe-near-edge', 'cp-outside-validity']);
		for (const w of all) expect(w.message.length).toBeGreaterThan(40);
	});
});
