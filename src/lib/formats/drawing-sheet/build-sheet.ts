// The drawing sheet shared by the SVG and DXF writers: dimensions in tiers, datum A, the title block, the sheet's extent.
import { boxesOverlap, decimalsForResolution, DRAWING_TEXT_METRICS, formatLengthMm, labelAt, layoutDimensions, PROBE_DATUM, textWidthMm, type Artwork, type DrawingLabel, type DrawingSegment, type PlacedDimension } from '../../artwork';
import { maxOf, minOf, type Bounds } from '../../geometry';
import type { FabProfile } from '../../schemas/fab-profile';
import type { ExportMeta } from '../export-meta';

/** Text heights of the sheet, mm: 2.5 and 3.5 are standard lettering heights (ISO 3098-0, from memory). */
export const SHEET_TEXT_MM = { dimension: 2.5, title: 3.5, note: 2.5 } as const;
/** Paper kept around everything drawn, mm. */
export const SHEET_MARGIN_MM = 3;
/** Resolution of printed sizes when no fab profile is known, mm. */
export const DEFAULT_DRAWING_RESOLUTION_MM = 0.01;
/** The caution every drawing carries. */
export const FIRST_PASS_CAUTION = 'First-pass estimate — verify by simulation and measurement';

export interface DrawingSheetOptions {
	/** Smallest step printed sizes are stated to, mm (see drawingResolutionMm). */
	readonly resolutionMm?: number;
	/** The ordered laminate's name, when the design names one. */
	readonly laminateName?: string;
}

export interface DrawingSheet {
	/** Decimals of every printed size. */
	readonly decimals: number;
	readonly resolutionMm: number;
	readonly dimensions: readonly PlacedDimension[];
	/** End marks of the dimension lines: short oblique strokes. */
	readonly endMarks: readonly DrawingSegment[];
	/** Datum A: its frame and the leader to the board corner, and its letter. */
	readonly datum: { readonly segments: readonly DrawingSegment[]; readonly label: DrawingLabel };
	readonly titleBlock: { readonly frame: Bounds; readonly rules: readonly DrawingSegment[]; readonly labels: readonly DrawingLabel[] };
	/** Everything drawn plus the margin: the SVG viewBox, the DXF extents. */
	readonly extent: Bounds;
}

/**
 * The step sizes are printed to: the decimal place of the finest tolerance the fab profile states (its etch
 * and drill tolerances; ±0.05 mm → 0.01 mm, ±0.005 mm → 0.001 mm), between 0.001 and 0.1 mm. A drawing
 * that prints finer than the house builds claims a precision nobody holds. Without a profile: 0.01 mm.
 */
export function drawingResolutionMm(profile: FabProfile | undefined): number {
	if (!profile) return DEFAULT_DRAWING_RESOLUTION_MM;
	const tolerances = [profile.etchToleranceMm, profile.platedDrillToleranceMm, profile.nonPlatedDrillToleranceMm].filter((t) => t > 0);
	if (!tolerances.length) return DEFAULT_DRAWING_RESOLUTION_MM;
	const finest = minOf(tolerances);
	const step = 10 ** Math.floor(Math.log10(finest) - 1e-9);
	return Math.min(0.1, Math.max(0.001, step));
}

const trim = (v: number, decimals: number) => String(Number(v.toFixed(decimals)));
const union = (a: Bounds, b: Bounds): Bounds => ({ minXMm: Math.min(a.minXMm, b.minXMm), minYMm: Math.min(a.minYMm, b.minYMm), maxXMm: Math.max(a.maxXMm, b.maxXMm), maxYMm: Math.max(a.maxYMm, b.maxYMm) });
const boxSegments = (b: Bounds): DrawingSegment[] => [
	[[b.minXMm, b.minYMm], [b.maxXMm, b.minYMm]],
	[[b.maxXMm, b.minYMm], [b.maxXMm, b.maxYMm]],
	[[b.maxXMm, b.maxYMm], [b.minXMm, b.maxYMm]],
	[[b.minXMm, b.maxYMm], [b.minXMm, b.minYMm]]
];

/** The laminate line: name when known, then εr and h of each dielectric from the top, and the copper weight. */
function laminateText(artwork: Artwork, decimals: number, laminateName: string | undefined): string {
	const dielectrics = artwork.stack.flatMap((s) => (s.kind === 'dielectric' ? [s] : []));
	const copper = artwork.stack.find((s) => s.kind === 'copper');
	const layers = dielectrics.map((d) => `εr ${d.relativePermittivity}, tanδ ${d.lossTangent}, h ${formatLengthMm(d.thicknessMm, decimals)} mm${d.bonding ? ' (bond)' : ''}`).join(' + ');
	const name = laminateName ? `${laminateName}, ` : '';
	return `Laminate: ${name}${layers}${copper ? `, copper ${trim(copper.thicknessMm * 1000, 1)} µm` : ''}`;
}

export function buildDrawingSheet(artwork: Artwork, meta: ExportMeta, options: DrawingSheetOptions = {}): DrawingSheet {
	const resolutionMm = options.resolutionMm ?? DEFAULT_DRAWING_RESOLUTION_MM;
	const decimals = decimalsForResolution(resolutionMm);
	const th = SHEET_TEXT_MM.dimension;
	const layout = layoutDimensions(artwork.board, artwork.dimensions, { textHeightMm: th, decimals });

	const tick = 0.5 * th * 0.5;
	const endMarks: DrawingSegment[] = layout.dimensions.flatMap((d) => d.ends.map((p): DrawingSegment => [[p[0] - tick, p[1] - tick], [p[0] + tick, p[1] + tick]]));

	// datum A: its letter framed in the corner below and left of the board (no dimension label reaches there), a leader to the corner
	const boxH = DRAWING_TEXT_METRICS.boxEm * th;
	// (a board narrower than a label below it lets that label pass its left edge: the letter moves further left)
	const belowLeft = minOf([0, ...layout.dimensions.filter((d) => d.label.box.maxYMm < 0).map((d) => d.label.box.minXMm)]);
	const letter = labelAt(PROBE_DATUM.name, belowLeft - 1.2 * th - textWidthMm(PROBE_DATUM.name, th), -1.2 * th - boxH, th);
	const pad = 0.2 * th;
	const frame: Bounds = { minXMm: letter.box.minXMm - pad, minYMm: letter.box.minYMm - pad, maxXMm: letter.box.maxXMm + pad, maxYMm: letter.box.maxYMm + pad };
	const datum = { segments: [...boxSegments(frame), [[frame.maxXMm, frame.maxYMm], PROBE_DATUM.at] as DrawingSegment], label: letter };

	let drawn = union(layout.bounds, frame);

	// title block under everything, from the sheet's left edge
	const m = artwork.metadata;
	const probe = layout.dimensions.some((d) => d.id === 'probe-x');
	const rows: { text: string; height: number }[] = [
		{ text: meta.designName, height: SHEET_TEXT_MM.title },
		{ text: `Revision ${meta.revisionLabel} · ${meta.revisionDate}`, height: SHEET_TEXT_MM.note },
		{ text: `Units mm · scale 1:1 · sizes to ${formatLengthMm(resolutionMm, decimals)} mm`, height: SHEET_TEXT_MM.note },
		{ text: laminateText(artwork, decimals, options.laminateName), height: SHEET_TEXT_MM.note },
		{ text: `${m.shape} patch, ${m.feedKind} feed, ${trim(m.frequencyHz / 1e9, 4)} GHz, ${m.copperLayerCount} coppers`, height: SHEET_TEXT_MM.note },
		{ text: `Datum ${PROBE_DATUM.name}: ${PROBE_DATUM.description}${probe ? '; xp, yp: probe centre from A' : ''}`, height: SHEET_TEXT_MM.note },
		{ text: FIRST_PASS_CAUTION, height: SHEET_TEXT_MM.note }
	];
	const inner = 0.6 * th;
	const rowGap = 0.45 * th;
	const width = maxOf(rows.map((r) => textWidthMm(r.text, r.height))) + 2 * inner;
	const top = drawn.minYMm - 2 * th;
	const left = drawn.minXMm;
	const labels: DrawingLabel[] = [];
	const rules: DrawingSegment[] = [];
	let y = top - inner;
	rows.forEach((r, i) => {
		const h = DRAWING_TEXT_METRICS.boxEm * r.height;
		y -= h;
		labels.push(labelAt(r.text, left + inner, y, r.height));
		y -= rowGap;
		// a rule under the name and above the caution
		if (i === 0 || i === rows.length - 2) rules.push([[left, y + rowGap / 2], [left + width, y + rowGap / 2]]);
	});
	const tbFrame: Bounds = { minXMm: left, minYMm: y - inner + rowGap, maxXMm: left + width, maxYMm: top };
	drawn = union(drawn, tbFrame);

	const extent: Bounds = { minXMm: drawn.minXMm - SHEET_MARGIN_MM, minYMm: drawn.minYMm - SHEET_MARGIN_MM, maxXMm: drawn.maxXMm + SHEET_MARGIN_MM, maxYMm: drawn.maxYMm + SHEET_MARGIN_MM };
	return { decimals, resolutionMm, dimensions: layout.dimensions, endMarks, datum, titleBlock: { frame: tbFrame, rules: [...boxSegments(tbFrame), ...rules], labels }, extent };
}

/** Every label of a sheet (dimensions, datum, title block): what must not overlap and must stay on the sheet. */
export function sheetLabels(sheet: DrawingSheet): DrawingLabel[] {
	return [...sheet.dimensions.map((d) => d.label), sheet.datum.label, ...sheet.titleBlock.labels];
}

/** Pairs of labels whose boxes overlap (empty for a good sheet). */
export function overlappingLabels(sheet: DrawingSheet): [string, string][] {
	const all = sheetLabels(sheet);
	const out: [string, string][] = [];
	for (let i = 0; i < all.length; i++) for (let j = i + 1; j < all.length; j++) if (boxesOverlap(all[i].box, all[j].box)) out.push([all[i].text, all[j].text]);
	return out;
}
