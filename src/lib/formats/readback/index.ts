// Public face of the read-back self-check: parse our Gerber and Excellon output with @tracespace/parser and compare with the artwork.
export { checkReadBack, type ReadBackResult } from './check-read-back';
export { readFabView } from './read-fab-view';
export { compareFabView } from './compare-fab-view';
export { layerKeyOf, layerKeyOfFileFunction } from './artwork-image';
export {
	READ_BACK_TOLERANCE,
	isFabFileName,
	type FabDrillFile,
	type FabFile,
	type FabHole,
	type FabLayerImage,
	type FabLayerKey,
	type FabPolygon,
	type FabRing,
	type FabView,
	type ReadBackCheck,
	type ReadBackMismatch
} from './fab-view';
