// Array factor: broadside line directivity against Balanis's closed form, a numeric sphere integral, beamwidth, and the grating-lobe onset.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { gratingLobeCondition, arrayFactorCutDb, arrayFactorDirectivity, arrayFactorMagnitude, broadsideLineDirectivityApprox, gratingLobeLimitWavelengths, halfPowerBeamwidthDeg, integrateGaussLegendre } from '../../../src/lib/rf';
import { layeredDocument } from '../../fixtures/designs/layered-cases';
import { sizeDocument } from '../../fixtures/designs/size-document';

const line = (n: number, d: number, scanAngleDeg = 0) => ({ columns: n, rows: 1, spacingXWavelengths: d, spacingYWavelengths: 0.5, scanAngleDeg });

/**
 * Balanis, Antenna Theory, ch. 6 (uniform broadside array of isotropic elements, from memory):
 * D0 = N / (1 + (2/N) Σ_{n=1}^{N−1} (N − n) sin(n k d) / (n k d)).
 */
function balanisBroadside(n: number, dOverLambda: number): number {
	const kd = 2 * Math.PI * dOverLambda;
	let s = 0;
	for (let m = 1; m < n; m++) s += ((n - m) * Math.sin(m * kd)) / (m * kd);
	return n / (1 + (2 / n) * s);
}

/** 4π·|AF(peak)|² / ∮|AF|² dΩ by Gauss–Legendre quadrature in θ and φ (independent of the closed form). */
function numericDirectivity(g: ReturnType<typeof line>): number {
	const peakU = Math.sin((g.scanAngleDeg * Math.PI) / 180);
	const integral = integrateGaussLegendre(
		(theta) =>
			integrateGaussLegendre((phi) => arrayFactorMagnitude(g, Math.sin(theta) * Math.cos(phi), Math.sin(theta) * Math.sin(phi)) ** 2, 0, 2 * Math.PI, 64) * Math.sin(theta),
		0,
		Math.PI,
		96
	);
	return (4 * Math.PI * arrayFactorMagnitude(g, peakU, 0) ** 2) / integral;
}

describe('array factor', () => {
	it.each([
		// (N, d/λ): half-wave spacing, denser, wider, and a long line
		[4, 0.5],
		[8, 0.25],
		[8, 0.7],
		[16, 0.8],
		[32, 0.6]
	])('gives the broadside directivity of a uniform 1×%i line at d = %f λ as Balanis ch. 6', (n, d) => {
		expect(arrayFactorDirectivity(line(n, d))).toBeCloseTo(balanisBroadside(n, d), 9);
	});

	it('gives exactly N at half-wave spacing and approaches 2N·d/λ for long lines (Balanis ch. 6)', () => {
		expect(arrayFactorDirectivity(line(10, 0.5))).toBeCloseTo(10, 9);
		const d = arrayFactorDirectivity(line(64, 0.4));
		expect(Math.abs(d / broadsideLineDirectivityApprox(64, 0.4) - 1)).toBeLessThan(0.03);
	});

	it.each([
		{ columns: 4, rows: 1, spacingXWavelengths: 0.7, spacingYWavelengths: 0.5, scanAngleDeg: 0 },
		{ columns: 4, rows: 4, spacingXWavelengths: 0.6, spacingYWavelengths: 0.7, scanAngleDeg: 0 },
		{ columns: 8, rows: 2, spacingXWavelengths: 0.5, spacingYWavelengths: 0.6, scanAngleDeg: 30 }
	])('matches a numeric sphere integral for a $columns×$rows array scanned to $scanAngleDeg°', (g) => {
		expect(arrayFactorDirectivity(g) / numericDirectivity(g)).toBeCloseTo(1, 4);
	});

	it('gives the half-power beamwidth of a long broadside line: 2·asin(1.391 λ/(π N d)) (Balanis ch. 6, from memory)', () => {
		const n = 16, d = 0.5;
		const expected = (2 * Math.asin(1.391 / (Math.PI * n * d)) * 180) / Math.PI;
		expect(halfPowerBeamwidthDeg(line(n, d), 'xz')!).toBeCloseTo(expected, 1);
	});

	it('puts a full grating lobe at the horizon exactly at d/λ = 1/(1+|sin θ0|), and none below it', () => {
		for (const scan of [0, 20, 45]) {
			const limit = gratingLobeLimitWavelengths(scan);
			expect(limit).toBeCloseTo(1 / (1 + Math.sin((scan * Math.PI) / 180)), 12);
			// at the onset the lobe at θ = −90° is as large as the main beam
			expect(arrayFactorCutDb(line(16, limit, scan), 'xz', -90)).toBeGreaterThan(-0.01);
			// 5 % below, it has fallen well away
			expect(arrayFactorCutDb(line(16, limit * 0.95, scan), 'xz', -90)).toBeLessThan(-10);
		}
	});

	it('warns for grating lobes at and above the limit and not below, naming the axis', () => {
		const warn = (spacingXWavelengths: number, scanAngleDeg: number) =>
			sizeDocument(layeredDocument({ feed: 'inset', array: { columns: 4, spacingXWavelengths, scanAngleDeg } })).warnings.filter((w) => w.code === 'grating-lobes');
		const limit = gratingLobeLimitWavelengths(30);
		expect(warn(limit - 0.001, 30)).toEqual([]);
		expect(warn(limit + 0.001, 30).length).toBe(1);
		expect(warn(limit + 0.001, 30)[0].message).toMatch(/along x/);
		expect(warn(0.9, 0)).toEqual([]);
	});
});

describe('the grating-lobe condition in words', () => {
	// the condition d/λ0 < 1/(1 + |sin θ0|) (Balanis, Antenna Theory, ch. 6, from memory): the printed relation must be true of the printed numbers
	it.each([
		[0.75, 0, 'pitch 0.75 λ₀ < limit 1.000 λ₀: no grating lobe'],
		[1, 0, 'pitch 1 λ₀ ≥ limit 1.000 λ₀: a grating lobe reaches visible space'],
		[0.7, 30, 'pitch 0.7 λ₀ ≥ limit 0.667 λ₀: a grating lobe reaches visible space'],
		[0.9999, 0, 'pitch 0.9999 λ₀ < limit 1.0000 λ₀: no grating lobe']
	])('pitch %s λ0 at a %s° scan reads "%s"', (s, scan, text) => {
		expect(gratingLobeCondition(s, gratingLobeLimitWavelengths(scan)).text).toBe(text);
	});

	it('never prints a false inequality (property test)', () => {
		fc.assert(
			fc.property(fc.double({ min: 0.3, max: 2, noNaN: true }), fc.double({ min: 0, max: 80, noNaN: true }), (s, scan) => {
				const { free, text } = gratingLobeCondition(s, gratingLobeLimitWavelengths(scan));
				const m = /^pitch ([\d.]+) λ₀ ([<≥]) limit ([\d.]+) λ₀: /.exec(text)!;
				const [a, b] = [Number(m[1]), Number(m[3])];
				expect(m[2] === '<' ? a < b : a >= b).toBe(true);
				expect(free).toBe(m[2] === '<');
			}),
			{ numRuns: 300 }
		);
	});
});
