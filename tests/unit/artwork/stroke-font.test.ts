// The legend's stroke font: our own glyphs, one per legend character, on their 4 × 6 grid.
import { describe, expect, it } from 'vitest';
import { STROKE_FONT_CHARACTERS, STROKE_GLYPHS, textStrokes, strokeTextWidthMm as textWidthMm } from '../../../src/lib/artwork';
import { LEGEND_CHARACTERS, toLegendText } from '../../../src/lib/schemas';

describe('stroke font', () => {
	it('draws exactly the characters the legend accepts', () => {
		expect([...STROKE_FONT_CHARACTERS].sort()).toEqual([...LEGEND_CHARACTERS].sort());
	});

	it('keeps every glyph on its 4 × 6 grid, with no zero-length line', () => {
		for (const [c, glyph] of Object.entries(STROKE_GLYPHS)) {
			for (const line of glyph) {
				expect(line.length, c).toBeGreaterThanOrEqual(2);
				for (const [x, y] of line) {
					expect(x, c).toBeGreaterThanOrEqual(0);
					expect(x, c).toBeLessThanOrEqual(4);
					expect(y, c).toBeGreaterThanOrEqual(0);
					expect(y, c).toBeLessThanOrEqual(6);
				}
				const length = line.slice(1).reduce((a, p, i) => a + Math.hypot(p[0] - line[i][0], p[1] - line[i][1]), 0);
				expect(length, c).toBeGreaterThan(0);
			}
		}
	});

	it('tells every character apart: no two glyphs are drawn alike (0 carries a slash, unlike O)', () => {
		const drawn = new Map<string, string>();
		for (const [c, glyph] of Object.entries(STROKE_GLYPHS)) {
			if (c === ' ') continue;
			const key = JSON.stringify(glyph);
			expect(drawn.get(key), `${c} looks like ${drawn.get(key)}`).toBeUndefined();
			drawn.set(key, c);
		}
	});

	it('sets a line monospaced: 1 mm text advances 1 mm per character, 4/6 mm of ink for the last', () => {
		expect(textWidthMm(0, 1)).toBe(0);
		expect(textWidthMm(1, 1)).toBeCloseTo(4 / 6, 12);
		expect(textWidthMm(10, 1.2)).toBeCloseTo(9 * 1.2 + 0.8, 12);
		const strokes = textStrokes('LM', [2, 3], 1.2);
		const xs = strokes.flat().map((p) => p[0]);
		const ys = strokes.flat().map((p) => p[1]);
		expect(Math.min(...xs)).toBeCloseTo(2, 12);
		expect(Math.max(...xs)).toBeCloseTo(2 + textWidthMm(2, 1.2), 12);
		expect(Math.min(...ys)).toBeCloseTo(3, 12);
		expect(Math.max(...ys)).toBeCloseTo(4.2, 12);
	});

	it('squeezes glyphs along x only', () => {
		const ys = (s: ReturnType<typeof textStrokes>) => s.flat().map((p) => p[1]);
		const wide = textStrokes('W', [0, 0], 1);
		const narrow = textStrokes('W', [0, 0], 1, 0.5);
		expect(Math.max(...narrow.flat().map((p) => p[0]))).toBeCloseTo(Math.max(...wide.flat().map((p) => p[0])) / 2, 12);
		expect(ys(narrow)).toEqual(ys(wide));
	});

	it('refuses a character it has no glyph for', () => {
		expect(() => textStrokes('a', [0, 0], 1)).toThrow(/no glyph for "a"/);
		expect(() => textStrokes('€', [0, 0], 1)).toThrow(/no glyph/);
	});

	it('turns any name into legend text: upper case, accents dropped, other characters as one space', () => {
		expect(toLegendText('Müller patch — rev. b')).toBe('MULLER PATCH REV. B');
		expect(toLegendText('  ∑∆ ')).toBe('');
		expect(toLegendText('5.8 GHz #2 (RHCP)')).toBe('5.8 GHZ #2 (RHCP)');
	});
});
