// The grounded (conductor-backed) coplanar closed form and its gap solver, against elliptic-integral tables and the form's known limits.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyzeGroundedCoplanar, completeEllipticK, groundedCoplanarGapMm } from '../../../src/lib/rf/grounded-coplanar';
import { InputError } from '../../../src/lib/schemas';

describe('completeEllipticK', () => {
	// Abramowitz & Stegun, Handbook of Mathematical Functions, Table 17.1 (parameter m = k²; from memory)
	it.each([
		[0, Math.PI / 2],
		[0.25, 1.685750355],
		[0.5, 1.854074677],
		[0.75, 2.156515648],
		[0.9, 2.578092113]
	])('K at m = %f equals the tabulated %f', (m, value) => {
		expect(completeEllipticK(Math.sqrt(m))).toBeCloseTo(value, 8);
	});

	it('refuses a modulus outside [0, 1)', () => {
		expect(() => completeEllipticK(1)).toThrow(RangeError);
		expect(() => completeEllipticK(-0.1)).toThrow(RangeError);
	});
});

describe('analyzeGroundedCoplanar', () => {
	it('meets conventional CPW in air when the backing ground is far away: k = 1/√2 gives 30π Ω', () => {
		// K(1/√2) = K′(1/√2) (Legendre), so CPW in air has Z0 = 30π·K′/K = 94.248 Ω (Simons 2001, eq. 2.5 with εeff = 1; from memory)
		const s = 1;
		const w = (s * (Math.SQRT2 - 1)) / 2;
		const m = analyzeGroundedCoplanar({ stripWidthMm: s, gapMm: w, heightMm: 1e5, relativePermittivity: 1 });
		expect(m.impedanceOhm).toBeCloseTo(30 * Math.PI, 6);
		expect(m.effectivePermittivity).toBeCloseTo(1, 12);
	});

	it('meets CPW on an infinitely thick substrate (Wen 1969): εeff = (εr + 1)/2 and Z0 = 30π/√εeff · K(k′)/K(k)', () => {
		// k = 0.5: K(m = 0.25) and K(m = 0.75) from A&S Table 17.1 (from memory); εr = 9.8
		const s = 1;
		const w = 0.5; // k = S/(S + 2W) = 0.5
		const eeff = (9.8 + 1) / 2;
		const expected = ((30 * Math.PI) / Math.sqrt(eeff)) * (2.156515648 / 1.685750355);
		const m = analyzeGroundedCoplanar({ stripWidthMm: s, gapMm: w, heightMm: 1e4, relativePermittivity: 9.8 });
		expect(m.effectivePermittivity).toBeCloseTo(eeff, 6);
		expect(m.impedanceOhm).toBeCloseTo(expected, 5);
	});

	it('falls as the backing ground comes closer (the back plane adds capacitance)', () => {
		const z = (h: number) => analyzeGroundedCoplanar({ stripWidthMm: 1, gapMm: 0.3, heightMm: h, relativePermittivity: 4.4 }).impedanceOhm;
		expect(z(0.4)).toBeLessThan(z(1.6));
		expect(z(1.6)).toBeLessThan(z(100));
	});

	it('gives the worked number of its doc comment: S 3, W 0.5, h 1.6 mm, εr 4.4 → about 42 Ω', () => {
		expect(analyzeGroundedCoplanar({ stripWidthMm: 3, gapMm: 0.5, heightMm: 1.6, relativePermittivity: 4.4 }).impedanceOhm).toBeCloseTo(42.01, 1);
	});

	it('rejects a zero or negative dimension and εr below 1 with an InputError naming it', () => {
		expect(() => analyzeGroundedCoplanar({ stripWidthMm: 0, gapMm: 0.3, heightMm: 1, relativePermittivity: 4 })).toThrow(InputError);
		expect(() => analyzeGroundedCoplanar({ stripWidthMm: 1, gapMm: -0.3, heightMm: 1, relativePermittivity: 4 })).toThrow(/gapMm/);
		expect(() => analyzeGroundedCoplanar({ stripWidthMm: 1, gapMm: 0.3, heightMm: 1, relativePermittivity: 0.5 })).toThrow(/relativePermittivity/);
	});
});

describe('groundedCoplanarGapMm', () => {
	it('returns the gap whose closed-form Z0 is the target', () => {
		const geometry = { stripWidthMm: 3.06, heightMm: 1.6, relativePermittivity: 4.4 };
		const gap = groundedCoplanarGapMm({ ...geometry, impedanceOhm: 50 })!;
		expect(analyzeGroundedCoplanar({ ...geometry, gapMm: gap }).impedanceOhm).toBeCloseTo(50, 6);
	});

	it('returns null for a target above the line’s conductor-backed limit and for one below any real gap', () => {
		const geometry = { stripWidthMm: 3.06, heightMm: 1.6, relativePermittivity: 4.4 };
		expect(groundedCoplanarGapMm({ ...geometry, impedanceOhm: 150 })).toBeNull();
		expect(groundedCoplanarGapMm({ ...geometry, impedanceOhm: 5 })).toBeNull();
	});

	it('widens the gap as the target impedance rises (property)', () => {
		fc.assert(
			fc.property(
				fc.double({ min: 0.2, max: 5, noNaN: true }),
				fc.double({ min: 0.2, max: 3, noNaN: true }),
				fc.double({ min: 2, max: 12, noNaN: true }),
				fc.double({ min: 0, max: 1, noNaN: true }),
				fc.double({ min: 0.01, max: 1, noNaN: true }),
				(s, h, er, at, step) => {
					const g = { stripWidthMm: s, heightMm: h, relativePermittivity: er };
					// two targets inside what gaps of 0.05 S … 5 S give, the second above the first
					const lo = analyzeGroundedCoplanar({ ...g, gapMm: 0.05 * s }).impedanceOhm;
					const hi = analyzeGroundedCoplanar({ ...g, gapMm: 5 * s }).impedanceOhm;
					const z1 = lo + at * 0.9 * (hi - lo);
					const z2 = Math.min(hi, z1 + step * (hi - lo) * 0.1 + 0.01);
					const g1 = groundedCoplanarGapMm({ ...g, impedanceOhm: z1 })!;
					const g2 = groundedCoplanarGapMm({ ...g, impedanceOhm: z2 })!;
					expect(g1).not.toBeNull();
					expect(g2).toBeGreaterThan(g1);
				}
			),
			{ numRuns: 60 }
		);
	});
});
