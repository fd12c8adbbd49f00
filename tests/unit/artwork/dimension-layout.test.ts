// The dimension layout: tiers per side, labels that never overlap, sizes printed to a fixed number of decimals.
import { describe, expect, it } from 'vitest';
import { boxesOverlap, decimalsForResolution, formatLengthMm, layoutDimensions, textWidthMm, type ArtworkDimension } from '../../../src/lib/artwork';

const board = { widthMm: 50, lengthMm: 40 };
const options = { textHeightMm: 2.5, decimals: 2 };
const dim = (id: ArtworkDimension['id'], label: string, from: [number, number], to: [number, number], side: ArtworkDimension['side']): ArtworkDimension => ({
	id,
	label,
	from,
	to,
	side,
	valueMm: Math.abs(side === 'above' || side === 'below' ? to[0] - from[0] : to[1] - from[1])
});

describe('formatLengthMm and decimalsForResolution', () => {
	it.each([
		// [value, decimals, printed]: Number.prototype.toFixed rounding (ECMA-262 §21.1.3.3), no "-0"
		[40.5612345, 2, '40.56'],
		[3.3649, 2, '3.36'],
		[0.004, 2, '0.00'],
		[-0.001, 2, '0.00'],
		[12, 1, '12.0'],
		[7.25, 0, '7']
	])('prints %f at %i decimals as %s', (v, d, s) => {
		expect(formatLengthMm(v, d)).toBe(s);
	});

	it.each([
		[0.01, 2],
		[0.005, 3],
		[0.001, 3],
		[0.1, 1],
		[1, 0],
		[0.00001, 4],
		// bad input: not a positive finite step → the 0.01 mm default's two decimals
		[0, 2],
		[-0.01, 2],
		[Number.NaN, 2],
		[Number.POSITIVE_INFINITY, 2]
	])('a resolution of %f mm prints %i decimals', (r, d) => {
		expect(decimalsForResolution(r)).toBe(d);
	});
});

describe('layoutDimensions', () => {
	it('puts the feed width and the ground width, both below and both centred on the board, on different tiers', () => {
		// the old writer printed "Wf" over "Wg": two spans sharing a midpoint at one offset
		const dims = [dim('feed-width', 'Wf', [23.3, 0], [26.7, 0], 'below'), dim('ground-width', 'Wg', [0, 0], [50, 0], 'below')];
		const layout = layoutDimensions(board, dims, options);
		const [wf, wg] = ['feed-width', 'ground-width'].map((id) => layout.dimensions.find((d) => d.id === id)!);
		expect(wf.tier).toBe(0);
		expect(wg.tier).toBe(1);
		expect(wg.line[0][1]).toBeLessThan(wf.line[0][1]);
		expect(boxesOverlap(wf.label.box, wg.label.box)).toBe(false);
		expect(wf.label.text).toBe('Wf 3.40');
		expect(wg.label.text).toBe('Wg 50.00');
	});

	it('keeps the left side’s labels inside the sheet and beside their own line (the old "Lg" ran off the left edge)', () => {
		const dims = [dim('ground-length', 'Lg', [0, 0], [0, 40], 'left'), dim('inset-depth', 'y0', [20, 8], [20, 16.2], 'left')];
		const layout = layoutDimensions(board, dims, options);
		for (const d of layout.dimensions) {
			expect(d.label.box.minXMm).toBeGreaterThanOrEqual(layout.bounds.minXMm);
			// a left label ends just left of its vertical line
			expect(d.label.box.maxXMm).toBeLessThan(d.line[0][0]);
			expect(d.line[0][0]).toBeLessThan(0);
		}
		const [y0, lg] = ['inset-depth', 'ground-length'].map((id) => layout.dimensions.find((d) => d.id === id)!);
		// the shorter span nearer the board; the outer tier clears the inner tier's widest label
		expect(y0.tier).toBe(0);
		expect(lg.line[0][0]).toBeLessThan(y0.label.box.minXMm);
	});

	it('lets two spans that are apart share a tier', () => {
		const dims = [dim('patch-width', 'W', [2, 40], [12, 40], 'above'), dim('pitch-x', 'Sx', [30, 40], [48, 40], 'above')];
		const layout = layoutDimensions(board, dims, options);
		expect(layout.dimensions.map((d) => d.tier)).toEqual([0, 0]);
	});

	it('slides a label off the extension line of an outer dimension', () => {
		// Wt's centred label would sit where Wf's extension lines (x = 24, 26) pass
		const dims = [dim('transformer-width', 'Wt', [24.8, 5], [25.2, 5], 'below'), dim('feed-width', 'Wf', [24, 0], [26, 0], 'below')];
		const layout = layoutDimensions(board, dims, options);
		const wt = layout.dimensions.find((d) => d.id === 'transformer-width')!;
		for (const x of [24, 26]) expect(x > wt.label.box.minXMm && x < wt.label.box.maxXMm, `x = ${x} crosses "${wt.label.text}"`).toBe(false);
		// its line is drawn on to reach the label
		expect(Math.max(wt.line[0][0], wt.line[1][0])).toBeGreaterThanOrEqual(wt.label.box.maxXMm - 1e-9);
	});

	it('draws extension lines from each measured point to just past the dimension line', () => {
		const d = layoutDimensions(board, [dim('patch-length', 'L', [45, 5], [45, 35], 'right')], options).dimensions[0];
		expect(d.extensions[0][0]).toEqual([45, 5]);
		expect(d.extensions[1][0]).toEqual([45, 35]);
		expect(d.extensions[0][1][0]).toBeGreaterThan(d.line[0][0]);
		expect(d.ends).toEqual([[d.line[0][0], 5], [d.line[0][0], 35]]);
	});

	it('sizes a label box by the monospaced advance (0.64 em a character)', () => {
		const d = layoutDimensions(board, [dim('patch-width', 'W', [10, 40], [40, 40], 'above')], options).dimensions[0];
		expect(d.label.box.maxXMm - d.label.box.minXMm).toBeCloseTo(textWidthMm('W 30.00', 2.5), 9);
		expect(textWidthMm('W 30.00', 2.5)).toBeCloseTo(7 * 0.64 * 2.5, 9);
	});

	it('returns the board alone for no dimensions', () => {
		const layout = layoutDimensions(board, [], options);
		expect(layout.dimensions).toEqual([]);
		expect(layout.bounds).toEqual({ minXMm: 0, minYMm: 0, maxXMm: 50, maxYMm: 40 });
	});
});
