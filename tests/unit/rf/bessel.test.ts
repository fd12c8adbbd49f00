import { describe, expect, it } from 'vitest';
import { besselJ, TM11_EIGENVALUE } from '../../../src/lib/rf/bessel';

describe('besselJ', () => {
	// Abramowitz & Stegun, Handbook of Mathematical Functions, table 9.1 (from memory).
	const table: [number, number, number][] = [
		[0, 1, 0.7651976866],
		[1, 1, 0.4400505857],
		[2, 1, 0.1149034849],
		[0, 5, -0.1775967713],
		[1, 10, 0.0434727462],
		[0, 30, -0.0863679835]
	];
	it.each(table)('J%i(%f) = %f', (n, x, value) => {
		expect(besselJ(n, x)).toBeCloseTo(value, 9);
	});

	it('vanishes at the first zero of J0 and has J1′ = (J0 − J2)/2 = 0 at χ′11 (A&S tables 9.5)', () => {
		expect(Math.abs(besselJ(0, 2.404825557695773))).toBeLessThan(1e-12);
		expect(Math.abs(besselJ(0, TM11_EIGENVALUE) - besselJ(2, TM11_EIGENVALUE))).toBeLessThan(1e-12);
	});

	it('joins the series and the asymptotic branch continuously at x = 12', () => {
		for (const n of [0, 1, 2]) expect(Math.abs(besselJ(n, 12 - 1e-9) - besselJ(n, 12 + 1e-9))).toBeLessThan(1e-9);
	});

	it('satisfies the recurrence J0 + J2 = (2/x)·J1', () => {
		for (const x of [0.3, 1.7, 3.1, 8, 15, 40]) expect(besselJ(0, x) + besselJ(2, x)).toBeCloseTo((2 / x) * besselJ(1, x), 9);
	});
});
