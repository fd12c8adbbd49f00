// Artwork geometry as SVG path data for the on-screen preview: y flipped once here (the board's y points up).
import type { ArtworkDimension, ArtworkLayer, ArtworkShape, ShapeRole } from '../artwork';
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

/** An open polyline (a legend stroke) as path data. */
export function polylinePath(points: readonly Point[], boardLengthMm: number): string {
	return points.map((p, i) => {
		const [x, y] = toScreen(p, boardLengthMm);
		return `${i === 0 ? 'M' : 'L'}${n(x)} ${n(y)}`;
	}).join('');
}

export type PreviewShape =
	| { kind: 'path'; id: string; role: ShapeRole; d: string; clear: boolean; stroke: number | null }
	| { kind: 'circle'; id: string; role: ShapeRole; cx: number; cy: number; r: number; clear: boolean };

export function previewShape(shape: ArtworkShape, boardLengthMm: number): PreviewShape {
	const g = shape.geometry;
	const clear = shape.polarity === 'clear';
	switch (g.kind) {
		case 'circle': {
			const [cx, cy] = toScreen(g.center, boardLengthMm);
			return { kind: 'circle', id: shape.id, role: shape.role, cx, cy, r: g.diameterMm / 2, clear };
		}
		case 'region':
			return { kind: 'path', id: shape.id, role: shape.role, d: [g.region.outer, ...g.region.holes].map((c) => contourPath(c, boardLengthMm)).join(''), clear, stroke: null };
		case 'outline':
			return { kind: 'path', id: shape.id, role: shape.role, d: contourPath(g.contour, boardLengthMm), clear, stroke: g.strokeWidthMm };
		case 'stroke':
			return { kind: 'path', id: shape.id, role: shape.role, d: polylinePath(g.points, boardLengthMm), clear, stroke: g.strokeWidthMm };
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
export function previewDimensions(dims: readonly ArtworkDimension[], board: { widthMm: number; lengthMm: number }, stepMm: number, formatMm: (mm: number) => string = (mm) => mm.toFixed(2)): PreviewDimension[] {
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
			text: `${dim.label} ${formatMm(dim.valueMm)}`
		};
	});
}

/** How the preview draws and names one artwork layer. */
export interface PreviewLayerStyle {
	fill: string;
	opacity: number;
	/**
	 * How the layer is told apart without its hue (WCAG 2.2 SC 1.4.1 use of colour): ground planes are hatched,
	 * every other layer is solid.
	 */
	pattern: 'solid' | 'hatched';
	/** Legend and toggle text. */
	label: string;
	/** Drawing order: lower first (masks and profile, then ground planes, then the other coppers from the bottom up). */
	order: number;
}

// Colours are the tailwind.config.ts tokens (copper, ground, substrate, ok).
const TOP_COPPER = '#d98f55';
const INNER_COPPER = '#b0622b';
const BOTTOM_COPPER = '#6e3a17';
const GROUND = '#8594a8';
/** Legend ink: a dark plum that reads on the light substrate, drawn over everything else. */
const LEGEND_INK = '#2b2140';

/** What a copper layer carries, in words: "ground", "patch", "patch + feed", "feed", "parasitic patch". */
function copperContents(layer: ArtworkLayer): string {
	const roles = new Set(layer.shapes.map((s) => s.role));
	if (roles.has('ground')) return 'ground';
	if (roles.has('parasitic-patch')) return 'parasitic patch';
	const feed = roles.has('feed-line') || roles.has('feed-network') || roles.has('transformer');
	if (roles.has('patch')) return feed ? 'patch + feed' : 'patch';
	return feed ? 'feed' : 'copper';
}

/**
 * Style of each layer of an artwork. A two-copper board keeps its two names (top copper, ground); a
 * stack names each copper by its number and what it carries ("L2 ground"), so inner layers get toggles too.
 */
export function previewLayerStyles(layers: readonly ArtworkLayer[]): Record<string, PreviewLayerStyle> {
	const coppers = layers.filter((l) => l.function.kind === 'copper');
	const out: Record<string, PreviewLayerStyle> = {};
	for (const layer of layers) {
		const fn = layer.function;
		if (fn.kind === 'profile') out[layer.id] = { fill: '#242d3b', opacity: 1, pattern: 'solid', label: 'Profile', order: 2 };
		else if (fn.kind === 'legend') out[layer.id] = { fill: LEGEND_INK, opacity: 1, pattern: 'solid', label: fn.side === 'top' ? 'Top legend' : 'Bottom legend', order: 30 };
		else if (fn.kind === 'solder-mask') out[layer.id] = { fill: '#2f8f5b', opacity: fn.side === 'top' ? 0.35 : 0.25, pattern: 'solid', label: fn.side === 'top' ? 'Top mask openings' : 'Bottom mask openings', order: fn.side === 'top' ? 1 : 0 };
		else {
			const what = copperContents(layer);
			const ground = what === 'ground';
			const fill = ground ? GROUND : fn.side === 'top' ? TOP_COPPER : fn.side === 'inner' ? INNER_COPPER : BOTTOM_COPPER;
			const label = coppers.length === 2 ? (ground ? 'Ground' : fn.side === 'top' ? 'Top copper' : 'Bottom copper') : `L${fn.copperIndex} ${what}`;
			out[layer.id] = { fill, pattern: ground ? 'hatched' : 'solid', opacity: ground ? 0.55 : fn.side === 'top' ? (coppers.length > 2 ? 0.8 : 0.95) : 0.85, label, order: ground ? 3 : 10 + (coppers.length - fn.copperIndex) };
		}
	}
	return out;
}

/** Counts for the preview's caption: driven patches, parasitic patches, pieces of a corporate feed. */
export function previewCounts(layers: readonly ArtworkLayer[]): { patches: number; parasitics: number; networkPieces: number } {
	const all = layers.filter((l) => l.function.kind === 'copper').flatMap((l) => l.shapes);
	return {
		patches: all.filter((s) => s.role === 'patch').length,
		parasitics: all.filter((s) => s.role === 'parasitic-patch').length,
		networkPieces: all.filter((s) => s.role === 'feed-network' || s.role === 'network-transformer').length
	};
}

/** The preview's visible window, in millimetres of the screen frame. */
export interface PreviewBox {
	x: number;
	y: number;
	w: number;
	h: number;
}

/** A tenth of the window per arrow press; ×1.4 per zoom step (the buttons use the same factor). */
export const KEY_PAN_FRACTION = 0.1;
export const KEY_ZOOM_FACTOR = 1.4;

/**
 * What a key does to the preview (WCAG 2.2 SC 2.1.1 keyboard): arrows pan, + and − zoom about the centre,
 * 0 returns to the fitted view. Returns 'fit' to reset, the new window, or null for a key the preview ignores.
 */
export function previewKeyStep(key: string, box: PreviewBox): PreviewBox | 'fit' | null {
	const dx = box.w * KEY_PAN_FRACTION;
	const dy = box.h * KEY_PAN_FRACTION;
	const zoomBy = (factor: number): PreviewBox => {
		const w = box.w * factor;
		const h = box.h * factor;
		return { x: box.x + (box.w - w) / 2, y: box.y + (box.h - h) / 2, w, h };
	};
	switch (key) {
		case 'ArrowLeft':
			return { ...box, x: box.x - dx };
		case 'ArrowRight':
			return { ...box, x: box.x + dx };
		case 'ArrowUp':
			return { ...box, y: box.y - dy };
		case 'ArrowDown':
			return { ...box, y: box.y + dy };
		case '+':
		case '=':
			return zoomBy(1 / KEY_ZOOM_FACTOR);
		case '-':
		case '_':
		case '−':
			return zoomBy(KEY_ZOOM_FACTOR);
		case '0':
			return 'fit';
		default:
			return null;
	}
}
