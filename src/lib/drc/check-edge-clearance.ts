// edge-clearance: copper kept back from the routed board outline, the rectangle (0, 0)–(width, length).
import { LENGTH_EPSILON_MM, type Point } from '../geometry';
import type { Artwork, ShapeRole } from '../artwork';
import type { FabProfile } from '../schemas/fab-profile';
import { boundaryPieces, type BoundaryPiece } from './boundary-piece';
import { isCopperLayer } from './copper-features';
import { isAngleOnArc } from './piece-distance';
import { locationOf, roundMm, type Violation } from './violation';

/**
 * Roles whose copper may run exactly flush to the board edge on purpose:
 * - the feed line, where it launches into an edge-mount connector at y = 0;
 * - an edge launch's signal and top ground pads, which meet the connector at the same edge;
 * - the ground plane that is the whole board: the antenna's ground size is an RF parameter and the
 *   board is cut to it, so the plane is flush on every side by design.
 * A fab expects copper pulled back by copperToEdgeMm; copper flush to the edge is accepted as a
 * deliberate "copper to edge" feature that the fab notes must call out (common practice, no source).
 * Copper of these roles pulled back by less than the profile (neither flush nor clear) is a
 * violation, and every other role must always keep the full clearance. If the artwork pulls the
 * ground back per profile, it simply passes; to forbid flush copper, empty this list.
 */
export const FLUSH_TO_EDGE_ROLES: readonly ShapeRole[] = ['feed-line', 'ground', 'launch-signal', 'launch-ground'];

type Side = 'left' | 'bottom' | 'right' | 'top';

/** The boundary points where a piece comes closest to each side: its ends and an arc's axis extremes. */
function extremePoints(piece: BoundaryPiece): Point[] {
	const pts: Point[] = [piece.from, piece.to];
	if (piece.kind === 'arc') {
		for (let k = 0; k < 4; k++) {
			const angle = (k * Math.PI) / 2;
			if (isAngleOnArc(piece, angle)) pts.push([piece.center[0] + piece.radiusMm * Math.cos(angle), piece.center[1] + piece.radiusMm * Math.sin(angle)]);
		}
	}
	return pts;
}

export function checkEdgeClearance(artwork: Artwork, profile: FabProfile): Violation[] {
	const { widthMm: w, lengthMm: l } = artwork.board;
	const out: Violation[] = [];
	for (const layer of artwork.layers.filter(isCopperLayer)) {
		for (const shape of layer.shapes) {
			if (shape.polarity !== 'dark') continue;
			const points = boundaryPieces(shape).flatMap(extremePoints);
			if (points.length === 0) continue;
			const nearest = new Map<Side, { d: number; at: Point }>();
			for (const p of points) {
				const dists: [Side, number][] = [['left', p[0]], ['bottom', p[1]], ['right', w - p[0]], ['top', l - p[1]]];
				for (const [side, d] of dists) {
					const cur = nearest.get(side);
					if (!cur || d < cur.d) nearest.set(side, { d, at: p });
				}
			}
			let worst: { side: Side; d: number; at: Point } | null = null;
			for (const [side, { d, at }] of nearest) {
				const flush = Math.abs(d) <= LENGTH_EPSILON_MM;
				if (flush && FLUSH_TO_EDGE_ROLES.includes(shape.role)) continue;
				if (!worst || d < worst.d) worst = { side, d, at };
			}
			if (!worst || !(worst.d < profile.copperToEdgeMm - LENGTH_EPSILON_MM)) continue;
			const where = worst.d < -LENGTH_EPSILON_MM ? `runs ${roundMm(-worst.d)} mm past` : `is ${roundMm(worst.d)} mm from`;
			out.push({
				ruleId: 'edge-clearance',
				layerId: layer.id,
				shapeIds: [shape.id],
				location: locationOf(worst.at),
				measuredMm: roundMm(worst.d),
				requiredMm: profile.copperToEdgeMm,
				message: `${shape.id} ${where} the ${worst.side} board edge; ${profile.name} keeps copper ${profile.copperToEdgeMm} mm from the edge`
			});
		}
	}
	return out;
}
