// Public face of the artwork room.
export * from './types';
export { buildArtwork, PROFILE_STROKE_WIDTH_MM } from './build-artwork';
export { patchPolygon } from './patch-polygon';
