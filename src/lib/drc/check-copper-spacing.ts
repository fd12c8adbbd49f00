// copper-spacing: the gap between separate copper features of one layer against the profile's minimum space.
import { LENGTH_EPSILON_MM } from '../geometry';
import type { Artwork } from '../artwork';
import type { FabProfile } from '../schemas/fab-profile';
import { isCopperLayer, layerCopper } from './copper-features';
import { boundaryDistance } from './shape-distance';
import { locationOf, midpointOf, roundMm, type Violation } from './violation';

/**
 * Gaps inside one feature (an inset notch) are the slot-width rule's: the profile guarantees
 * minSlotWidthMm ≥ minSpacingMm, so one rule per gap is enough.
 * Two shapes closer than the minimum have boxes closer than the minimum: only those pairs are measured,
 * in the same order (i, then j ascending) as comparing every pair would report them.
 */
export function checkCopperSpacing(artwork: Artwork, profile: FabProfile): Violation[] {
	const out: Violation[] = [];
	for (const layer of artwork.layers.filter(isCopperLayer)) {
		const { shapes: copper, index } = layerCopper(layer);
		for (let i = 0; i < copper.length; i++) {
			for (const j of index.neighboursOf(i, profile.minSpacingMm)) {
				if (j <= i) continue;
				const a = copper[i];
				const b = copper[j];
				if (a.feature === b.feature) continue;
				// a launch ground pad's gap to the line is the launch-gap rule's (check-launch.ts)
				if (a.shape.role === 'launch-ground' || b.shape.role === 'launch-ground') continue;
				const gap = boundaryDistance(a.pieces, b.pieces);
				if (!gap || !(gap.distanceMm < profile.minSpacingMm - LENGTH_EPSILON_MM)) continue;
				out.push({
					ruleId: 'copper-spacing',
					layerId: layer.id,
					shapeIds: [a.shape.id, b.shape.id],
					location: locationOf(midpointOf(gap.onA, gap.onB)),
					measuredMm: roundMm(gap.distanceMm),
					requiredMm: profile.minSpacingMm,
					message: `${a.shape.id} and ${b.shape.id} are ${roundMm(gap.distanceMm)} mm apart; ${profile.name} needs at least ${profile.minSpacingMm} mm between copper features`
				});
			}
		}
	}
	return out;
}
