// Artwork → SVG element tree: the board's layers drawn bottom copper first (y flipped once: svgY = boardLength − y),
// then the sheet shared with the DXF writer: dimensions in tiers, datum A and the title block.
import type { Artwork, ArtworkLayer, ArtworkShape, DrawingLabel, DrawingSegment } from '../../artwork';
import { replaceControlCharacters } from '../../schemas/plain-text';
import type { Contour, Point } from '../../geometry';
import { buildDrawingSheet, type DrawingSheetOptions } from '../drawing-sheet';
import type { ExportMeta } from '../export-meta';
import type { SvgDocument, SvgElement } from './commands';
import { contourPathData } from './outline-path';
import { svgNumber } from './svg-number';

export { svgNumber };

/**
 * How a layer is drawn. Coppers are filled and opaque (a ground plane hatched, so copper above it keeps its own
 * colour); masks, the profile and any layer kind this writer does not know are outlines only, never a tint over
 * copper. What lies under the top copper shows again as dashed hidden edges.
 */
interface LayerLook {
	readonly fill: string | null;
	readonly stroke: string;
	readonly dash?: string;
	readonly opacity: string;
}

// Our own palette (the copper tones are the app's tailwind tokens, as in the preview).
const INK = '#242d3b';
const COPPER_BY_SIDE = { top: '#d98f55', inner: '#b0622b', bottom: '#6e3a17' } as const;
const GROUND_HATCH = { line: '#7d8ba0', paper: '#e6eaf0' } as const;
const SUBSTRATE = '#f3f5ec';
const MASK_OPENING = '#2f8f5b';
const OTHER_LAYER = '#5c4a8a';
const LEGEND_INK = '#3b3b46';
const HATCH_ID = 'ground-hatch';

const isGround = (layer: ArtworkLayer) => layer.function.kind === 'copper' && layer.shapes.some((s) => s.role === 'ground');

function lookOf(layer: ArtworkLayer): LayerLook {
	const fn = layer.function;
	switch (fn.kind) {
		case 'copper':
			if (isGround(layer)) return { fill: `url(#${HATCH_ID})`, stroke: 'none', opacity: '1' };
			return { fill: COPPER_BY_SIDE[fn.side], stroke: 'none', opacity: '1' };
		case 'solder-mask':
			return { fill: null, stroke: MASK_OPENING, dash: '0.6 0.4', opacity: '1' };
		case 'profile':
			return { fill: null, stroke: INK, opacity: '1' };
		case 'legend':
			// legend strokes in their pen width, in ink
			return { fill: null, stroke: LEGEND_INK, opacity: '1' };
		default:
			return { fill: null, stroke: OTHER_LAYER, opacity: '1' };
	}
}

/** Text content never holds a control character: most are not allowed in XML 1.0 at all (§2.2 Characters). */
const el = (name: SvgElement['name'], attributes: Record<string, string>, children: SvgElement[] = [], text?: string): SvgElement =>
	text === undefined ? { name, attributes, children } : { name, attributes, children, text: replaceControlCharacters(text) };

/** Ground planes first (they fill the board), then the other coppers from the bottom up, then the other layers in artwork order. */
function drawingOrder(layers: readonly ArtworkLayer[]): ArtworkLayer[] {
	const index = (l: ArtworkLayer) => (l.function.kind === 'copper' ? l.function.copperIndex : 0);
	const coppers = layers.filter((l) => l.function.kind === 'copper').sort((a, b) => index(b) - index(a));
	return [...coppers.filter(isGround), ...coppers.filter((l) => !isGround(l)), ...layers.filter((l) => l.function.kind !== 'copper')];
}

export function buildSvgTree(artwork: Artwork, meta: ExportMeta, options: DrawingSheetOptions = {}): SvgDocument {
	const boardLengthMm = artwork.board.lengthMm;
	const boardWidthMm = artwork.board.widthMm;
	const toSvgX = (x: number) => svgNumber(x);
	const toSvgY = (y: number) => svgNumber(boardLengthMm - y);

	const pathOf = (c: Contour): string => contourPathData(c, boardLengthMm);
	const strokePathOf = (points: readonly Point[]): string => points.map((p, i) => `${i === 0 ? 'M' : 'L'}${toSvgX(p[0])} ${toSvgY(p[1])}`).join('');
	const shapeElement = (s: ArtworkShape, look: LayerLook, fillOverride?: string): SvgElement => {
		const g = s.geometry;
		const fill = fillOverride ?? look.fill;
		const paint: Record<string, string> =
			fill === null ? { fill: 'none', stroke: look.stroke, 'stroke-width': '0.15', ...(look.dash ? { 'stroke-dasharray': look.dash } : {}) } : { fill };
		if (g.kind === 'circle') return el('circle', { id: s.id, cx: toSvgX(g.center[0]), cy: toSvgY(g.center[1]), r: svgNumber(g.diameterMm / 2), ...paint });
		if (g.kind === 'stroke')
			return el('path', { id: s.id, d: strokePathOf(g.points), fill: 'none', stroke: fill ?? look.stroke, 'stroke-width': svgNumber(g.strokeWidthMm), 'stroke-linecap': 'round', 'stroke-linejoin': 'round' });
		if (g.kind === 'outline') return el('path', { id: s.id, d: pathOf(g.contour), fill: 'none', stroke: look.fill ?? look.stroke, 'stroke-width': svgNumber(g.strokeWidthMm) });
		return el('path', { id: s.id, d: [g.region.outer, ...g.region.holes].map(pathOf).join(''), ...paint, ...(fill === null ? {} : { 'fill-rule': 'evenodd' }) });
	};

	const defs: SvgElement[] = [
		// ground planes hatched at 45°: told apart from copper without hue, and copper drawn over them keeps its colour
		el('pattern', { id: HATCH_ID, patternUnits: 'userSpaceOnUse', width: '1.2', height: '1.2', patternTransform: 'rotate(45)' }, [
			el('rect', { x: '0', y: '0', width: '1.2', height: '1.2', fill: GROUND_HATCH.paper }),
			el('rect', { x: '0', y: '0', width: '0.35', height: '1.2', fill: GROUND_HATCH.line })
		])
	];
	const layerGroups: SvgElement[] = drawingOrder(artwork.layers).map((layer) => {
		const look = lookOf(layer);
		const dark = layer.shapes.filter((s) => s.polarity === 'dark').map((s) => shapeElement(s, look));
		const clear = layer.shapes.filter((s) => s.polarity === 'clear');
		const attrs: Record<string, string> = { id: `layer-${layer.id}`, 'data-layer-title': layer.title, opacity: look.opacity };
		if (clear.length) {
			const maskId = `clear-${layer.id}`;
			defs.push(
				el('mask', { id: maskId, maskUnits: 'userSpaceOnUse', x: '0', y: '0', width: svgNumber(boardWidthMm), height: svgNumber(boardLengthMm) }, [
					el('rect', { x: '0', y: '0', width: svgNumber(boardWidthMm), height: svgNumber(boardLengthMm), fill: '#ffffff' }),
					...clear.map((s) => shapeElement(s, look, '#000000'))
				])
			);
			attrs.mask = `url(#${maskId})`;
		}
		return el('g', attrs, dark);
	});
	// edges under the top copper, drawn dashed over it as hidden lines: buried coppers and what is cut out of a ground
	const hidden = artwork.layers
		.filter((l) => l.function.kind === 'copper' && l.function.copperIndex > 1)
		.flatMap((l) => {
			const look: LayerLook = { fill: null, stroke: isGround(l) ? GROUND_HATCH.line : lookOf(l).fill ?? INK, dash: '0.8 0.5', opacity: '1' };
			return l.shapes
				.filter((s) => (isGround(l) ? s.polarity === 'clear' : s.polarity === 'dark'))
				.map((s) => shapeElement({ ...s, id: `hidden-${s.id}` }, look));
		});
	const hiddenEdges = el('g', { id: 'hidden-edges', 'data-layer-title': 'Edges under the top copper (dashed)' }, hidden);
	const substrate = el('rect', { id: 'substrate', x: '0', y: '0', width: svgNumber(boardWidthMm), height: svgNumber(boardLengthMm), fill: SUBSTRATE });
	const drills = el(
		'g',
		{ id: 'drills' },
		artwork.drills.map((d) => el('circle', { id: d.id, cx: toSvgX(d.center[0]), cy: toSvgY(d.center[1]), r: svgNumber(d.diameterMm / 2), fill: '#ffffff', stroke: INK, 'stroke-width': '0.05' }))
	);

	const sheet = buildDrawingSheet(artwork, meta, options);
	const line = (s: DrawingSegment, extra: Record<string, string> = {}) => el('line', { x1: toSvgX(s[0][0]), y1: toSvgY(s[0][1]), x2: toSvgX(s[1][0]), y2: toSvgY(s[1][1]), ...extra });
	const text = (l: DrawingLabel, extra: Record<string, string> = {}) => el('text', { x: toSvgX(l.baseline[0]), y: toSvgY(l.baseline[1]), 'font-size': svgNumber(l.heightMm), ...extra }, [], l.text);
	const dims = el(
		'g',
		{ id: 'dimensions', stroke: INK, 'stroke-width': '0.13', fill: INK, 'font-family': FONT },
		[
			...sheet.dimensions.map((d, i) =>
				el('g', { id: `dimension-${d.id}`, 'data-tier': String(d.tier) }, [
					...d.extensions.map((s) => line(s, { 'stroke-width': '0.08', 'stroke-dasharray': '0.5 0.35' })),
					line(d.line),
					line(sheet.endMarks[2 * i]),
					line(sheet.endMarks[2 * i + 1]),
					text(d.label, { stroke: 'none' })
				])
			),
			el('g', { id: 'datum-a' }, [...sheet.datum.segments.map((s) => line(s)), text(sheet.datum.label, { stroke: 'none' })])
		]
	);
	const tb = sheet.titleBlock;
	const title = el('g', { id: 'title-block', stroke: INK, 'stroke-width': '0.2', fill: INK, 'font-family': FONT }, [
		...tb.rules.map((s) => line(s)),
		...tb.labels.map((l, i) => text(l, { stroke: 'none', ...(i === 0 ? { 'font-weight': 'bold' } : {}) }))
	]);

	const { minXMm, minYMm, maxXMm, maxYMm } = sheet.extent;
	const viewW = maxXMm - minXMm;
	const viewH = maxYMm - minYMm;
	return {
		widthMm: viewW,
		heightMm: viewH,
		viewBox: [minXMm, boardLengthMm - maxYMm, viewW, viewH],
		children: [
			el('title', {}, [], `${meta.designName} — revision ${meta.revisionLabel}`),
			el('defs', {}, defs),
			substrate,
			...layerGroups,
			hiddenEdges,
			drills,
			dims,
			title
		]
	};
}

/** Monospaced, so the layout's text widths hold in any viewer. */
const FONT = 'DejaVu Sans Mono, Noto Sans Mono, monospace';
