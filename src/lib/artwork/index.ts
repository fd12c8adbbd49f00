// Public face of the artwork room.
export * from './types';
export { artworkBuildCount, buildArtwork } from './build-artwork';
export { profileLayer, PROFILE_STROKE_WIDTH_MM } from './profile-layer';
export { patchPolygon } from './patch-polygon';
export { needsExtendedArtwork } from './build-artwork';
export { copperLayerIds } from './build-stack';
export { translateShape } from './translate-shape';
export { DEFAULT_PLATING_THICKNESS_UM, probeModelOf } from './probe-model';
export { layoutCorporateFeed, pieceShape, type CorporateFeedLayout, type NetworkPiece } from './build-corporate-feed';
export { PROBE_DATUM } from './build-dimensions';
export {
	boxesOverlap,
	decimalsForResolution,
	DRAWING_TEXT_METRICS,
	formatLengthMm,
	labelAt,
	layoutDimensions,
	textWidthMm,
	type DimensionLayout,
	type DimensionLayoutOptions,
	type DrawingLabel,
	type DrawingSegment,
	type PlacedDimension
} from './dimension-layout';
