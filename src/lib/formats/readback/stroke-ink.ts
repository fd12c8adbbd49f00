// A legend's strokes judged as strokes: their pen-swept area, their extents, and a stroke-by-stroke comparison.
import type { Bounds } from '../../geometry';
import type { FabStroke } from './fab-view';

/** Σ over strokes of (centre-line length × pen width + one pen disc): overlaps counted again, a figure to compare and show. */
export function strokeInkArea(strokes: readonly FabStroke[]): number {
	let sum = 0;
	for (const s of strokes) {
		let length = 0;
		for (let i = 1; i < s.points.length; i++) length += Math.hypot(s.points[i][0] - s.points[i - 1][0], s.points[i][1] - s.points[i - 1][1]);
		sum += length * s.widthMm + (Math.PI * s.widthMm * s.widthMm) / 4;
	}
	return sum;
}

/** Extents of the ink: the centre lines grown by half the pen width; null without strokes. */
export function strokeInkBounds(strokes: readonly FabStroke[]): Bounds | null {
	if (strokes.length === 0) return null;
	let b: Bounds = { minXMm: Infinity, minYMm: Infinity, maxXMm: -Infinity, maxYMm: -Infinity };
	for (const s of strokes) {
		const r = s.widthMm / 2;
		for (const [x, y] of s.points) b = { minXMm: Math.min(b.minXMm, x - r), minYMm: Math.min(b.minYMm, y - r), maxXMm: Math.max(b.maxXMm, x + r), maxYMm: Math.max(b.maxYMm, y + r) };
	}
	return b;
}

/**
 * The first way two stroke lists differ, or null: how many there are, then per stroke (in order) polarity, pen
 * width (within `widthToleranceMm`), point count and every point (within `positionToleranceMm`).
 */
export function strokeDifference(want: readonly FabStroke[], got: readonly FabStroke[], positionToleranceMm: number, widthToleranceMm: number): string | null {
	if (want.length !== got.length) return `${want.length} strokes in the artwork, ${got.length} in the file`;
	for (let i = 0; i < want.length; i++) {
		const a = want[i];
		const b = got[i];
		if (a.polarity !== b.polarity) return `stroke ${i + 1} is ${a.polarity} in the artwork, ${b.polarity} in the file`;
		if (Math.abs(a.widthMm - b.widthMm) > widthToleranceMm) return `stroke ${i + 1} is ${a.widthMm} mm wide in the artwork, ${b.widthMm} mm in the file`;
		if (a.points.length !== b.points.length) return `stroke ${i + 1} has ${a.points.length} points in the artwork, ${b.points.length} in the file`;
		const k = a.points.findIndex((p, j) => Math.hypot(p[0] - b.points[j][0], p[1] - b.points[j][1]) > positionToleranceMm);
		if (k >= 0) return `stroke ${i + 1}, point ${k + 1}: (${a.points[k].join(', ')}) in the artwork, (${b.points[k].join(', ')}) in the file`;
	}
	return null;
}
