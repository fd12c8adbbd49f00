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
export { stampLegend, revisionLegendText, shapeBounds, LEGEND_STROKE_WIDTH_MM, LEGEND_TEXT_HEIGHT_MM, LEGEND_PATCH_KEEP_OUT_HEIGHTS, LEGEND_LAUNCH_KEEP_OUT } from './build-legend';
export { MOUNTING_HOLE_KEEP_OUT_HEIGHTS, MOUNTING_HOLE_COPPER_PULLBACK_MM, mountingHoleKeepOutMm } from './build-mounting-holes';
export { STROKE_GLYPHS, STROKE_FONT_CHARACTERS, textStrokes, textWidthMm as strokeTextWidthMm } from './stroke-font';
