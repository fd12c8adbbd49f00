// hole-keep-out: each mounting hole's wall against the patch (the near-field keep-out) and against other copper on the coppers it passes.
import { LENGTH_EPSILON_MM, createCircleContour } from '../geometry';
import { mountingHoleKeepOutMm, type Artwork, type ArtworkShape } from '../artwork';
import type { FabProfile } from '../schemas/fab-profile';
import { boundaryPieces, type BoundaryPiece } from './boundary-piece';
import { isPointInShape } from './point-in-shape';
import { boundaryDistance } from './shape-distance';
import { locationOf, roundMm, type Violation } from './violation';

/** Radiating copper: what the near-field keep-out is measured from. */
const RADIATING_ROLES: readonly ArtworkShape['role'][] = ['patch', 'parasitic-patch'];

/** Distance from a hole's wall to a shape's copper: 0 when they overlap. */
function wallGapMm(hole: BoundaryPiece[], center: readonly [number, number], copper: BoundaryPiece[]): number {
	if (isPointInShape(center, copper) || isPointInShape(copper[0].from, hole)) return 0;
	return boundaryDistance(hole, copper)?.distanceMm ?? Infinity;
}

/**
 * A mounting hole keeps `metadata.mountingHoleKeepOutMm` (MOUNTING_HOLE_KEEP_OUT_HEIGHTS × h) from radiating copper
 * on any layer, and the profile's copper-to-edge distance from every other dark copper it does not pass through by
 * design (a ground plane it pulls back from is judged by annular-ring).
 */
export function checkMountingHoles(artwork: Artwork, profile: FabProfile): Violation[] {
	const out: Violation[] = [];
	const keepOutMm = artwork.metadata.mountingHoleKeepOutMm ?? mountingHoleKeepOutMm(artwork);
	for (const drill of artwork.drills.filter((d) => d.role === 'mounting')) {
		const hole = boundaryPieces({ id: drill.id, role: 'clearance', polarity: 'dark', geometry: { kind: 'region', region: { outer: createCircleContour(drill.center, drill.diameterMm / 2), holes: [] } } });
		for (const layer of artwork.layers) {
			if (layer.function.kind !== 'copper') continue;
			for (const shape of layer.shapes) {
				if (shape.polarity !== 'dark' || shape.role === 'ground' || shape.geometry.kind === 'outline' || shape.geometry.kind === 'stroke') continue;
				const radiating = RADIATING_ROLES.includes(shape.role);
				const requiredMm = radiating ? keepOutMm : profile.copperToEdgeMm;
				const gapMm = wallGapMm(hole, drill.center, boundaryPieces(shape));
				if (!(gapMm < requiredMm - LENGTH_EPSILON_MM)) continue;
				out.push({
					ruleId: 'hole-keep-out',
					layerId: layer.id,
					shapeIds: [drill.id, shape.id],
					location: locationOf(drill.center),
					measuredMm: roundMm(gapMm),
					requiredMm: roundMm(requiredMm),
					message: radiating
						? `${drill.id} is ${roundMm(gapMm)} mm from ${shape.id}; a mounting hole keeps at least ${roundMm(requiredMm)} mm (5 h, common practice) from the patch, whose near field a screw or standoff detunes`
						: `${drill.id} is ${roundMm(gapMm)} mm from ${shape.id} on ${layer.id}; ${profile.name} keeps copper at least ${requiredMm} mm from a routed or drilled edge`
				});
			}
		}
	}
	return out;
}
