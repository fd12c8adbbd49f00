import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { surfaceWaveEfficiency, surfaceWaveLimitRatio } from '../../../src/lib/rf/surface-wave';

describe('surface waves', () => {
	// Jackson & Alexopoulos 1991 as given in Balanis 4th ed. §14.2.6 (from memory), worked by hand:
	// εr 2.2, h/λ0 0.02: c1 = 0.6281, 3π·k0h·(1 − 1/εr)³/(4c1) = 0.0765 → 0.929.
	it.each([
		[2.2, 0.02, 0.929],
		[10.2, 0.02, 0.807]
	])('gives the space-wave share of εr %f at h/λ0 %f as %f', (er, ratio, expected) => {
		expect(surfaceWaveEfficiency(ratio * 100, 2.99792458e9, er)).toBeCloseTo(expected, 3);
	});

	it('has no surface wave without a dielectric (εr 1)', () => {
		expect(surfaceWaveEfficiency(5, 3e9, 1)).toBe(1);
	});

	// h/λ0 ≤ 0.3/(2π√εr) (James & Hall 1989, from memory): 0.0322 at εr 2.2.
	it('puts the thickness limit at 0.3/(2π√εr)', () => {
		expect(surfaceWaveLimitRatio(2.2)).toBeCloseTo(0.0322, 4);
		expect(surfaceWaveLimitRatio(10.2)).toBeCloseTo(0.01495, 4);
	});

	it('lowers the thickness limit as εr rises (property)', () => {
		fc.assert(
			fc.property(fc.double({ min: 1.01, max: 29, noNaN: true }), fc.double({ min: 0.01, max: 1, noNaN: true }), (er, step) => {
				expect(surfaceWaveLimitRatio(er + step)).toBeLessThan(surfaceWaveLimitRatio(er));
			}),
			{ numRuns: 200 }
		);
	});

	it('loses more to surface waves on a thicker or higher-εr slab (property)', () => {
		fc.assert(
			fc.property(fc.double({ min: 1.5, max: 12, noNaN: true }), fc.double({ min: 0.002, max: 0.08, noNaN: true }), fc.double({ min: 1.05, max: 2, noNaN: true }), (er, ratio, k) => {
				const at = (e: number, r: number) => surfaceWaveEfficiency(r * 100, 2.99792458e9, e);
				expect(at(er, ratio * k)).toBeLessThan(at(er, ratio));
				expect(at(er * k, ratio)).toBeLessThan(at(er, ratio));
			}),
			{ numRuns: 200 }
		);
	});
});
