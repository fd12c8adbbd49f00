// CP bands: the axial-ratio and two-mode impedance bands against a numeric two-mode model, the overlap, the band-to-cover warning, the report block and the schema field.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
	axialRatioBandwidthFraction,
	bandCovers,
	bandOverlap,
	polarisationBands,
	polarisationBandsOf,
	size,
	sizingReport,
	twoModeImpedanceBandwidthFraction
} from '../../../src/lib/rf';
import { InputError, parseDesignInput } from '../../../src/lib/schemas';
import { sizeDocument } from '../../fixtures/designs/size-document';

/**
 * The two-mode model computed numerically, with the exact parallel-RLC frequency dependence
 * Q·(f/fm − fm/f) rather than the linearised 2Q(f − f0)/f0 of the closed forms: modes at
 * f0·(1 ∓ 1/(2Q)) fed equally (Langston & Jackson, IEEE Trans. AP 52(10), 2004; from memory).
 */
function twoModeAt(f: number, f0: number, q: number) {
	const fx = f0 * (1 - 1 / (2 * q));
	const fy = f0 * (1 + 1 / (2 * q));
	const mode = (fm: number) => {
		const b = q * (f / fm - fm / f);
		const d = 1 + b * b;
		return { re: 1 / d, im: -b / d }; // 1/(1 + jb)
	};
	return { ex: mode(fx), ey: mode(fy) };
}

/** Axial ratio (field ratio) of the ellipse traced by (Ex, Ey): the general polarisation-ellipse formula, no circular decomposition. */
function axialRatio(ex: { re: number; im: number }, ey: { re: number; im: number }): number {
	const a2 = ex.re * ex.re + ex.im * ex.im;
	const b2 = ey.re * ey.re + ey.im * ey.im;
	const cross = ex.re * ey.re + ex.im * ey.im; // Re(Ex·Ey*)
	const root = Math.sqrt((a2 - b2) ** 2 + 4 * (cross * cross));
	// semi-axes² are the eigenvalues of the time-averaged real field's covariance ½·[[|Ex|², Re], [Re, |Ey|²]] (×2)
	const major = Math.sqrt((a2 + b2 + root) / 2);
	const minor = Math.sqrt(Math.max((a2 + b2 - root) / 2, 0));
	return major / minor;
}

/** |Γ| of the two modes' impedances in series against the centre resistance they present (matched at f0 in the linear model). */
function reflectionAt(f: number, f0: number, q: number): number {
	const { ex, ey } = twoModeAt(f, f0, q);
	const z = { re: (ex.re + ey.re) / 2, im: (ex.im + ey.im) / 2 };
	const c = twoModeAt(f0, f0, q);
	const r0 = (c.ex.re + c.ey.re) / 2;
	const num = Math.hypot(z.re - r0, z.im);
	const den = Math.hypot(z.re + r0, z.im);
	return num / den;
}

/** Width of the band around f0 where pred holds, by bisection on each side. */
function bandByBisection(f0: number, holds: (f: number) => boolean): number {
	const edge = (dir: 1 | -1) => {
		let lo = f0;
		let hi = f0 * (1 + dir * 0.5);
		for (let i = 0; i < 80; i++) {
			const mid = (lo + hi) / 2;
			if (holds(mid)) lo = mid;
			else hi = mid;
		}
		return lo;
	};
	return (edge(1) - edge(-1)) / f0;
}

describe('CP bands of the two-mode patch', () => {
	it.each([10, 20, 40, 80, 150])('gives the AR ≤ 3 dB band (AR − 1)/(Q√AR) ≈ 0.347/Q (Langston & Jackson 2004, from memory) within 2 per cent of the numeric two-mode model at Q = %i', (q) => {
		const f0 = 5.8e9;
		const numeric = bandByBisection(f0, (f) => {
			const { ex, ey } = twoModeAt(f, f0, q);
			return 20 * Math.log10(axialRatio(ex, ey)) <= 3;
		});
		const closed = axialRatioBandwidthFraction(q);
		expect(closed * q).toBeCloseTo(0.3471, 4);
		expect(Math.abs(numeric / closed - 1)).toBeLessThan(0.02);
	});

	it.each([10, 20, 40, 80, 150])('gives the two-mode VSWR ≤ 2 band √2/Q within 2 per cent of the numeric model at Q = %i (twice one mode’s 1/(Q√2))', (q) => {
		const f0 = 2.45e9;
		const numeric = bandByBisection(f0, (f) => {
			const g = reflectionAt(f, f0, q);
			return (1 + g) / (1 - g) <= 2;
		});
		expect(twoModeImpedanceBandwidthFraction(q) * q).toBeCloseTo(Math.SQRT2, 12);
		expect(Math.abs(numeric / twoModeImpedanceBandwidthFraction(q) - 1)).toBeLessThan(0.02);
	});

	it('makes the usable band the overlap: inside both bands, and here the AR band, about a quarter of the impedance band', () => {
		fc.assert(
			fc.property(fc.double({ min: 0.4e9, max: 40e9, noNaN: true }), fc.double({ min: 5, max: 500, noNaN: true }), (f0, q) => {
				const b = polarisationBands(f0, q);
				expect(b.usableBand).not.toBeNull();
				expect(bandCovers(b.axialRatioBand, b.usableBand!)).toBe(true);
				expect(bandCovers(b.impedanceBand, b.usableBand!)).toBe(true);
				expect(b.usableBand).toEqual(b.axialRatioBand);
				expect(b.axialRatioBandwidthFraction / b.impedanceBandwidthFraction).toBeCloseTo(0.3471 / Math.SQRT2, 4);
			}),
			{ numRuns: 100 }
		);
	});

	it.each([
		// a inside b, partial overlap, touching, apart
		[{ lowerHz: 2, upperHz: 3 }, { lowerHz: 1, upperHz: 4 }, { lowerHz: 2, upperHz: 3 }],
		[{ lowerHz: 1, upperHz: 3 }, { lowerHz: 2, upperHz: 4 }, { lowerHz: 2, upperHz: 3 }],
		[{ lowerHz: 1, upperHz: 2 }, { lowerHz: 2, upperHz: 3 }, null],
		[{ lowerHz: 1, upperHz: 2 }, { lowerHz: 5, upperHz: 6 }, null]
	])('overlaps %o and %o as %o', (a, b, expected) => {
		expect(bandOverlap(a, b)).toEqual(expected);
		expect(bandOverlap(b, a)).toEqual(expected);
	});

	it('derives the bands of a stored CP design from its Q, and none for a linear shape', () => {
		const cp = sizeDocument({ frequencyHz: 5.8e9, shape: 'truncated-corner', feed: 'inset', substrate: { relativePermittivity: 2.2, heightMm: 0.787, lossTangent: 0.001 } });
		const b = polarisationBandsOf(cp)!;
		expect(b.axialRatioBandwidthFraction).toBeCloseTo(axialRatioBandwidthFraction(cp.estimates.qualityFactor), 15);
		expect((b.axialRatioBand.lowerHz + b.axialRatioBand.upperHz) / 2).toBeCloseTo(5.8e9, 0);
		expect(polarisationBandsOf(sizeDocument({ frequencyHz: 5.8e9, substrate: { relativePermittivity: 2.2, heightMm: 0.787, lossTangent: 0.001 } }))).toBeNull();
	});
});

describe('band to cover', () => {
	// the 5.8 GHz CP demo design's laminate; 5.725–5.875 GHz is the 5.8 GHz ISM band (ITU Radio Regulations 5.150)
	const cp58 = { name: 'FPV', frequencyHz: 5.8e9, shape: 'truncated-corner', feed: 'inset', handedness: 'rhcp', substrate: { relativePermittivity: 2.2, heightMm: 0.787, lossTangent: 0.001 } };
	const ism58 = { lowerHz: 5.725e9, upperHz: 5.875e9 };

	it('warns when a CP design’s usable band (≈ 50 MHz here) is narrower than the 150 MHz band to cover, naming both', () => {
		const w = sizeDocument({ ...cp58, bandToCover: ism58 }).warnings.find((x) => x.code === 'band-not-covered');
		expect(w).toBeDefined();
		expect(w!.message).toContain('usable CP band');
		expect(w!.message).toContain('narrower than');
		expect(w!.message).toContain('5725.0 MHz–5875.0 MHz');
	});

	it('stays silent when the usable band holds the band to cover, and without a band to cover (old documents)', () => {
		expect(sizeDocument({ ...cp58, bandToCover: { lowerHz: 5.79e9, upperHz: 5.81e9 } }).warnings.map((w) => w.code)).not.toContain('band-not-covered');
		const old = sizeDocument(cp58);
		expect(old.warnings.map((w) => w.code)).not.toContain('band-not-covered');
		expect(old.input.bandToCover).toBeUndefined();
	});

	it('checks a linear design against its VSWR ≤ 2 band, and says "off" for a band of the right width in the wrong place', () => {
		const lp = { name: 'LP', frequencyHz: 2.45e9, feed: 'inset', substrate: { relativePermittivity: 2.2, heightMm: 1.575, lossTangent: 0.0009 } };
		const sized = sizeDocument(lp);
		const half = (sized.estimates.bandwidthFraction * 2.45e9) / 2;
		expect(sizeDocument({ ...lp, bandToCover: { lowerHz: 2.45e9 - half / 2, upperHz: 2.45e9 + half / 2 } }).warnings.map((w) => w.code)).not.toContain('band-not-covered');
		const off = sizeDocument({ ...lp, bandToCover: { lowerHz: 2.45e9 + half / 2, upperHz: 2.45e9 + 1.5 * half } }).warnings.find((w) => w.code === 'band-not-covered');
		expect(off!.message).toContain('VSWR ≤ 2 band');
		expect(off!.message).toContain(' off the band');
	});

	it('refuses an upper edge at or below the lower edge, and edges outside 100 MHz–100 GHz, with the field path', () => {
		const bad = (band: unknown) => {
			try {
				parseDesignInput({ ...cp58, bandToCover: band });
			} catch (e) {
				if (e instanceof InputError) return e.first.path;
				throw e;
			}
			return null;
		};
		expect(bad({ lowerHz: 5.875e9, upperHz: 5.725e9 })).toBe('bandToCover.upperHz');
		expect(bad({ lowerHz: 5.8e9, upperHz: 5.8e9 })).toBe('bandToCover.upperHz');
		expect(bad({ lowerHz: 50e6, upperHz: 5.8e9 })).toBe('bandToCover.lowerHz');
		expect(bad({ lowerHz: 5.7e9 })).toBe('bandToCover.upperHz');
		expect(bad(ism58)).toBeNull();
	});

	it('prints the CP bands in the sizing report of a CP design only', () => {
		const report = sizingReport(sizeDocument(cp58)) as Record<string, unknown>;
		const block = report.circularPolarisation as Record<string, number>;
		expect(block.axialRatioBandLowerHz).toBeLessThan(5.8e9);
		expect(block.usableBandUpperHz).toBe(block.axialRatioBandUpperHz);
		expect(block.impedanceBandwidthFraction).toBeGreaterThan(block.axialRatioBandwidthFraction);
		expect(sizingReport(sizeDocument({ ...cp58, shape: 'rectangular' }))).not.toHaveProperty('circularPolarisation');
	});
});
