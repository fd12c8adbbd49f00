// All design rules on one artwork: the pure gate before any export.
import type { Artwork } from '../artwork';
import type { FabProfile } from '../schemas/fab-profile';
import { checkCopperSpacing } from './check-copper-spacing';
import { checkAnnularRing, checkDrillSize } from './check-drills';
import { checkEdgeClearance } from './check-edge-clearance';
import { checkLaunch } from './check-launch';
import { checkSlotWidth } from './check-slot-width';
import { checkStackBuild } from './check-stack-build';
import { checkTraceWidth } from './check-trace-width';
import { checkLegendClearance, checkLegendEdge, checkLegendWidth } from './check-legend';
import { checkMountingHoles } from './check-mounting-holes';
import type { Violation } from './violation';

/** Every violation of the profile, grouped by rule in a fixed order; empty when the artwork is buildable. */
export function checkArtwork(artwork: Artwork, profile: FabProfile): Violation[] {
	return [
		...checkStackBuild(artwork, profile),
		...checkTraceWidth(artwork, profile),
		...checkCopperSpacing(artwork, profile),
		...checkDrillSize(artwork, profile),
		...checkAnnularRing(artwork, profile),
		...checkEdgeClearance(artwork, profile),
		...checkSlotWidth(artwork, profile),
		...checkLaunch(artwork, profile),
		...checkMountingHoles(artwork, profile),
		...checkLegendWidth(artwork, profile),
		...checkLegendEdge(artwork, profile),
		...checkLegendClearance(artwork, profile)
	];
}
