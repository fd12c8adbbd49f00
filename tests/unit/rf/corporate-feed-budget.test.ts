// The array-gain budget: microstrip line loss (Pozar's conductor and dielectric forms), the routed feed path, the mismatch at the port, and the array gain that never beats element gain + 10·log N.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
	conductorLossDbPerMm,
	corporateFeedPath,
	dielectricLossDbPerMm,
	feedLineLossDb,
	feedMismatchLossDb,
	size,
	type FeedPathLevel,
	type SizedDesign,
	type SizedLine
} from '../../../src/lib/rf';
import { InputError, parseDesignInput, type DesignInputDocument } from '../../../src/lib/schemas';

const line50: SizedLine = { widthMm: 3.06, lengthMm: 0, impedanceOhm: 50, effectivePermittivity: 3.33 };
const line70: SizedLine = { widthMm: 1.6, lengthMm: 16.4, impedanceOhm: 50 * Math.SQRT2, effectivePermittivity: 3.2 };
const fr4 = { frequencyHz: 2.45e9, relativePermittivity: 4.4, lossTangent: 0.02, conductivitySPerM: 5.8e7 };

describe('microstrip line loss', () => {
	it('reduces to the TEM loss k·tanδ/2 when the whole field is in the dielectric (εeff = εr) (Pozar, Microwave Engineering 4th ed., eq. 3.198 and the TEM case, from memory)', () => {
		const f = 3e9, er = 2.2, tan = 0.001;
		const k = (2 * Math.PI * f * Math.sqrt(er)) / 299_792_458;
		const expectedDbPerMm = ((k * tan) / 2) * (20 / Math.LN10) / 1000;
		expect(dielectricLossDbPerMm({ widthMm: 1, impedanceOhm: 50, effectivePermittivity: er }, f, er, tan)).toBeCloseTo(expectedDbPerMm, 12);
	});

	it('grows as √f in the conductor (skin depth) and as f·tanδ in the dielectric (Pozar, Microwave Engineering 4th ed., eq. 3.198–3.199, from memory)', () => {
		const c1 = conductorLossDbPerMm(line50, 1e9, 5.8e7), c4 = conductorLossDbPerMm(line50, 4e9, 5.8e7);
		expect(c4 / c1).toBeCloseTo(2, 10);
		const d1 = dielectricLossDbPerMm(line50, 1e9, 4.4, 0.01), d2 = dielectricLossDbPerMm(line50, 2e9, 4.4, 0.02);
		expect(d2 / d1).toBeCloseTo(4, 10);
	});

	it('is larger on a glass-epoxy-class board (tanδ 0.02) than on a PTFE-class one (tanδ 0.001) for the same line', () => {
		expect(dielectricLossDbPerMm(line50, 2.45e9, 4.4, 0.02)).toBeGreaterThan(10 * dielectricLossDbPerMm(line50, 2.45e9, 4.4, 0.001));
	});
});

const path = (scale: number): FeedPathLevel[] => [
	{ lineMm: 10 * scale, junction: true },
	{ lineMm: 25 * scale, junction: true },
	{ lineMm: 8 * scale, junction: false }
];

describe('feed loss (property tests)', () => {
	it('grows with the routed line length', () => {
		fc.assert(
			fc.property(fc.double({ min: 0.1, max: 10, noNaN: true }), fc.double({ min: 1.01, max: 5, noNaN: true }), (s, k) => {
				expect(feedLineLossDb(path(s * k), line50, line70, fr4)).toBeGreaterThan(feedLineLossDb(path(s), line50, line70, fr4));
			}),
			{ numRuns: 50 }
		);
	});

	it('grows with tanδ', () => {
		fc.assert(
			fc.property(fc.double({ min: 0, max: 0.05, noNaN: true }), fc.double({ min: 1e-4, max: 0.05, noNaN: true }), (tan, more) => {
				expect(feedLineLossDb(path(1), line50, line70, { ...fr4, lossTangent: tan + more })).toBeGreaterThan(feedLineLossDb(path(1), line50, line70, { ...fr4, lossTangent: tan }));
			}),
			{ numRuns: 50 }
		);
	});

	it('grows with the element pitch of a sized array (longer arms) and with the laminate tanδ', () => {
		const doc = (spacing: number, lossTangent: number) =>
			size(parseDesignInput({ name: 'Budget demo', frequencyHz: 5.8e9, feed: 'inset', substrate: { relativePermittivity: 2.2, heightMm: 0.787, lossTangent }, array: { columns: 4, spacingXWavelengths: spacing } } as DesignInputDocument)).array!;
		fc.assert(
			fc.property(fc.double({ min: 0.5, max: 1.4, noNaN: true }), fc.double({ min: 0.01, max: 0.5, noNaN: true }), fc.double({ min: 0.0005, max: 0.02, noNaN: true }), (s, ds, tan) => {
				const a = doc(s, tan), wider = doc(s + ds, tan), lossier = doc(s, tan * 2);
				expect(wider.network.pathLengthMm).toBeGreaterThan(a.network.pathLengthMm);
				expect(wider.factor.gainBreakdown.feedLossDb).toBeGreaterThan(a.factor.gainBreakdown.feedLossDb);
				expect(lossier.factor.gainBreakdown.feedLossDb).toBeGreaterThan(a.factor.gainBreakdown.feedLossDb);
			}),
			{ numRuns: 25 }
		);
	});
});

describe('mismatch at the port', () => {
	it('is the plain mismatch loss −10·log(1 − |Γ|²) through lossless Z0 line alone (|Γ| is kept along a lossless line; Pozar, Microwave Engineering 4th ed., §2.3, from memory)', () => {
		const r = 120, z0 = 50;
		const gamma = (r - z0) / (r + z0);
		for (const len of [0, 3.7, 12.5, 40]) {
			expect(feedMismatchLossDb([{ lineMm: len, junction: false }], r, { ...line50, impedanceOhm: z0 }, line70, z0, 2.45e9)).toBeCloseTo(-10 * Math.log10(1 - gamma * gamma), 9);
		}
	});

	it('vanishes when the elements present Z0 and the arms are √2·Z0 quarter-wave transformers, and not for edge-fed elements', () => {
		const exact: SizedLine = { ...line70, impedanceOhm: 50 * Math.SQRT2 };
		expect(feedMismatchLossDb(path(1), 50, line50, exact, 50, 2.45e9)).toBeLessThan(1e-12);
		expect(feedMismatchLossDb(path(1), 220, line50, exact, 50, 2.45e9)).toBeGreaterThan(0.5);
	});

	it('is counted in a sized array: an edge-fed array loses more to mismatch than an inset-fed one', () => {
		const arr = (feed: string) => size(parseDesignInput({ name: 'Budget demo', frequencyHz: 2.45e9, feed, substrate: { relativePermittivity: 4.4, heightMm: 1.6, lossTangent: 0.02 }, array: { columns: 2, rows: 2 } } as DesignInputDocument)).array!;
		expect(arr('inset').factor.gainBreakdown.mismatchLossDb).toBeLessThan(0.01);
		expect(arr('edge').factor.gainBreakdown.mismatchLossDb).toBeGreaterThan(0.5);
	});
});

describe('array gain', () => {
	it('never exceeds element gain + 10·log10 N, and is exactly that minus the feed and mismatch loss (property test)', () => {
		const pow2 = fc.constantFrom(1, 2, 4, 8);
		fc.assert(
			fc.property(
				fc.record({
					frequencyHz: fc.double({ min: 1e9, max: 10e9, noNaN: true }),
					relativePermittivity: fc.double({ min: 2.2, max: 10.2, noNaN: true }),
					heightMm: fc.double({ min: 0.25, max: 1.6, noNaN: true }),
					lossTangent: fc.double({ min: 0, max: 0.03, noNaN: true }),
					feed: fc.constantFrom('inset', 'edge', 'quarter-wave'),
					columns: pow2,
					rows: pow2,
					s: fc.double({ min: 0.5, max: 1.2, noNaN: true })
				}),
				(r) => {
					const doc = {
						name: 'Budget demo',
						frequencyHz: r.frequencyHz,
						feed: r.feed,
						substrate: { relativePermittivity: r.relativePermittivity, heightMm: r.heightMm, lossTangent: r.lossTangent },
						array: { columns: r.columns, rows: r.rows, spacingXWavelengths: r.s, spacingYWavelengths: r.s }
					} as DesignInputDocument;
					let sized: SizedDesign;
					try {
						sized = size(parseDesignInput(doc));
					} catch (e) {
						// a substrate too thick for the frequency is refused before any array is sized
						if (e instanceof InputError) return fc.pre(false);
						throw e;
					}
					const a = sized.array!;
					const b = a.factor.gainBreakdown;
					const n = r.columns * r.rows;
					expect(b.feedLossDb).toBeGreaterThan(0);
					expect(b.mismatchLossDb).toBeGreaterThanOrEqual(0);
					expect(a.factor.gainDbi).toBeLessThan(sized.estimates.gainDbi + 10 * Math.log10(n));
					expect(a.factor.gainDbi).toBeCloseTo(b.elementGainDbi + b.arrayGainDb - b.feedLossDb - b.mismatchLossDb, 12);
				}
			),
			{ numRuns: 60 }
		);
	});

	it('puts a 4 × 4 glass-epoxy array at 2.45 GHz about a decibel or more below element + 10·log N (hundreds of millimetres of lossy line)', () => {
		const a = size(parseDesignInput({ name: 'Budget demo', frequencyHz: 2.45e9, feed: 'inset', substrate: { relativePermittivity: 4.4, heightMm: 1.6, lossTangent: 0.02 }, array: { columns: 4, rows: 4 } } as DesignInputDocument)).array!;
		expect(a.network.pathLengthMm).toBeGreaterThan(200);
		expect(a.factor.gainBreakdown.feedLossDb).toBeGreaterThan(1);
	});
});

describe('the routed path', () => {
	it('has one junction per level of the tree and a trunk to the port', () => {
		const levels = corporateFeedPath({
			columns: 4,
			rows: 2,
			spacingXMm: 40,
			spacingYMm: 45,
			line: line50,
			transformer: line70,
			levelPitchMm: 9,
			clearanceMm: 6,
			marginMm: 4.8,
			elementLeftReachMm: 18,
			elementLeadMm: 10
		});
		expect(levels.map((l) => l.junction)).toEqual([true, true, true, false]);
		expect(levels.every((l) => l.lineMm > 0)).toBe(true);
	});
});
