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

/** A dimension drawn `offsetMm` to its side, in screen coordinates. */
export function previewDimension(dim: ArtworkDimension, boardLengthMm: number, offsetMm: number): PreviewDimension {
	const [ax, ay] = toScreen(dim.from, boardLengthMm);
	const [bx, by] = toScreen(dim.to, boardLengthMm);
	const [dx, dy] = { above: [0, -1], below: [0, 1], left: [-1, 0], right: [1, 0] }[dim.side] as [number, number];
	const o = offsetMm;
	const x1 = ax + dx * o;
	const y1 = ay + dy * o;
	const x2 = bx + dx * o;
	const y2 = by + dy * o;
	const vertical = dim.side === 'left' || dim.side === 'right';
	const gap = o * 0.45;
	return {
		id: dim.id,
		x1,
		y1,
		x2,
		y2,
		ext: [
			[ax, ay, x1 + dx * o * 0.25, y1 + dy * o * 0.25],
			[bx, by, x2 + dx * o * 0.25, y2 + dy * o * 0.25]
		],
		textX: (x1 + x2) / 2 + dx * gap,
		textY: (y1 + y2) / 2 + dy * gap,
		vertical,
		text: `${dim.label} ${dim.valueMm.toFixed(2)}`
	};
}
