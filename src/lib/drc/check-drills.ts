// drill-size and annular-ring: each hole against the smallest drill, its pads' rings and its plane clearances.
import { LENGTH_EPSILON_MM, distanceMm } from '../geometry';
import type { Artwork, ArtworkDrill } from '../artwork';
import type { FabProfile } from '../schemas/fab-profile';
import { locationOf, roundMm, type Violation } from './violation';

export function checkDrillSize(artwork: Artwork, profile: FabProfile): Violation[] {
	return artwork.drills
		.filter((d) => d.diameterMm < profile.minDrillMm - LENGTH_EPSILON_MM)
		.map((d) => ({
			ruleId: 'drill-size' as const,
			layerId: null,
			shapeIds: [d.id],
			location: locationOf(d.center),
			measuredMm: roundMm(d.diameterMm),
			requiredMm: profile.minDrillMm,
			message: `${d.id} is a ${roundMm(d.diameterMm)} mm hole; ${profile.name} drills no smaller than ${profile.minDrillMm} mm`
		}));
}

/**
 * For each copper layer the hole passes through, the round shapes centred on it:
 * - a dark pad leaves a ring (pad − drill)/2 that must be at least minAnnularRingMm;
 * - a clear ground clearance leaves a copper-free ring (clearance − drill)/2 between the hole wall
 *   (the plated barrel or the bare pin) and the plane, which must be at least minSpacingMm.
 * Pads that are not centred on the hole are not judged here.
 */
export function checkAnnularRing(artwork: Artwork, profile: FabProfile): Violation[] {
	const out: Violation[] = [];
	const spans = (drill: ArtworkDrill, copperIndex: number) => copperIndex >= drill.fromCopper && copperIndex <= drill.toCopper;
	for (const drill of artwork.drills) {
		for (const layer of artwork.layers) {
			if (layer.function.kind !== 'copper' || !spans(drill, layer.function.copperIndex)) continue;
			for (const shape of layer.shapes) {
				const g = shape.geometry;
				if (g.kind !== 'circle' || distanceMm(g.center, drill.center) > LENGTH_EPSILON_MM) continue;
				const ringMm = (g.diameterMm - drill.diameterMm) / 2;
				const pad = shape.polarity === 'dark';
				const requiredMm = pad ? profile.minAnnularRingMm : profile.minSpacingMm;
				if (!(ringMm < requiredMm - LENGTH_EPSILON_MM)) continue;
				out.push({
					ruleId: 'annular-ring',
					layerId: layer.id,
					shapeIds: [shape.id, drill.id],
					location: locationOf(drill.center),
					measuredMm: roundMm(ringMm),
					requiredMm,
					message: pad
						? `${shape.id} leaves a ${roundMm(ringMm)} mm ring around ${drill.id}; ${profile.name} needs an annular ring of at least ${requiredMm} mm`
						: `${shape.id} leaves ${roundMm(ringMm)} mm between ${drill.id} and the ${layer.id} copper; ${profile.name} needs at least ${requiredMm} mm (minimum spacing)`
				});
			}
		}
	}
	return out;
}
