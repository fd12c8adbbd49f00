// Public face of the drc room: design-rule checks of an Artwork against a fab capability profile.
export { checkArtwork } from './check-artwork';
export { checkTraceWidth } from './check-trace-width';
export { checkCopperSpacing } from './check-copper-spacing';
export { checkDrillSize, checkAnnularRing } from './check-drills';
export { checkEdgeClearance, FLUSH_TO_EDGE_ROLES } from './check-edge-clearance';
export { checkSlotWidth } from './check-slot-width';
export { checkStackBuild } from './check-stack-build';
export { checkLaunch, checkLaunchGap, checkLaunchViaEdge, checkLaunchViaSpacing, checkLaunchAnnularRing, checkLaunchInsideBoard } from './check-launch';
export { checkLegendWidth, checkLegendEdge, checkLegendClearance } from './check-legend';
export { checkMountingHoles } from './check-mounting-holes';
export { DRC_RULE_IDS, type DrcRuleId, type Violation } from './violation';
export { boundaryPieces, type BoundaryPiece } from './boundary-piece';
export { closestPair, type ClosestPair } from './piece-distance';
export { boundaryDistance } from './shape-distance';
export { narrowestWidth, type ShapeWidth } from './shape-width';
export { isPointInShape } from './point-in-shape';
