// The predicted band drawn behind a measurement: the estimated fractional bandwidth centred on the design frequency.
import { describe, expect, it } from 'vitest';
import { predictedBand } from '../../../src/lib/design/predicted-band';

describe('predictedBand', () => {
	it('centres the estimated bandwidth on the design frequency: 4 % of 2.45 GHz is 2.401–2.499 GHz', () => {
		const band = predictedBand({ frequencyHz: 2.45e9, estimates: { bandwidthFraction: 0.04 } });
		expect(band.lowHz).toBeCloseTo(2.401e9, 0);
		expect(band.highHz).toBeCloseTo(2.499e9, 0);
	});

	it('is one frequency wide for a zero bandwidth', () => {
		expect(predictedBand({ frequencyHz: 5.8e9, estimates: { bandwidthFraction: 0 } })).toEqual({ lowHz: 5.8e9, highHz: 5.8e9 });
	});
});
