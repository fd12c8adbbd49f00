// trace-width: the narrowest feed line or transformer section against the profile's minimum trace.
import { LENGTH_EPSILON_MM, distanceMm } from '../geometry';
import type { Artwork, ShapeRole } from '../artwork';
import type { FabProfile } from '../schemas/fab-profile';
import { pieceMidpoint, type BoundaryPiece } from './boundary-piece';
import { copperFeatures, isCopperLayer, type CopperShape } from './copper-features';
import { closestOnPiece } from './piece-distance';
import { isPointInShape } from './point-in-shape';
import { narrowestWidth } from './shape-width';
import { locationOf, midpointOf, roundMm, type Violation } from './violation';

const TRACE_ROLES: readonly ShapeRole[] = ['feed-line', 'transformer'];

/** A piece is a joint, not an etched edge, when its midpoint lies on or in other copper. */
function isJoint(piece: BoundaryPiece, others: readonly CopperShape[]): boolean {
	const m = pieceMidpoint(piece);
	return others.some((o) => isPointInShape(m, o.pieces) || o.pieces.some((p) => distanceMm(m, closestOnPiece(m, p)) <= LENGTH_EPSILON_MM));
}

export function checkTraceWidth(artwork: Artwork, profile: FabProfile): Violation[] {
	const out: Violation[] = [];
	for (const layer of artwork.layers.filter(isCopperLayer)) {
		const copper = copperFeatures(layer);
		for (const c of copper) {
			if (!TRACE_ROLES.includes(c.shape.role)) continue;
			const g = c.shape.geometry;
			const others = copper.filter((o) => o !== c);
			const width =
				g.kind === 'circle'
					? { widthMm: g.diameterMm, from: g.center, to: g.center }
					: (narrowestWidth(c.pieces, (p) => !isJoint(p, others)) ?? narrowestWidth(c.pieces));
			if (!width || !(width.widthMm < profile.minTraceWidthMm - LENGTH_EPSILON_MM)) continue;
			out.push({
				ruleId: 'trace-width',
				layerId: layer.id,
				shapeIds: [c.shape.id],
				location: locationOf(midpointOf(width.from, width.to)),
				measuredMm: roundMm(width.widthMm),
				requiredMm: profile.minTraceWidthMm,
				message: `${c.shape.id} is ${roundMm(width.widthMm)} mm wide; ${profile.name} needs traces of at least ${profile.minTraceWidthMm} mm`
			});
		}
	}
	return out;
}
