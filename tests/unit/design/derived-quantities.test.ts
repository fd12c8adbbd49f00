// Derived-value rows for the new designs: coupled feeds, the parasitic patch and arrays (their array-factor figures).
import { describe, expect, it } from 'vitest';
import { derivedQuantities } from '../../../src/lib/design/derived-quantities';
import { layeredCases } from '../../fixtures/designs/layered-cases';
import { sizeDocument } from '../../fixtures/designs/size-document';

const rows = (name: string) => new Map(derivedQuantities(sizeDocument(layeredCases.find((c) => c.name === name)!.doc)).map((q) => [q.key, q]));

describe('derived values of layered designs and arrays', () => {
	it('list the aperture-coupled slot and stub, and the proximity-coupled overlap', () => {
		const aperture = rows('aperture-coupled patch');
		for (const key of ['slotLengthMm', 'slotWidthMm', 'stubLengthMm', 'feedLineWidthMm']) expect(aperture.get(key)?.group).toBe('Feed');
		expect(rows('proximity-coupled patch').get('overlapMm')?.unit).toBe('mm');
	});

	it('list the parasitic patch with its height above the driven one', () => {
		const p = rows('stacked parasitic patch');
		// the demo stack's spacer is 6 mm (tests/fixtures/designs/layered-cases.ts)
		expect(p.get('parasiticSpacingMm')?.value).toBeCloseTo(6, 6);
		expect(p.get('parasiticSizeRatio')?.value).toBe(1.07);
		// the driven patch sized under the spacer, and the pair's bandwidth beside the driven patch's
		expect(Number(p.get('drivenCoveredEffectivePermittivity')?.value)).toBeGreaterThan(Number(p.get('drivenUncoveredEffectivePermittivity')?.value));
		expect(Number(p.get('pairBandwidthPercent')?.value)).toBeGreaterThan(Number(p.get('drivenBandwidthPercent')?.value));
		expect(p.get('pairBandwidthPercent')?.label).toMatch(/estimate/);
	});

	it('give an array its element count, its gain as element gain + 10·log10 N less the feed-line and mismatch loss, and say a single row has no y–z beamwidth', () => {
		const a = rows('1×4 inset array');
		expect(a.get('arrayElements')?.value).toBe('4 × 1 = 4');
		const loss = Number(a.get('arrayFeedLossDb')?.value) + Number(a.get('arrayMismatchLossDb')?.value);
		expect(Number(a.get('arrayFeedLossDb')?.value)).toBeGreaterThan(0);
		expect(Number(a.get('arrayGainDbi')?.value)).toBeCloseTo(Number(a.get('gainDbi')?.value) + 10 * Math.log10(4) - loss, 9);
		expect(Number(a.get('networkPathLengthMm')?.value)).toBeGreaterThan(0);
		expect(a.get('beamwidthYzDeg')).toMatchObject({ value: 'none in view', unit: '' });
		expect(typeof a.get('beamwidthXzDeg')?.value).toBe('number');
		expect(a.has('arraySpacingYMm')).toBe(false);
		expect(rows('4×4 inset array').has('arraySpacingYMm')).toBe(true);
	});
});

describe('derived values of a single patch: its pattern and, for CP, its bands', () => {
	const cp = { frequencyHz: 5.8e9, shape: 'truncated-corner', feed: 'inset', substrate: { relativePermittivity: 2.2, heightMm: 0.787, lossTangent: 0.001 } };
	it('lists the E- and H-plane beamwidths of a single patch, and not of an array', () => {
		const single = new Map(derivedQuantities(sizeDocument({ ...cp, shape: 'rectangular' })).map((q) => [q.key, q]));
		expect(single.get('beamwidthEDeg')?.unit).toBe('°');
		expect(Number(single.get('beamwidthHDeg')?.value)).toBeGreaterThan(60);
		const array = new Map(derivedQuantities(sizeDocument({ ...cp, shape: 'rectangular', array: { columns: 4 } })).map((q) => [q.key, q]));
		expect(array.has('beamwidthEDeg')).toBe(false);
	});

	it('lists the AR, two-mode VSWR and usable bands of a CP patch in MHz, and none for a linear one', () => {
		const rowsCp = new Map(derivedQuantities(sizeDocument(cp)).map((q) => [q.key, q]));
		expect(rowsCp.get('axialRatioBandMHz')?.value).toMatch(/^57\d\d\.\d–58\d\d\.\d$/);
		expect(rowsCp.get('usableBandMHz')?.value).toBe(rowsCp.get('axialRatioBandMHz')?.value);
		expect(new Map(derivedQuantities(sizeDocument({ ...cp, shape: 'rectangular' })).map((q) => [q.key, q])).has('axialRatioBandMHz')).toBe(false);
	});
});
