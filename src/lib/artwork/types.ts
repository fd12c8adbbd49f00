// The Artwork value: everything a writer or a design-rule check needs, as plain typed data in millimetres.
// One zod schema (src/lib/schemas/artwork.ts) defines it; these types are inferred from it, with the domain notes.
import type { z } from 'zod';
import type {
	artworkDimensionSchema,
	artworkDrillSchema,
	artworkLaunchSchema,
	artworkLayerSchema,
	artworkProbeSchema,
	artworkSchema,
	artworkShapeSchema,
	layerFunctionSchema,
	shapeGeometrySchema,
	shapeRoles,
	stackLayerSchema
} from '../schemas/artwork';

/** What a shape is for. Stable across versions: design-rule checks select shapes by role. */
export type ShapeRole = (typeof shapeRoles)[number];

/**
 * Dark adds material to the layer's image (copper, or a mask opening on a mask layer);
 * clear removes what earlier dark shapes put there (a ground clearance). Gerber's LPD/LPC.
 */
export type Polarity = 'dark' | 'clear';

/** A filled region, an exact circle (a flash of a round aperture), or a closed outline drawn with a round pen. */
export type ShapeGeometry = z.output<typeof shapeGeometrySchema>;
export type ArtworkShape = z.output<typeof artworkShapeSchema>;
/** Which physical layer a layer images. Copper layers are numbered 1 (top) to n (bottom). */
export type LayerFunction = z.output<typeof layerFunctionSchema>;
export type ArtworkLayer = z.output<typeof artworkLayerSchema>;
export type ArtworkDrill = z.output<typeof artworkDrillSchema>;
/** One slab of the stack, bottom face at zMm (z = 0 at the bottom face of the lowest copper). */
export type StackLayer = z.output<typeof stackLayerSchema>;
/** A main size to dimension on drawings: a measured span between two points. */
export type ArtworkDimension = z.output<typeof artworkDimensionSchema>;
export type Artwork = z.output<typeof artworkSchema>;
/**
 * What conducts in the probe hole. A solid pin fills the finished hole; a plated barrel is a copper
 * tube whose inside diameter is the finished hole and whose wall is the plating (the fab drills
 * about drillDiameterMm + 2 × plating and plates it back to the finished size).
 */
export type ArtworkProbe = z.output<typeof artworkProbeSchema>;
/** The connector launch as built: an edge launch's solved gap and via count, or a back-side footprint's mount. */
export type ArtworkLaunch = z.output<typeof artworkLaunchSchema>;
