// legend-width, legend-edge and legend-clearance: the legend's ink against the profile's least line, the board edge and the mask openings.
import { LENGTH_EPSILON_MM, minOf, type Point } from '../geometry';
import type { Artwork, ArtworkLayer, ArtworkShape } from '../artwork';
import { legendRulesOf, type FabProfile } from '../schemas/fab-profile';
import { boundaryPieces, type BoundaryPiece } from './boundary-piece';
import { isPointInShape } from './point-in-shape';
import { boundaryDistance } from './shape-distance';
import { locationOf, roundMm, type Violation } from './violation';

/** A piece of ink: its centre line as line pieces, the pen's half width (0 for a reserved box, whose edge is the ink's). */
interface Ink {
	shape: ArtworkShape;
	pieces: BoundaryPiece[];
	points: Point[];
	halfWidthMm: number;
}

const linePieces = (points: readonly Point[]): BoundaryPiece[] =>
	points.slice(1).map((to, i) => ({ kind: 'line', from: points[i], to, fillSide: 1, contourIndex: 0, index: i, contourLength: points.length - 1 }));

/** A legend layer's ink: its strokes, and the reserved revision box (checked as if inked to its edges). */
function inkOf(layer: ArtworkLayer): Ink[] {
	return [...layer.shapes, ...layer.voids].flatMap((shape): Ink[] => {
		const g = shape.geometry;
		if (g.kind === 'stroke') return [{ shape, pieces: linePieces(g.points), points: [...g.points], halfWidthMm: g.strokeWidthMm / 2 }];
		if (g.kind === 'region') {
			const pieces = boundaryPieces(shape);
			return [{ shape, pieces, points: pieces.map((p) => p.from), halfWidthMm: 0 }];
		}
		return [];
	});
}

const legendLayers = (artwork: Artwork) => artwork.layers.filter((l) => l.function.kind === 'legend');

/** legend-width: the narrowest pen of each legend layer against the profile's least legend line. */
export function checkLegendWidth(artwork: Artwork, profile: FabProfile): Violation[] {
	const { minLegendWidthMm } = legendRulesOf(profile);
	const out: Violation[] = [];
	for (const layer of legendLayers(artwork)) {
		const thin = layer.shapes.filter((s) => s.geometry.kind === 'stroke' && s.geometry.strokeWidthMm < minLegendWidthMm - LENGTH_EPSILON_MM);
		if (thin.length === 0) continue;
		const widths = thin.map((s) => (s.geometry.kind === 'stroke' ? s.geometry.strokeWidthMm : Infinity));
		const w = minOf(widths);
		const first = thin[widths.indexOf(w)];
		const at = first.geometry.kind === 'stroke' ? first.geometry.points[0] : ([0, 0] as Point);
		out.push({
			ruleId: 'legend-width',
			layerId: layer.id,
			shapeIds: thin.map((s) => s.id),
			location: locationOf(at),
			measuredMm: roundMm(w),
			requiredMm: minLegendWidthMm,
			message: `${thin.length} legend line${thin.length === 1 ? ' is' : 's are'} ${roundMm(w)} mm wide; ${profile.name} prints legend lines no narrower than ${minLegendWidthMm} mm`
		});
	}
	return out;
}

/** legend-edge: the legend ink nearest the board outline, per legend layer. */
export function checkLegendEdge(artwork: Artwork, profile: FabProfile): Violation[] {
	const { legendToEdgeMm } = legendRulesOf(profile);
	const { widthMm: w, lengthMm: l } = artwork.board;
	const out: Violation[] = [];
	for (const layer of legendLayers(artwork)) {
		let worst: { ink: Ink; at: Point; gapMm: number } | null = null;
		for (const ink of inkOf(layer)) {
			for (const p of ink.points) {
				const gapMm = Math.min(p[0], p[1], w - p[0], l - p[1]) - ink.halfWidthMm;
				if (!worst || gapMm < worst.gapMm) worst = { ink, at: p, gapMm };
			}
		}
		if (!worst || !(worst.gapMm < legendToEdgeMm - LENGTH_EPSILON_MM)) continue;
		const gap = Math.max(0, worst.gapMm);
		out.push({
			ruleId: 'legend-edge',
			layerId: layer.id,
			shapeIds: [worst.ink.shape.id],
			location: locationOf(worst.at),
			measuredMm: roundMm(gap),
			requiredMm: legendToEdgeMm,
			message: `${worst.ink.shape.id} is ${roundMm(gap)} mm from the board edge; ${profile.name} keeps legend ink at least ${legendToEdgeMm} mm inside it`
		});
	}
	return out;
}

/**
 * legend-clearance: ink against every opening in the mask on its side (bare copper, where ink smears or is
 * clipped); a side without a mask layer is bare everywhere its copper is, so its copper counts as openings.
 */
export function checkLegendClearance(artwork: Artwork, profile: FabProfile): Violation[] {
	const { legendToOpeningMm } = legendRulesOf(profile);
	const out: Violation[] = [];
	for (const layer of legendLayers(artwork)) {
		const side = layer.function.kind === 'legend' ? layer.function.side : 'top';
		const mask = artwork.layers.find((l) => l.function.kind === 'solder-mask' && l.function.side === side);
		const copper = artwork.layers.find((l) => l.function.kind === 'copper' && l.function.side === side);
		const openings = (mask ?? copper)?.shapes.filter((s) => s.polarity === 'dark') ?? [];
		const inks = inkOf(layer);
		for (const opening of openings) {
			const pieces = boundaryPieces(opening);
			if (pieces.length === 0) continue;
			let worst: { ink: Ink; gapMm: number; at: Point } | null = null;
			for (const ink of inks) {
				// ink over the opening, or (a reserved box) an opening wholly inside the ink
				const inside = ink.points.find((p) => isPointInShape(p, pieces)) ?? (ink.halfWidthMm === 0 && isPointInShape(pieces[0].from, ink.pieces) ? pieces[0].from : undefined);
				const pair = inside ? null : boundaryDistance(ink.pieces, pieces);
				const gapMm = inside ? -ink.halfWidthMm : pair ? pair.distanceMm - ink.halfWidthMm : Infinity;
				const at = inside ?? pair?.onA ?? ink.points[0];
				if (!worst || gapMm < worst.gapMm) worst = { ink, gapMm, at };
			}
			if (!worst || !(worst.gapMm < legendToOpeningMm - LENGTH_EPSILON_MM)) continue;
			const gap = Math.max(0, worst.gapMm);
			out.push({
				ruleId: 'legend-clearance',
				layerId: layer.id,
				shapeIds: [worst.ink.shape.id, opening.id],
				location: locationOf(worst.at),
				measuredMm: roundMm(gap),
				requiredMm: legendToOpeningMm,
				message: `${worst.ink.shape.id} is ${roundMm(gap)} mm from ${opening.id} (${mask ? 'a mask opening' : 'bare copper: no mask on this side'}); ${profile.name} keeps legend ink at least ${legendToOpeningMm} mm from it`
			});
		}
	}
	return out;
}
