// The top legend (silkscreen): name, a slot for revision and date, order text, feed and polarisation marks, placed clear of copper.
import { createRectangleContour, contourBounds, maxOf, minOf, type Bounds, type Point } from '../geometry';
import { toLegendText } from '../schemas/design-input';
import type { SizedDesign } from '../rf/sized-design';
import { textStrokes, textWidthMm } from './stroke-font';
import type { Artwork, ArtworkLayer, ArtworkShape, ShapeGeometry } from './types';

/** Cap height of legend text: common practice, no source (board houses print legend text from about 0.8–1 mm up). */
export const LEGEND_TEXT_HEIGHT_MM = 1;
/** The smallest cap height tried before an item is left out (common practice, no source). */
export const LEGEND_MIN_TEXT_HEIGHT_MM = 0.8;
/** Pen width of legend lines: common practice, no source (0.12–0.15 mm is a usual least legend line). */
export const LEGEND_STROKE_WIDTH_MM = 0.15;
/** Ink kept this far from any top copper and mask opening when placing (twice the default check clearance). */
export const LEGEND_COPPER_CLEARANCE_MM = 0.3;
/** Ink kept this far from the board edge when placing (the default check asks 0.25 mm). */
export const LEGEND_EDGE_CLEARANCE_MM = 0.4;
/**
 * Ink kept this many substrate heights h from the patch: its fringing field reaches about h past the radiating
 * edges, and ink there (εr ≈ 3–4) detunes it like mask does. Common practice, no source.
 */
export const LEGEND_PATCH_KEEP_OUT_HEIGHTS = 2;
/**
 * Room kept free where the feed meets the board edge, for an edge connector and its launch: ±4 mm along the edge
 * and 3 mm in (about an edge-launch SMA's body; common practice, no source).
 */
export const LEGEND_LAUNCH_KEEP_OUT = Object.freeze({ halfWidthMm: 4, depthMm: 3 });
/** Gap between two legend items. */
const ITEM_GAP_MM = 0.6;
/** Placement grid. */
const GRID_MM = 0.2;
/** The revision line's slot holds "REV " + a label of up to 4 characters + " " + the date; longer labels are drawn narrower to fit. */
const REVISION_SLOT_CHARACTERS = 'REV XXXX YYYY-MM-DD'.length;

/** Roles of radiating copper, kept LEGEND_PATCH_KEEP_OUT_HEIGHTS × h clear. */
const RADIATING_ROLES: readonly ArtworkShape['role'][] = ['patch', 'parasitic-patch', 'tuning-stub'];

type Polyline = Point[];
interface Block {
	key: string;
	widthMm: number;
	heightMm: number;
	/** Centre lines relative to the block's lower-left corner. */
	draw: () => Polyline[];
	/** A block reserved for the revision line: drawn when the export stamps it (stampLegend). */
	slot?: true;
}

const rect = (minXMm: number, minYMm: number, maxXMm: number, maxYMm: number): Bounds => ({ minXMm, minYMm, maxXMm, maxYMm });
const grow = (b: Bounds, d: number): Bounds => rect(b.minXMm - d, b.minYMm - d, b.maxXMm + d, b.maxYMm + d);
const overlaps = (a: Bounds, b: Bounds) => a.minXMm < b.maxXMm && b.minXMm < a.maxXMm && a.minYMm < b.maxYMm && b.minYMm < a.maxYMm;
const shift = (lines: Polyline[], dx: number, dy: number): Polyline[] => lines.map((l) => l.map(([x, y]): Point => [x + dx, y + dy]));

/** Extents of a filled or stroked shape. */
export function shapeBounds(g: ShapeGeometry): Bounds {
	switch (g.kind) {
		case 'circle':
			return grow(rect(g.center[0], g.center[1], g.center[0], g.center[1]), g.diameterMm / 2);
		case 'region':
			return contourBounds(g.region.outer);
		case 'outline':
			return grow(contourBounds(g.contour), g.strokeWidthMm / 2);
		case 'stroke': {
			const xs = g.points.map((p) => p[0]);
			const ys = g.points.map((p) => p[1]);
			return grow(rect(minOf(xs), minOf(ys), maxOf(xs), maxOf(ys)), g.strokeWidthMm / 2);
		}
	}
}

/** An arrow of length `lengthMm` from its tail to its tip at (0, 0), pointing along +x before `rotate`. */
function arrow(lengthMm: number, headMm: number, rotate: (p: Point) => Point): Polyline[] {
	return [
		[rotate([-lengthMm, 0]), rotate([0, 0])],
		[rotate([-headMm, headMm * 0.6]), rotate([0, 0]), rotate([-headMm, -headMm * 0.6])]
	];
}

type Direction = 'left' | 'right' | 'up' | 'down';
const unit: Record<Direction, Point> = { left: [-1, 0], right: [1, 0], up: [0, 1], down: [0, -1] };
const rotation: Record<Direction, (p: Point) => Point> = {
	right: ([x, y]) => [x, y],
	left: ([x, y]) => [-x, -y],
	up: ([x, y]) => [-y, x],
	down: ([x, y]) => [y, -x]
};

/** The feed marker: an arrow pointing `dir` at the feed and the word FEED; returns the block and the tip relative to it. */
function feedMarker(h: number, dir: Direction): { block: Block; tip: Point } {
	const word = textWidthMm(4, h);
	const len = 2 * h;
	const head = 0.45 * h;
	const gap = 0.5 * h;
	if (dir === 'left' || dir === 'right') {
		const w = len + gap + word;
		const tip: Point = dir === 'left' ? [0, h / 2] : [w, h / 2];
		const textX = dir === 'left' ? len + gap : 0;
		const draw = () => [...shift(arrow(len, head, rotation[dir]), tip[0], tip[1]), ...textStrokes('FEED', [textX, 0], h)];
		return { block: { key: 'feed-marker', widthMm: w, heightMm: h, draw }, tip };
	}
	const hgt = h + gap + len;
	const tip: Point = dir === 'up' ? [word / 2, hgt] : [word / 2, 0];
	const textY = dir === 'up' ? 0 : len + gap;
	const draw = () => [...shift(arrow(len, head, rotation[dir]), tip[0], tip[1]), ...textStrokes('FEED', [0, textY], h)];
	return { block: { key: 'feed-marker', widthMm: word, heightMm: hgt, draw }, tip };
}

/**
 * The polarisation mark. A linearly polarised patch: a double arrow along its E-plane (the feed axis, y) and "LP".
 * A circularly polarised one: a three-quarter circle arrow turning the way the field turns as seen looking at the
 * top side (the wave coming towards the viewer), counter-clockwise for RHCP (IEEE Std 145 sense, from memory), and
 * "RHCP" or "LHCP".
 */
function polarisationMark(sized: SizedDesign, h: number): Block {
	const p = sized.patch;
	const hand = p.kind === 'truncated-corner' || p.kind === 'nearly-square' ? p.handedness : null;
	const label = hand ? hand.toUpperCase() : 'LP';
	const sign = h;
	const gap = 0.5 * h;
	const r = sign / 2;
	const c: Point = [r, r];
	const lines: Polyline[] = [];
	if (hand) {
		const ccw = hand === 'rhcp';
		const steps = 24;
		const start = ccw ? -Math.PI / 2 : (3 * Math.PI) / 2;
		const sweep = ccw ? 1.5 * Math.PI : -1.5 * Math.PI;
		const arc: Point[] = [];
		for (let i = 0; i <= steps; i++) {
			const a = start + (sweep * i) / steps;
			arc.push([c[0] + r * Math.cos(a), c[1] + r * Math.sin(a)]);
		}
		lines.push(arc);
		const end = arc[arc.length - 1];
		const a = start + sweep;
		// tangent direction at the end of the arc, then an arrow head there
		const t: Point = ccw ? [-Math.sin(a), Math.cos(a)] : [Math.sin(a), -Math.cos(a)];
		const n: Point = [-t[1], t[0]];
		const k = 0.4 * h;
		lines.push([[end[0] - k * t[0] + 0.6 * k * n[0], end[1] - k * t[1] + 0.6 * k * n[1]], end, [end[0] - k * t[0] - 0.6 * k * n[0], end[1] - k * t[1] - 0.6 * k * n[1]]]);
	} else {
		const k = 0.35 * h;
		lines.push([[r, 0], [r, sign]], [[r - 0.6 * k, k], [r, 0], [r + 0.6 * k, k]], [[r - 0.6 * k, sign - k], [r, sign], [r + 0.6 * k, sign - k]]);
	}
	// the mark's own extents (an arrow head may reach past the circle), moved to start at the block's corner
	const xs = lines.flat().map((p) => p[0]);
	const ys = lines.flat().map((p) => p[1]);
	const [x0, y0] = [minOf(xs), minOf(ys)];
	const markWidth = maxOf(xs) - x0;
	const markHeight = maxOf(ys) - y0;
	const height = Math.max(markHeight, h);
	const mark = shift(lines, -x0, (height - markHeight) / 2 - y0);
	const draw = (): Polyline[] => [...mark, ...textStrokes(label, [markWidth + gap, (height - h) / 2], h)];
	return { key: 'polarisation-mark', widthMm: markWidth + gap + textWidthMm(label.length, h), heightMm: height, draw };
}

/** The default order line: copper count and the finished dielectric thickness, e.g. "2L 1.6MM". */
function defaultOrderText(artwork: Artwork): string {
	const dielectricMm = artwork.stack.reduce((a, l) => a + (l.kind === 'dielectric' ? l.thicknessMm : 0), 0);
	return `${artwork.metadata.copperLayerCount}L ${String(Math.round(dielectricMm * 1000) / 1000)}MM`;
}

/** What the legend must stay clear of: top copper, openings and holes (with clearance), the patch's near field and the launch. */
function keepOuts(artwork: Artwork, sized: SizedDesign): { boxes: Bounds[]; feedPoint: Point | null } {
	const boxes: Bounds[] = [];
	const h = artwork.stack.find((l) => l.kind === 'dielectric')?.thicknessMm ?? sized.input.substrate.heightMm;
	// copper that meets the board's lower edge and is neither plane nor patch: the feed's entry (its line, or pads placed there)
	let entry: Bounds | null = null;
	for (const layer of artwork.layers) {
		const f = layer.function;
		const topSide = (f.kind === 'copper' && f.side === 'top') || (f.kind === 'solder-mask' && f.side === 'top');
		for (const s of layer.shapes) {
			if (s.polarity !== 'dark') continue;
			const b = shapeBounds(s.geometry);
			if (topSide) boxes.push(grow(b, RADIATING_ROLES.includes(s.role) ? Math.max(LEGEND_COPPER_CLEARANCE_MM, LEGEND_PATCH_KEEP_OUT_HEIGHTS * h) : LEGEND_COPPER_CLEARANCE_MM));
			const atEdge = f.kind === 'copper' && s.role !== 'ground' && !RADIATING_ROLES.includes(s.role) && b.minYMm < 1e-6 && b.maxXMm - b.minXMm < artwork.board.widthMm / 2;
			if (atEdge) entry = entry ? rect(Math.min(entry.minXMm, b.minXMm), 0, Math.max(entry.maxXMm, b.maxXMm), 0) : rect(b.minXMm, 0, b.maxXMm, 0);
		}
	}
	for (const d of artwork.drills) boxes.push(grow(rect(d.center[0], d.center[1], d.center[0], d.center[1]), d.diameterMm / 2 + LEGEND_COPPER_CLEARANCE_MM));
	const probe = artwork.drills.find((d) => d.role === 'probe');
	let feedPoint: Point | null = null;
	if (probe) feedPoint = probe.center;
	else if (entry) {
		const { halfWidthMm, depthMm } = LEGEND_LAUNCH_KEEP_OUT;
		const cx = (entry.minXMm + entry.maxXMm) / 2;
		feedPoint = [cx, 0];
		boxes.push(rect(Math.min(entry.minXMm, cx - halfWidthMm), -1, Math.max(entry.maxXMm, cx + halfWidthMm), depthMm));
	}
	return { boxes, feedPoint };
}

interface Placement {
	at: Point;
	cost: number;
}

/** The cheapest free lower-left corner for a block, or null when it fits nowhere. */
function place(block: Block, board: Artwork['board'], taken: readonly Bounds[], cost: (at: Point) => number | null): Placement | null {
	const half = LEGEND_STROKE_WIDTH_MM / 2;
	const lo = LEGEND_EDGE_CLEARANCE_MM + half;
	const maxX = board.widthMm - lo - block.widthMm;
	const maxY = board.lengthMm - lo - block.heightMm;
	let best: Placement | null = null;
	for (let y = lo; y <= maxY + 1e-9; y += GRID_MM) {
		for (let x = lo; x <= maxX + 1e-9; x += GRID_MM) {
			const ink = rect(x - half, y - half, x + block.widthMm + half, y + block.heightMm + half);
			if (taken.some((t) => overlaps(ink, t))) continue;
			const c = cost([x, y]);
			if (c !== null && (!best || c < best.cost)) best = { at: [x, y], cost: c };
		}
	}
	return best;
}

/**
 * Legend points snapped to 1 µm: a value the Gerber file (6 decimals of mm) holds exactly, so the read-back
 * rebuilds the very same ink and no hair-thin slivers are left between two almost equal pictures.
 */
const snap = (v: number) => Math.round(v * 1000) / 1000;

const strokeShape = (id: string, points: Polyline): ArtworkShape => ({
	id,
	role: 'legend',
	polarity: 'dark',
	geometry: { kind: 'stroke', points: points.map(([x, y]): Point => [snap(x), snap(y)]), strokeWidthMm: LEGEND_STROKE_WIDTH_MM }
});

/**
 * The artwork with a top legend layer when the document asks for one (`legend`); unchanged (the same object)
 * otherwise. Items are placed on a 0.2 mm grid clear of every keep-out, the feed marker as near the feed as it
 * fits and pointing at it, the rest from the lower-left; an item that fits nowhere even at the smallest text
 * height is left out and named in `metadata.legend.omitted` (the fab notes list it).
 */
export function withLegend(artwork: Artwork, sized: SizedDesign): Artwork {
	const options = sized.input.legend;
	if (!options) return artwork;
	const { boxes, feedPoint } = keepOuts(artwork, sized);
	const taken: Bounds[] = [...boxes];
	const shapes: ArtworkShape[] = [];
	const voids: ArtworkShape[] = [];
	const placed: string[] = [];
	const omitted: string[] = [];
	let used = LEGEND_TEXT_HEIGHT_MM;
	const commit = (block: Block, at: Point) => {
		const half = LEGEND_STROKE_WIDTH_MM / 2;
		taken.push(rect(at[0] - half - ITEM_GAP_MM, at[1] - half - ITEM_GAP_MM, at[0] + block.widthMm + half + ITEM_GAP_MM, at[1] + block.heightMm + half + ITEM_GAP_MM));
		placed.push(block.key);
		if (block.slot) {
			voids.push({ id: 'legend-revision-slot', role: 'legend-slot', polarity: 'dark', geometry: { kind: 'region', region: { outer: createRectangleContour(at[0], at[1], block.widthMm, block.heightMm), holes: [] } } });
			return;
		}
		shift(block.draw(), at[0], at[1]).forEach((line, i) => shapes.push(strokeShape(`legend-${block.key}-${i + 1}`, line)));
	};
	const heights = [LEGEND_TEXT_HEIGHT_MM, LEGEND_MIN_TEXT_HEIGHT_MM];
	const readingOrder = (at: Point) => at[1] * 1e4 + at[0];

	// the feed marker first: nearest the feed, pointing at it
	if (feedPoint) {
		let best: { block: Block; at: Point; cost: number } | null = null;
		for (const hgt of heights) {
			for (const dir of ['left', 'right', 'up', 'down'] as const) {
				const { block, tip } = feedMarker(hgt, dir);
				const p = place(block, artwork.board, taken, ([x, y]) => {
					const dx = feedPoint[0] - (x + tip[0]);
					const dy = feedPoint[1] - (y + tip[1]);
					const along = dx * unit[dir][0] + dy * unit[dir][1];
					const across = Math.abs(dx * unit[dir][1] - dy * unit[dir][0]);
					return along > 0 && across <= along ? Math.hypot(dx, dy) : null;
				});
				if (p && (!best || p.cost < best.cost)) best = { block, at: p.at, cost: p.cost };
			}
			if (best) break;
		}
		if (best) commit(best.block, best.at);
		else omitted.push('feed-marker');
	} else omitted.push('feed-marker');

	const name = toLegendText(sized.input.name);
	const order = toLegendText(options.orderText ?? defaultOrderText(artwork));
	const textBlock = (key: string, text: string, hgt: number): Block => ({ key, widthMm: textWidthMm(text.length, hgt), heightMm: hgt, draw: () => textStrokes(text, [0, 0], hgt) });
	const tryPlace = (make: (hgt: number) => Block | null): boolean => {
		for (const hgt of heights) {
			const block = make(hgt);
			if (!block) continue;
			const p = place(block, artwork.board, taken, readingOrder);
			if (p) {
				commit(block, p.at);
				used = Math.min(used, hgt);
				return true;
			}
		}
		return false;
	};
	// the name, shortened one character at a time (to three) before it is left out
	let nameDone = name.length === 0;
	for (let n = name.length; n >= Math.min(3, name.length) && !nameDone && n > 0; n--) {
		const text = name.slice(0, n).trim();
		nameDone = tryPlace((hgt) => textBlock('name', text, hgt));
	}
	if (!nameDone) omitted.push('name');
	const slotBlock = (hgt: number): Block => ({ key: 'revision', widthMm: textWidthMm(REVISION_SLOT_CHARACTERS, hgt), heightMm: hgt, draw: () => [], slot: true });
	if (!tryPlace(slotBlock)) omitted.push('revision');
	if (!tryPlace((hgt) => textBlock('order-text', order, hgt))) omitted.push('order-text');
	if (!tryPlace((hgt) => polarisationMark(sized, hgt))) omitted.push('polarisation-mark');

	const layer: ArtworkLayer = { id: 'legend-top', title: 'Top legend', function: { kind: 'legend', side: 'top' }, shapes, voids };
	return {
		...artwork,
		layers: [...artwork.layers, layer],
		metadata: { ...artwork.metadata, legend: { textHeightMm: used, strokeWidthMm: LEGEND_STROKE_WIDTH_MM, placed, omitted } }
	};
}

/** The revision line as the legend prints it. */
export function revisionLegendText(revision: { revisionLabel: string; revisionDate: string }): string {
	return toLegendText(`REV ${revision.revisionLabel} ${revision.revisionDate}`);
}

/**
 * The legend with its revision slot drawn: "REV <label> <date>" from the revision's metadata (never the clock),
 * squeezed along x when a long label would overrun the slot, so the ink never leaves the box the design-rule
 * check saw. An artwork without a slot is returned as it is (the same object).
 */
export function stampLegend(artwork: Artwork, revision: { revisionLabel: string; revisionDate: string }): Artwork {
	const index = artwork.layers.findIndex((l) => l.function.kind === 'legend' && l.voids.some((v) => v.role === 'legend-slot'));
	if (index < 0) return artwork;
	const layer = artwork.layers[index];
	const slot = layer.voids.find((v) => v.role === 'legend-slot')!;
	const b = shapeBounds(slot.geometry);
	const hgt = b.maxYMm - b.minYMm;
	const text = revisionLegendText(revision);
	const xScale = Math.min(1, (b.maxXMm - b.minXMm) / textWidthMm(text.length, hgt));
	const strokes = textStrokes(text, [b.minXMm, b.minYMm], hgt, xScale).map((line, i) => strokeShape(`legend-revision-${i + 1}`, line));
	const stamped: ArtworkLayer = { ...layer, shapes: [...layer.shapes, ...strokes], voids: layer.voids.filter((v) => v !== slot) };
	return { ...artwork, layers: artwork.layers.map((l, i) => (i === index ? stamped : l)) };
}
