// The legend's stroke font: our own single-stroke glyphs for A–Z, 0–9 and a few signs, drawn with a round pen.
import { LEGEND_CHARACTERS } from '../schemas/design-input';
import type { Point } from '../geometry';

/**
 * Glyphs on a grid 4 units wide and 6 units tall (the cap height), origin at the lower-left; each glyph is a list
 * of open polylines. Every glyph advances 6 units (4 of ink, 2 of space), so a line's width depends only on its
 * length. Zero carries a slash so it is never read as O.
 */
type Glyph = readonly (readonly (readonly [number, number])[])[];

const O: Glyph = [[[1, 0], [0, 1], [0, 5], [1, 6], [3, 6], [4, 5], [4, 1], [3, 0], [1, 0]]];
const P: Glyph = [[[0, 0], [0, 6], [3, 6], [4, 5], [4, 4], [3, 3], [0, 3]]];

export const STROKE_GLYPHS: Readonly<Record<string, Glyph>> = {
	A: [[[0, 0], [0, 4], [2, 6], [4, 4], [4, 0]], [[0, 3], [4, 3]]],
	B: [[[0, 0], [0, 6], [3, 6], [4, 5], [4, 4], [3, 3], [0, 3]], [[3, 3], [4, 2], [4, 1], [3, 0], [0, 0]]],
	C: [[[4, 5], [3, 6], [1, 6], [0, 5], [0, 1], [1, 0], [3, 0], [4, 1]]],
	D: [[[0, 0], [0, 6], [2, 6], [4, 4], [4, 2], [2, 0], [0, 0]]],
	E: [[[4, 6], [0, 6], [0, 0], [4, 0]], [[0, 3], [3, 3]]],
	F: [[[4, 6], [0, 6], [0, 0]], [[0, 3], [3, 3]]],
	G: [[[4, 5], [3, 6], [1, 6], [0, 5], [0, 1], [1, 0], [3, 0], [4, 1], [4, 3], [2, 3]]],
	H: [[[0, 0], [0, 6]], [[4, 0], [4, 6]], [[0, 3], [4, 3]]],
	I: [[[1, 6], [3, 6]], [[2, 6], [2, 0]], [[1, 0], [3, 0]]],
	J: [[[4, 6], [4, 1], [3, 0], [1, 0], [0, 1]]],
	K: [[[0, 0], [0, 6]], [[4, 6], [0, 2]], [[1, 3], [4, 0]]],
	L: [[[0, 6], [0, 0], [4, 0]]],
	M: [[[0, 0], [0, 6], [2, 3], [4, 6], [4, 0]]],
	N: [[[0, 0], [0, 6], [4, 0], [4, 6]]],
	O,
	P,
	Q: [...O, [[2, 2], [4, 0]]],
	R: [...P, [[2, 3], [4, 0]]],
	S: [[[4, 5], [3, 6], [1, 6], [0, 5], [0, 4], [1, 3], [3, 3], [4, 2], [4, 1], [3, 0], [1, 0], [0, 1]]],
	T: [[[0, 6], [4, 6]], [[2, 6], [2, 0]]],
	U: [[[0, 6], [0, 1], [1, 0], [3, 0], [4, 1], [4, 6]]],
	V: [[[0, 6], [2, 0], [4, 6]]],
	W: [[[0, 6], [1, 0], [2, 3], [3, 0], [4, 6]]],
	X: [[[0, 0], [4, 6]], [[0, 6], [4, 0]]],
	Y: [[[0, 6], [2, 3], [4, 6]], [[2, 3], [2, 0]]],
	Z: [[[0, 6], [4, 6], [0, 0], [4, 0]]],
	'0': [...O, [[0, 1], [4, 5]]],
	'1': [[[1, 5], [2, 6], [2, 0]], [[1, 0], [3, 0]]],
	'2': [[[0, 5], [1, 6], [3, 6], [4, 5], [4, 4], [0, 0], [4, 0]]],
	'3': [[[0, 5], [1, 6], [3, 6], [4, 5], [4, 4], [3, 3], [4, 2], [4, 1], [3, 0], [1, 0], [0, 1]], [[1, 3], [3, 3]]],
	'4': [[[3, 0], [3, 6], [0, 2], [4, 2]]],
	'5': [[[4, 6], [0, 6], [0, 3], [3, 3], [4, 2], [4, 1], [3, 0], [0, 0]]],
	'6': [[[4, 5], [3, 6], [1, 6], [0, 5], [0, 1], [1, 0], [3, 0], [4, 1], [4, 2], [3, 3], [0, 3]]],
	'7': [[[0, 6], [4, 6], [1, 0]]],
	'8': [[[1, 3], [0, 4], [0, 5], [1, 6], [3, 6], [4, 5], [4, 4], [3, 3], [1, 3], [0, 2], [0, 1], [1, 0], [3, 0], [4, 1], [4, 2], [3, 3]]],
	'9': [[[0, 1], [1, 0], [3, 0], [4, 1], [4, 5], [3, 6], [1, 6], [0, 5], [0, 4], [1, 3], [4, 3]]],
	' ': [],
	'-': [[[1, 3], [3, 3]]],
	'.': [[[2, 0], [2, 0.5]]],
	'/': [[[0, 0], [4, 6]]],
	'+': [[[0, 3], [4, 3]], [[2, 1], [2, 5]]],
	':': [[[2, 1], [2, 1.5]], [[2, 4], [2, 4.5]]],
	'#': [[[1, 0], [1, 6]], [[3, 0], [3, 6]], [[0, 2], [4, 2]], [[0, 4], [4, 4]]],
	'(': [[[3, 6], [2, 5], [2, 1], [3, 0]]],
	')': [[[1, 6], [2, 5], [2, 1], [1, 0]]]
};

/** Grid units per cap height and per character advance. */
const CAP_UNITS = 6;
const ADVANCE_UNITS = 6;
const INK_UNITS = 4;

/** Width of the ink of `length` characters at cap height `heightMm` (centre lines; the pen adds half its width each side). */
export function textWidthMm(length: number, heightMm: number): number {
	if (length <= 0) return 0;
	const unit = heightMm / CAP_UNITS;
	return ((length - 1) * ADVANCE_UNITS + INK_UNITS) * unit;
}

/**
 * A line of legend text as centre-line polylines in mm, its lower-left ink corner at `origin`, cap height
 * `heightMm`, each glyph squeezed along x by `xScale` (1 = as drawn). Characters the font lacks are an error:
 * callers pass text through toLegendText first.
 */
export function textStrokes(text: string, origin: Point, heightMm: number, xScale = 1): Point[][] {
	const unit = heightMm / CAP_UNITS;
	const out: Point[][] = [];
	[...text].forEach((c, i) => {
		const glyph = STROKE_GLYPHS[c];
		if (!glyph) throw new Error(`the legend font has no glyph for "${c}"`);
		const x0 = origin[0] + i * ADVANCE_UNITS * unit * xScale;
		for (const line of glyph) out.push(line.map(([x, y]): Point => [x0 + x * unit * xScale, origin[1] + y * unit]));
	});
	return out;
}

/** Characters the font draws: exactly LEGEND_CHARACTERS (a unit test holds the two together). */
export const STROKE_FONT_CHARACTERS = Object.keys(STROKE_GLYPHS).join('');
export { LEGEND_CHARACTERS };
