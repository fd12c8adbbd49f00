// Artwork → SVG element tree: layers as groups (y flipped once: svgY = boardLength − y), dimensions, title block.
import type { Artwork, ArtworkDimension, ArtworkShape } from '../../artwork';
import { replaceControlCharacters } from '../../schemas/plain-text';
import { arcSweepRad, type Contour, type Point } from '../../geometry';
import type { ExportMeta } from '../export-meta';
import type { SvgDocument, SvgElement } from './commands';

/** Space around the board for dimension lines (left, right, top) and the title block (bottom), mm. */
export const SVG_MARGINS_MM = { left: 16, right: 14, top: 12, bottom: 40 } as const;

const STYLE: Record<string, { fill: string; opacity: string }> = {
	'copper-top': { fill: '#b87333', opacity: '1' },
	'copper-bottom': { fill: '#5a7fa8', opacity: '0.35' },
	'copper-inner-1': { fill: '#8a5a9e', opacity: '0.55' },
	'mask-top': { fill: '#2e8b57', opacity: '0.3' },
	'mask-bottom': { fill: '#2e8b57', opacity: '0.3' },
	'legend-top': { fill: '#4a4a4a', opacity: '1' }
};

/** Fixed number format: 4 decimals (0.1 µm), no trailing zeros, no "-0". */
export function svgNumber(v: number): string {
	const n = Math.round(v * 1e4) / 1e4;
	return String(n === 0 ? 0 : n);
}

/** Text content never holds a control character: most are not allowed in XML 1.0 at all (§2.2 Characters). */
const el = (name: SvgElement['name'], attributes: Record<string, string>, children: SvgElement[] = [], text?: string): SvgElement =>
	text === undefined ? { name, attributes, children } : { name, attributes, children, text: replaceControlCharacters(text) };

export function buildSvgTree(artwork: Artwork, meta: ExportMeta): SvgDocument {
	const boardLengthMm = artwork.board.lengthMm;
	const boardWidthMm = artwork.board.widthMm;
	const toSvgX = (x: number) => svgNumber(x);
	const toSvgY = (y: number) => svgNumber(boardLengthMm - y);
	const toSvgPoint = (p: Point) => `${toSvgX(p[0])} ${toSvgY(p[1])}`;

	const strokePathOf = (points: readonly Point[]): string => points.map((p, i) => `${i === 0 ? 'M' : 'L'}${toSvgPoint(p)}`).join('');
	const pathOf = (c: Contour): string => {
		let d = `M${toSvgPoint(c.start)}`;
		let from = c.start;
		for (const s of c.segments) {
			if (s.kind === 'line') d += `L${toSvgPoint(s.to)}`;
			else {
				const r = Math.hypot(from[0] - s.center[0], from[1] - s.center[1]);
				const large = Math.abs(arcSweepRad(from, s.to, s.center, s.clockwise)) > Math.PI ? 1 : 0;
				// flipping y turns counter-clockwise into SVG's positive-angle (sweep-flag 0) direction
				d += `A${svgNumber(r)} ${svgNumber(r)} 0 ${large} ${s.clockwise ? 1 : 0} ${toSvgPoint(s.to)}`;
			}
			from = s.to;
		}
		return d + 'Z';
	};
	const shapeElement = (s: ArtworkShape, fill: string): SvgElement => {
		const g = s.geometry;
		if (g.kind === 'circle') return el('circle', { id: s.id, cx: toSvgX(g.center[0]), cy: toSvgY(g.center[1]), r: svgNumber(g.diameterMm / 2), fill });
		if (g.kind === 'stroke') return el('path', { id: s.id, d: strokePathOf(g.points), fill: 'none', stroke: fill, 'stroke-width': svgNumber(g.strokeWidthMm), 'stroke-linecap': 'round', 'stroke-linejoin': 'round' });
		if (g.kind === 'outline') return el('path', { id: s.id, d: pathOf(g.contour), fill: 'none', stroke: '#000000', 'stroke-width': svgNumber(g.strokeWidthMm) });
		return el('path', { id: s.id, d: [g.region.outer, ...g.region.holes].map(pathOf).join(''), fill, 'fill-rule': 'evenodd' });
	};

	const defs: SvgElement[] = [];
	const layerGroups: SvgElement[] = artwork.layers.map((layer) => {
		const style = STYLE[layer.id] ?? { fill: '#000000', opacity: '1' };
		const dark = layer.shapes.filter((s) => s.polarity === 'dark').map((s) => shapeElement(s, style.fill));
		const clear = layer.shapes.filter((s) => s.polarity === 'clear');
		const attrs: Record<string, string> = { id: `layer-${layer.id}`, 'data-layer-title': layer.title, opacity: style.opacity };
		if (clear.length) {
			const maskId = `clear-${layer.id}`;
			defs.push(
				el('mask', { id: maskId, maskUnits: 'userSpaceOnUse', x: '0', y: '0', width: svgNumber(boardWidthMm), height: svgNumber(boardLengthMm) }, [
					el('rect', { x: '0', y: '0', width: svgNumber(boardWidthMm), height: svgNumber(boardLengthMm), fill: '#ffffff' }),
					...clear.map((s) => shapeElement(s, '#000000'))
				])
			);
			attrs.mask = `url(#${maskId})`;
		}
		return el('g', attrs, dark);
	});
	const drills = el(
		'g',
		{ id: 'drills' },
		artwork.drills.map((d) => el('circle', { id: d.id, cx: toSvgX(d.center[0]), cy: toSvgY(d.center[1]), r: svgNumber(d.diameterMm / 2), fill: '#ffffff', stroke: '#000000', 'stroke-width': '0.05' }))
	);

	const dims = el('g', { id: 'dimensions', stroke: '#202020', 'stroke-width': '0.1', fill: 'none', 'font-family': 'sans-serif' }, artwork.dimensions.map((d) => dimension(d, toSvgX, toSvgY)));

	const { designName, revisionLabel, revisionDate } = meta;
	const dielectric = artwork.stack.find((s) => s.kind === 'dielectric');
	const copper = artwork.stack.find((s) => s.kind === 'copper');
	const laminate = dielectric && dielectric.kind === 'dielectric'
		? `εr ${dielectric.relativePermittivity}, tanδ ${dielectric.lossTangent}, h ${svgNumber(dielectric.thicknessMm)} mm, copper ${svgNumber((copper?.thicknessMm ?? 0) * 1000)} µm`
		: '';
	const tbY = boardLengthMm + 14;
	const tbW = Math.max(boardWidthMm, 90);
	const title = el('g', { id: 'title-block', 'font-family': 'sans-serif', fill: '#000000' }, [
		el('rect', { x: '0', y: svgNumber(tbY), width: svgNumber(tbW), height: '22', fill: 'none', stroke: '#000000', 'stroke-width': '0.2' }),
		el('text', { x: '2', y: svgNumber(tbY + 5.5), 'font-size': '4' }, [], designName),
		el('text', { x: '2', y: svgNumber(tbY + 11), 'font-size': '3' }, [], `Revision ${revisionLabel} · ${revisionDate}`),
		el('text', { x: '2', y: svgNumber(tbY + 16), 'font-size': '2.6' }, [], `Laminate: ${laminate}`),
		el('text', { x: '2', y: svgNumber(tbY + 20.5), 'font-size': '2.6' }, [], `${artwork.metadata.shape} patch, ${artwork.metadata.feedKind} feed, ${svgNumber(artwork.metadata.frequencyHz / 1e9)} GHz · all sizes in mm`)
	]);

	const m = SVG_MARGINS_MM;
	const viewW = Math.max(boardWidthMm, tbW) + m.left + m.right;
	const viewH = boardLengthMm + m.top + m.bottom;
	return {
		widthMm: viewW,
		heightMm: viewH,
		viewBox: [-m.left, -m.top, viewW, viewH],
		children: [
			el('title', {}, [], `${designName} — revision ${revisionLabel}`),
			el('defs', {}, defs),
			...layerGroups,
			drills,
			dims,
			title
		]
	};
}

/** A dimension line offset 6 mm to one side of the span, with extension lines, end ticks and its label. */
function dimension(d: ArtworkDimension, toSvgX: (x: number) => string, toSvgY: (y: number) => string): SvgElement {
	const off = 6;
	const horizontal = d.side === 'above' || d.side === 'below';
	const sign = d.side === 'above' || d.side === 'right' ? 1 : -1;
	const a: Point = horizontal ? [d.from[0], d.from[1] + sign * off] : [d.from[0] + sign * off, d.from[1]];
	const b: Point = horizontal ? [d.to[0], d.from[1] + sign * off] : [d.from[0] + sign * off, d.to[1]];
	const mid: Point = [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];
	const label = `${d.label} ${svgNumber(d.valueMm)}`;
	const tick = (p: Point) =>
		horizontal
			? el('line', { x1: toSvgX(p[0]), y1: toSvgY(p[1] - 1), x2: toSvgX(p[0]), y2: toSvgY(p[1] + 1) })
			: el('line', { x1: toSvgX(p[0] - 1), y1: toSvgY(p[1]), x2: toSvgX(p[0] + 1), y2: toSvgY(p[1]) });
	const textAttrs: Record<string, string> = horizontal
		? { x: toSvgX(mid[0]), y: toSvgY(mid[1] + sign * 1.2 + (sign < 0 ? -1.5 : 0)), 'text-anchor': 'middle' }
		: { x: toSvgX(mid[0] + sign * 1.2), y: toSvgY(mid[1]), 'text-anchor': sign > 0 ? 'start' : 'end' };
	return el('g', { id: `dimension-${d.id}` }, [
		el('line', { x1: toSvgX(d.from[0]), y1: toSvgY(d.from[1]), x2: toSvgX(a[0]), y2: toSvgY(a[1]), 'stroke-dasharray': '0.5 0.5' }),
		el('line', { x1: toSvgX(d.to[0]), y1: toSvgY(d.to[1]), x2: toSvgX(b[0]), y2: toSvgY(b[1]), 'stroke-dasharray': '0.5 0.5' }),
		el('line', { x1: toSvgX(a[0]), y1: toSvgY(a[1]), x2: toSvgX(b[0]), y2: toSvgY(b[1]) }),
		tick(a),
		tick(b),
		el('text', { ...textAttrs, 'font-size': '2.5', fill: '#202020', stroke: 'none' }, [], label)
	]);
}
