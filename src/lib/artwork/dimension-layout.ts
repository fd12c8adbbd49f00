// Dimension layout shared by the drawing writers (SVG, DXF): every dimension placed outside the board in tiers per
// side, so that no two labels overlap and each label sits beside its own dimension line. Board coordinates, y up, mm.
import { maxOf, type Bounds, type Point } from '../geometry';
import type { ArtworkDimension } from './types';

/**
 * Text metrics the layout assumes, as fractions of the text height (the font size). A monospaced face advances
 * about 0.6 em per character (DejaVu Sans Mono 0.602 em, from memory); 0.64 leaves room for a wider fallback. A
 * line box of 1.25 em holds ascent and descent (DejaVu Sans Mono ≈ 0.93 + 0.24 em, from memory).
 */
export const DRAWING_TEXT_METRICS = { advanceEm: 0.64, boxEm: 1.25, descentEm: 0.27 } as const;

export interface DimensionLayoutOptions {
	/** Text height (font size) of the labels, mm. */
	readonly textHeightMm: number;
	/** Decimals printed (2 for a 0.01 mm resolution). */
	readonly decimals: number;
}

/** One segment of a drawing, board coordinates. */
export type DrawingSegment = readonly [Point, Point];

/** A label: its text, its box (board coordinates) and where it reads from. */
export interface DrawingLabel {
	readonly text: string;
	/** Left end of the text's baseline. */
	readonly baseline: Point;
	readonly box: Bounds;
	readonly heightMm: number;
}

export interface PlacedDimension {
	readonly id: ArtworkDimension['id'];
	readonly side: ArtworkDimension['side'];
	/** 0 nearest the board. */
	readonly tier: number;
	/** The dimension line (extended past a measured end when the label sits beyond it). */
	readonly line: DrawingSegment;
	/** The measured ends on the dimension line, where the end marks go. */
	readonly ends: readonly [Point, Point];
	/** From each measured point to just past the dimension line. */
	readonly extensions: readonly DrawingSegment[];
	readonly label: DrawingLabel;
}

export interface DimensionLayout {
	readonly dimensions: readonly PlacedDimension[];
	/** Box of the board, every line and label. */
	readonly bounds: Bounds;
}

/** Gap between the board (or the previous tier's labels) and a dimension line, in text heights. */
const FIRST_GAP_EM = 1.6;
const LABEL_GAP_EM = 0.35;
const TIER_GAP_EM = 0.8;
const ALONG_GAP_EM = 0.8;
const OVERSHOOT_EM = 0.4;

/** "12.3456" at 2 decimals → "12.35"; never "-0.00". */
export function formatLengthMm(valueMm: number, decimals: number): string {
	const s = valueMm.toFixed(decimals);
	return /^-0\.?0*$/.test(s) ? s.slice(1) : s;
}

/** Decimals that print a resolution: 0.01 mm → 2, 0.005 mm → 3, 0.1 mm → 1 (at most 4, at least 0). */
export function decimalsForResolution(resolutionMm: number): number {
	if (!(resolutionMm > 0) || !Number.isFinite(resolutionMm)) return 2;
	return Math.min(4, Math.max(0, Math.ceil(-Math.log10(resolutionMm) - 1e-9)));
}

/** Width of a text of `text.length` characters at a height, by the metrics above. */
export function textWidthMm(text: string, heightMm: number): number {
	return [...text].length * DRAWING_TEXT_METRICS.advanceEm * heightMm;
}

/** A label whose box has its left edge at x and its bottom at y. */
export function labelAt(text: string, x: number, y: number, heightMm: number): DrawingLabel {
	const w = textWidthMm(text, heightMm);
	const h = DRAWING_TEXT_METRICS.boxEm * heightMm;
	return { text, heightMm, baseline: [x, y + DRAWING_TEXT_METRICS.descentEm * heightMm], box: { minXMm: x, minYMm: y, maxXMm: x + w, maxYMm: y + h } };
}

/** True when two boxes share more than a touching edge. */
export function boxesOverlap(a: Bounds, b: Bounds): boolean {
	return a.minXMm < b.maxXMm && b.minXMm < a.maxXMm && a.minYMm < b.maxYMm && b.minYMm < a.maxYMm;
}

const horizontalSide = (side: ArtworkDimension['side']) => side === 'above' || side === 'below';

interface Pending {
	dim: ArtworkDimension;
	text: string;
	widthMm: number;
	/** Span along the side's axis (x for above/below, y for left/right). */
	lo: number;
	hi: number;
	/** Where the label's box starts along that axis. */
	labelLo: number;
	labelHi: number;
}

/**
 * Places every dimension outside the board: above/below dimensions on horizontal lines over or under the board,
 * left/right ones on vertical lines beside it, labels horizontal (read from the bottom of the sheet) on the outer
 * side of their line. Per side, the shortest span goes nearest the board and a dimension shares a tier only with
 * ones whose span and label are clear of its own along the side. Labels of the left and right sides are kept
 * within the board's height and those above and below within its width when they fit, so the four sides never
 * meet at a corner.
 */
export function layoutDimensions(board: { widthMm: number; lengthMm: number }, dims: readonly ArtworkDimension[], options: DimensionLayoutOptions): DimensionLayout {
	const th = options.textHeightMm;
	const boxH = DRAWING_TEXT_METRICS.boxEm * th;
	const placed: PlacedDimension[] = [];
	let bounds: Bounds = { minXMm: 0, minYMm: 0, maxXMm: board.widthMm, maxYMm: board.lengthMm };
	const grow = (b: Bounds) => {
		bounds = { minXMm: Math.min(bounds.minXMm, b.minXMm), minYMm: Math.min(bounds.minYMm, b.minYMm), maxXMm: Math.max(bounds.maxXMm, b.maxXMm), maxYMm: Math.max(bounds.maxYMm, b.maxYMm) };
	};

	for (const side of ['above', 'below', 'left', 'right'] as const) {
		const horizontal = horizontalSide(side);
		const extent = horizontal ? board.widthMm : board.lengthMm;
		const pending: Pending[] = dims
			.filter((d) => d.side === side)
			.map((dim) => {
				const text = `${dim.label} ${formatLengthMm(dim.valueMm, options.decimals)}`;
				const widthMm = textWidthMm(text, th);
				const a = horizontal ? dim.from[0] : dim.from[1];
				const b = horizontal ? dim.to[0] : dim.to[1];
				const lo = Math.min(a, b);
				const hi = Math.max(a, b);
				const size = horizontal ? widthMm : boxH;
				// centred on the span, then slid inside the board's extent when it fits there
				let labelLo = (lo + hi) / 2 - size / 2;
				if (size <= extent) labelLo = Math.min(Math.max(labelLo, 0), extent - size);
				return { dim, text, widthMm, lo, hi, labelLo, labelHi: labelLo + size };
			})
			.sort((p, q) => p.hi - p.lo - (q.hi - q.lo) || p.lo - q.lo || (p.dim.id < q.dim.id ? -1 : 1));

		// tiers: first one whose occupied stretches are all clear of this one's
		const tiers: Pending[][] = [];
		for (const p of pending) {
			const from = Math.min(p.lo, p.labelLo) - ALONG_GAP_EM * th;
			const to = Math.max(p.hi, p.labelHi) + ALONG_GAP_EM * th;
			const clear = (q: Pending) => to <= Math.min(q.lo, q.labelLo) || from >= Math.max(q.hi, q.labelHi);
			const tier = tiers.find((t) => t.every(clear));
			if (tier) tier.push(p);
			else tiers.push([p]);
		}

		const place = (p: Pending, tier: number, offsetMm: number): PlacedDimension => {
			const d = p.dim;
			const outward = side === 'above' || side === 'right' ? 1 : -1;
			const base = side === 'above' ? board.lengthMm : side === 'right' ? board.widthMm : 0;
			const at = base + outward * offsetMm;
			const over = OVERSHOOT_EM * th * outward;
			const gap = LABEL_GAP_EM * th;
			const lineLo = Math.min(p.lo, p.labelLo);
			const lineHi = Math.max(p.hi, p.labelHi);
			const label = horizontal
				? labelAt(p.text, p.labelLo, outward > 0 ? at + gap : at - gap - boxH, th)
				: labelAt(p.text, outward > 0 ? at + gap : at - gap - p.widthMm, p.labelLo, th);
			const toLine = (q: Point): Point => (horizontal ? [q[0], at] : [at, q[1]]);
			const beyond = (q: Point): Point => (horizontal ? [q[0], at + over] : [at + over, q[1]]);
			const ends: [Point, Point] = [toLine(d.from), toLine(d.to)];
			const line: DrawingSegment = horizontal ? [[lineLo, at], [lineHi, at]] : [[at, lineLo], [at, lineHi]];
			const result: PlacedDimension = { id: d.id, side, tier, line, ends, extensions: [[d.from, beyond(d.from)], [d.to, beyond(d.to)]], label };
			grow(label.box);
			for (const s of [line, ...result.extensions]) for (const q of s) grow({ minXMm: q[0], minYMm: q[1], maxXMm: q[0], maxYMm: q[1] });
			return result;
		};

		// an extension line of an outer tier must not run through an inner tier's label: slide that label past its span
		tiers.forEach((tier, k) => {
			const crossings = tiers.slice(k + 1).flat().flatMap((q) => [q.lo, q.hi]);
			const margin = ALONG_GAP_EM * th * 0.5;
			const crossed = (lo: number, hi: number) => crossings.some((c) => c > lo - margin && c < hi + margin);
			for (const p of tier) {
				if (!crossed(p.labelLo, p.labelHi)) continue;
				const size = p.labelHi - p.labelLo;
				const gap = ALONG_GAP_EM * th;
				for (const lo of [p.hi + gap, p.lo - gap - size]) {
					const hi = lo + size;
					const inside = size > extent || (lo >= 0 && hi <= extent);
					const free = tier.every((q) => q === p || hi + gap <= Math.min(q.lo, q.labelLo) || lo - gap >= Math.max(q.hi, q.labelHi));
					if (inside && free && !crossed(lo, hi)) {
						p.labelLo = lo;
						p.labelHi = hi;
						break;
					}
				}
			}
		});

		// distance of each tier's line from the board edge
		let offset = FIRST_GAP_EM * th;
		tiers.forEach((tier, k) => {
			const depth = horizontal ? boxH : maxOf(tier.map((p) => p.widthMm));
			for (const p of tier) placed.push(place(p, k, offset));
			offset += LABEL_GAP_EM * th + depth + TIER_GAP_EM * th + FIRST_GAP_EM * th * 0.5;
		});
	}
	return { dimensions: placed, bounds };
}
