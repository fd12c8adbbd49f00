import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyzeMicrostrip } from '../../../src/lib/rf/analyze-microstrip';
import { dispersivePermittivity } from '../../../src/lib/rf/dispersive-permittivity';
import { InputError } from '../../../src/lib/schemas';

describe('dispersivePermittivity (Kirschning–Jansen)', () => {
	const line = (w: number, h: number, er: number, f: number) => {
		const stat = analyzeMicrostrip({ widthMm: w, heightMm: h, relativePermittivity: er });
		return dispersivePermittivity({ widthMm: w, heightMm: h, relativePermittivity: er, staticEffectivePermittivity: stat.effectivePermittivity, frequencyHz: f });
	};

	it('starts at the static value and rises monotonically towards εr within its validity range', () => {
		fc.assert(
			fc.property(fc.double({ min: 0.1, max: 100, noNaN: true }), fc.double({ min: 1.01, max: 20, noNaN: true }), fc.double({ min: 0.05, max: 5, noNaN: true }), (u, er, h) => {
				const stat = analyzeMicrostrip({ widthMm: u * h, heightMm: h, relativePermittivity: er }).effectivePermittivity;
				expect(line(u * h, h, er, 0)).toBeCloseTo(stat, 12);
				// Up to h/λ0 = 0.13, the model's stated validity.
				const fMax = (0.13 * 299_792_458e3) / h;
				let previous = stat;
				for (const share of [0.1, 0.3, 0.6, 1]) {
					const eps = line(u * h, h, er, share * fMax);
					expect(eps).toBeGreaterThanOrEqual(previous);
					expect(eps).toBeLessThan(er);
					previous = eps;
				}
			}),
			{ numRuns: 300 }
		);
	});

	// A 50 Ω line on 1.6 mm FR-4 rises by a few per cent from DC to 6 GHz (common practice, no source).
	it('raises εeff of 50 Ω on FR-4 by 2–8 % at 6 GHz', () => {
		const dc = line(3.06, 1.6, 4.4, 0);
		const rise = line(3.06, 1.6, 4.4, 6e9) / dc - 1;
		expect(rise).toBeGreaterThan(0.02);
		expect(rise).toBeLessThan(0.08);
	});

	it('rejects a static εeff above εr', () => {
		expect(() => dispersivePermittivity({ widthMm: 1, heightMm: 1, relativePermittivity: 3, staticEffectivePermittivity: 4, frequencyHz: 1e9 })).toThrow(InputError);
	});
});
