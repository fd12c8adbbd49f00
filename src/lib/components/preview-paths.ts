// Artwork geometry as SVG path data for the on-screen preview: y flipped once here (the board's y points up).
import type { ArtworkDimension, ArtworkShape } from '../artwork';
import { arcSweepRad, type Contour, type Point } from '../geometry';

const n = (v: number) => String(Math.round(v * 1e4) / 1e4);

/** Screen point of a board point on a board of length `boardLengthMm`. */
export const toScreen = (p: Point, boardLengthMm: number): [number, number] => [p[0], boardLengthMm - p[1]];

export function contourPath(c: Contour, boardLengthMm: number): string {
	const [sx, sy] = toScreen(c.start, boardLengthMm);
	let d = `M${n(sx)} ${n(sy)}`;
	let from = c.start;
	for (const seg of c.segments) {
		const [x, y] = toScreen(seg.to, boardLengthMm);
		if (seg.kind === 'line') d += `L${n(x)} ${n(y)}`;
		else {
			const r = Math.hypot(from[0] - seg.center[0], from[1] - seg.center[1]);
			const sweep = arcSweepRad(from, seg.to, seg.center, seg.clockwise);
			// Flipping y turns a counter-clockwise board arc into SVG's negative-angle sweep (flag 0).
			d += `A${n(r)} ${n(r)} 0 ${Math.abs(sweep) > Math.PI ? 1 : 0} ${seg.clockwise ? 1 : 0} ${n(x)} ${n(y)}`;
		}
		from = seg.to;
	}
	return `${d}Z`;
}

export type PreviewShape =
	| { kind: 'path'; id: string; d: string; clear: boolean; stroke: number | null }
	| { kind: 'circle'; id: string; cx: number; cy: number; r: number; clear: boolean };

export function previewShape(shape: ArtworkShape, boardLengthMm: number): PreviewShape {
	const g = shape.geometry;
	const clear = shape.polarity === 'clear';
	switch (g.kind) {
		case 'circle': {
			const [cx, cy] = toScreen(g.center, boardLengthMm);
			return { kind: 'circle', id: shape.id, cx, cy, r: g.diameterMm / 2, clear };
		}
		case 'region':
			return { kind: 'path', id: shape.id, d: [g.region.outer, ...g.region.holes].map((c) => contourPath(c, boardLengthMm)).join(''), clear, stroke: null };
		case 'outline':
			return { kind: 'path', id: shape.id, d: contourPath(g.contour, boardLengthMm), clear, stroke: g.strokeWidthMm };
	}
}

export interface PreviewDimension {
	id: string;
	/** The dimension line, offset to its side. */
	x1: number;
	y1: number;
	x2: number;
	y2: number;
	/** Extension lines from the measured points to the dimension line. */
	ext: [number, number, number, number][];
	textX: number;
	textY: number;
	vertical: boolean;
	text: string;
}

/** Dimensions that sit inside the board (drawn beside what they measure); the rest stack outside its edges. */
const LOCAL_DIMENSIONS = new Set(['inset-depth']);

/**
 * Every dimension in screen coordinates. Outer ones are stacked per side of the board, the shortest
 * nearest the edge, `stepMm` apart, so their lines and texts never overlap.
 */
export function previewDimensions(dims: readonly ArtworkDimension[], board: { widthMm: number; lengthMm: number }, stepMm: number): PreviewDimension[] {
	const L = board.lengthMm;
	const rank = new Map<string, number>();
	for (const side of ['above', 'below', 'left', 'right'] as const) {
		dims.filter((d) => d.side === side && !LOCAL_DIMENSIONS.has(d.id))
			.sort((a, b) => a.valueMm - b.valueMm)
			.forEach((d, i) => rank.set(d.id, i));
	}
	return dims.map((dim) => {
		const [ax, ay] = toScreen(dim.from, L);
		const [bx, by] = toScreen(dim.to, L);
		const vertical = dim.side === 'left' || dim.side === 'right';
		const [dx, dy] = { above: [0, -1], below: [0, 1], left: [-1, 0], right: [1, 0] }[dim.side] as [number, number];
		let line: number;
		if (LOCAL_DIMENSIONS.has(dim.id)) {
			line = vertical ? ax + dx * stepMm * 0.6 : ay + dy * stepMm * 0.6;
		} else {
			const k = (rank.get(dim.id) ?? 0) + 1;
			line = { above: -k * stepMm, below: L + k * stepMm, left: -k * stepMm, right: board.widthMm + k * stepMm }[dim.side];
		}
		const [x1, y1, x2, y2] = vertical ? [line, ay, line, by] : [ax, line, bx, line];
		const over = stepMm * 0.15;
		const textGap = stepMm * 0.38;
		return {
			id: dim.id,
			x1,
			y1,
			x2,
			y2,
			ext: [
				[ax, ay, x1 + dx * over, y1 + dy * over],
				[bx, by, x2 + dx * over, y2 + dy * over]
			],
			// Text on the far side of the line for outer dimensions, beside it for local ones.
			textX: (x1 + x2) / 2 + (vertical ? dx * textGap : 0),
			textY: (y1 + y2) / 2 + (vertical ? 0 : dy * textGap),
			vertical,
			text: `${dim.label} ${dim.valueMm.toFixed(2)}`
		};
	});
}
