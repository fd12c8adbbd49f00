// slot-width: each copper-free notch gap (the artwork's voids) against the profile's minimum slot.
import { LENGTH_EPSILON_MM } from '../geometry';
import type { Artwork } from '../artwork';
import type { FabProfile } from '../schemas/fab-profile';
import { boundaryPieces } from './boundary-piece';
import { isCopperLayer } from './copper-features';
import { narrowestWidth } from './shape-width';
import { locationOf, midpointOf, roundMm, type Violation } from './violation';

export function checkSlotWidth(artwork: Artwork, profile: FabProfile): Violation[] {
	const out: Violation[] = [];
	for (const layer of artwork.layers.filter(isCopperLayer)) {
		for (const slot of layer.voids) {
			if (slot.role !== 'notch') continue;
			const g = slot.geometry;
			const width = g.kind === 'circle' ? { widthMm: g.diameterMm, from: g.center, to: g.center } : narrowestWidth(boundaryPieces(slot));
			if (!width || !(width.widthMm < profile.minSlotWidthMm - LENGTH_EPSILON_MM)) continue;
			out.push({
				ruleId: 'slot-width',
				layerId: layer.id,
				shapeIds: [slot.id],
				location: locationOf(midpointOf(width.from, width.to)),
				measuredMm: roundMm(width.widthMm),
				requiredMm: profile.minSlotWidthMm,
				message: `${slot.id} is a ${roundMm(width.widthMm)} mm gap; ${profile.name} needs copper-free slots of at least ${profile.minSlotWidthMm} mm (a narrower notch may etch shut or wider)`
			});
		}
	}
	return out;
}
