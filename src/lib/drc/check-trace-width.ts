// trace-width: the narrowest feed line or transformer section against the profile's minimum trace.
import { LENGTH_EPSILON_MM, distanceMm } from '../geometry';
import type { Artwork, ShapeRole } from '../artwork';
import type { FabProfile } from '../schemas/fab-profile';
import { pieceMidpoint, type BoundaryPiece } from './boundary-piece';
import { isCopperLayer, layerCopper, type CopperShape } from './copper-features';
import type { ShapeIndex } from './copper-index';
import { closestOnPiece } from './piece-distance';
import { isPointInShape } from './point-in-shape';
import { narrowestWidth } from './shape-width';
import { locationOf, midpointOf, roundMm, type Violation } from './violation';

const TRACE_ROLES: readonly ShapeRole[] = ['feed-line', 'transformer'];

/**
 * A piece is a joint, not an etched edge, when its midpoint lies on or in other copper. Only shapes
 * whose box holds the midpoint (within the tolerance) can: the index finds those.
 */
function isJoint(piece: BoundaryPiece, self: number, copper: readonly CopperShape[], index: ShapeIndex): boolean {
	const m = pieceMidpoint(piece);
	return index
		.near(m, LENGTH_EPSILON_MM)
		.some((k) => k !== self && (isPointInShape(m, copper[k].pieces) || copper[k].pieces.some((p) => distanceMm(m, closestOnPiece(m, p)) <= LENGTH_EPSILON_MM)));
}

export function checkTraceWidth(artwork: Artwork, profile: FabProfile): Violation[] {
	const out: Violation[] = [];
	for (const layer of artwork.layers.filter(isCopperLayer)) {
		const { shapes: copper, index } = layerCopper(layer);
		copper.forEach((c, self) => {
			if (!TRACE_ROLES.includes(c.shape.role)) return;
			const g = c.shape.geometry;
			const width =
				g.kind === 'circle'
					? { widthMm: g.diameterMm, from: g.center, to: g.center }
					: (narrowestWidth(c.pieces, (p) => !isJoint(p, self, copper, index)) ?? narrowestWidth(c.pieces));
			if (!width || !(width.widthMm < profile.minTraceWidthMm - LENGTH_EPSILON_MM)) return;
			out.push({
				ruleId: 'trace-width',
				layerId: layer.id,
				shapeIds: [c.shape.id],
				location: locationOf(midpointOf(width.from, width.to)),
				measuredMm: roundMm(width.widthMm),
				requiredMm: profile.minTraceWidthMm,
				message: `${c.shape.id} is ${roundMm(width.widthMm)} mm wide; ${profile.name} needs traces of at least ${profile.minTraceWidthMm} mm`
			});
		});
	}
	return out;
}
