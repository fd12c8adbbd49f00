// Artwork → DXF entities: region contours as closed bulged polylines, round things as CIRCLE, drills on their own layers;
// with the revision's meta also the drawing sheet (dimensions, datum A, title block) as LINE and TEXT on layers of their own.
import { textWidthMm, type Artwork, type DrawingLabel } from '../../artwork';
import { buildDrawingSheet, type DrawingSheetOptions } from '../drawing-sheet';
import type { ExportMeta } from '../export-meta';
import { arcSweepRad, type Contour } from '../../geometry';
import type { DxfCommand, DxfVertex } from './commands';

/** DXF layer name of an artwork layer: our ids in capitals ("COPPER-TOP"). */
export const dxfLayerName = (layerId: string) => layerId.toUpperCase();
export const DXF_PLATED_DRILL_LAYER = 'DRILL-PLATED';
export const DXF_NON_PLATED_DRILL_LAYER = 'DRILL-NON-PLATED';
/** Dimension lines, their texts and datum A. */
export const DXF_DIMENSION_LAYER = 'FF-DIMENSIONS';
/** The title block. */
export const DXF_TITLE_LAYER = 'FF-TITLE';

const COLORS: Record<string, number> = { 'copper-top': 1, 'copper-bottom': 5, profile: 7, 'mask-top': 3, 'mask-bottom': 4, 'copper-inner-1': 6 };

/** A contour of two arcs about one centre, each half a turn, is a whole circle. */
function asCircle(c: Contour): { center: readonly [number, number]; radiusMm: number } | null {
	const [a, b] = c.segments;
	if (c.segments.length !== 2 || a.kind !== 'arc' || b.kind !== 'arc') return null;
	if (a.center[0] !== b.center[0] || a.center[1] !== b.center[1] || a.clockwise !== b.clockwise) return null;
	return { center: a.center, radiusMm: Math.hypot(c.start[0] - a.center[0], c.start[1] - a.center[1]) };
}

function vertices(c: Contour): DxfVertex[] {
	const out: DxfVertex[] = [];
	let from = c.start;
	for (const s of c.segments) {
		out.push({ at: from, bulge: s.kind === 'arc' ? Math.tan(arcSweepRad(from, s.to, s.center, s.clockwise) / 4) : 0 });
		from = s.to;
	}
	return out;
}

export function buildDxfCommands(artwork: Artwork, meta?: ExportMeta, options: DrawingSheetOptions = {}): DxfCommand[] {
	const out: DxfCommand[] = [];
	for (const layer of artwork.layers) out.push({ type: 'layer', name: dxfLayerName(layer.id), colorIndex: COLORS[layer.id] ?? 8 });
	const plated = artwork.drills.filter((d) => d.plated);
	const nonPlated = artwork.drills.filter((d) => !d.plated);
	if (plated.length) out.push({ type: 'layer', name: DXF_PLATED_DRILL_LAYER, colorIndex: 6 });
	if (nonPlated.length) out.push({ type: 'layer', name: DXF_NON_PLATED_DRILL_LAYER, colorIndex: 2 });
	for (const layer of artwork.layers) {
		const name = dxfLayerName(layer.id);
		for (const shape of layer.shapes) {
			const g = shape.geometry;
			if (g.kind === 'circle') {
				out.push({ type: 'circle', layer: name, center: g.center, radiusMm: g.diameterMm / 2 });
				continue;
			}
			if (g.kind === 'stroke') {
				// a legend stroke: its centre line, open (DXF draws no pen width)
				out.push({ type: 'polyline', layer: name, vertices: g.points.map((at) => ({ at, bulge: 0 })), closed: false });
				continue;
			}
			const contours = g.kind === 'region' ? [g.region.outer, ...g.region.holes] : [g.contour];
			for (const c of contours) {
				const circle = asCircle(c);
				if (circle) out.push({ type: 'circle', layer: name, center: circle.center, radiusMm: circle.radiusMm });
				else out.push({ type: 'polyline', layer: name, vertices: vertices(c), closed: true });
			}
		}
	}
	for (const d of [...plated, ...nonPlated]) {
		out.push({ type: 'circle', layer: d.plated ? DXF_PLATED_DRILL_LAYER : DXF_NON_PLATED_DRILL_LAYER, center: d.center, radiusMm: d.diameterMm / 2 });
	}
	if (meta) for (const c of sheetCommands(artwork, meta, options)) out.push(c);
	return out;
}

/**
 * DXF text height per unit of the sheet's font size. CAD fonts take the height as the capital height and advance
 * about one height per character (from memory, for the common single-stroke fonts), so 0.6 keeps a label within
 * the 0.64 em per character the layout reserved, and near the SVG's capital height (≈ 0.73 em).
 */
export const DXF_TEXT_HEIGHT_PER_EM = 0.6;

/** The sheet the SVG draws too, as lines and texts: the board layers above keep their geometry. */
function sheetCommands(artwork: Artwork, meta: ExportMeta, options: DrawingSheetOptions): DxfCommand[] {
	const sheet = buildDrawingSheet(artwork, meta, options);
	const dim = DXF_DIMENSION_LAYER;
	const text = (layer: string, l: DrawingLabel): DxfCommand => ({ type: 'text', layer, at: l.baseline, heightMm: l.heightMm * DXF_TEXT_HEIGHT_PER_EM, widthMm: textWidthMm(l.text, l.heightMm), value: l.text });
	const out: DxfCommand[] = [
		{ type: 'layer', name: dim, colorIndex: 250 },
		{ type: 'layer', name: DXF_TITLE_LAYER, colorIndex: 251 }
	];
	sheet.dimensions.forEach((d, i) => {
		for (const [from, to] of [...d.extensions, d.line, sheet.endMarks[2 * i], sheet.endMarks[2 * i + 1]]) out.push({ type: 'line', layer: dim, from, to });
		out.push(text(dim, d.label));
	});
	for (const [from, to] of sheet.datum.segments) out.push({ type: 'line', layer: dim, from, to });
	out.push(text(dim, sheet.datum.label));
	for (const [from, to] of sheet.titleBlock.rules) out.push({ type: 'line', layer: DXF_TITLE_LAYER, from, to });
	for (const l of sheet.titleBlock.labels) out.push(text(DXF_TITLE_LAYER, l));
	return out;
}
