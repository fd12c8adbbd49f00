// The Artwork value as one zod schema: shapes per layer, drills, the stack, dimensions, metadata, in millimetres.
// The TypeScript types in src/lib/artwork are inferred from it, and the sweep document's JSON Schema is generated from it.
import { z } from 'zod';
import { allFeedKinds, patchShapes, probeModels } from './design-input';

/** [x, y] in mm, board origin at its lower-left corner (x to the right, y up). */
export const pointSchema = z.tuple([z.number(), z.number()]).readonly().meta({ description: '[x, y] in mm, board origin at its lower-left corner' });

export const segmentSchema = z.discriminatedUnion('kind', [
	z.strictObject({ kind: z.literal('line'), to: pointSchema }).readonly(),
	z.strictObject({ kind: z.literal('arc'), to: pointSchema, center: pointSchema, clockwise: z.boolean() }).readonly()
]);

export const contourSchema = z
	.strictObject({ start: pointSchema, segments: z.array(segmentSchema).min(2).readonly() })
	.readonly()
	.meta({ description: 'Closed: the last segment ends at start. Outer contours counter-clockwise, holes clockwise.' });

export const regionSchema = z.strictObject({ outer: contourSchema, holes: z.array(contourSchema).readonly() }).readonly();

export const shapeRoles = [
	'patch',
	'feed-line',
	'transformer',
	'notch',
	'probe-pad',
	'ground',
	'clearance',
	'profile',
	'mask-opening',
	'parasitic-patch',
	'coupling-slot',
	'tuning-stub',
	'feed-network',
	'network-transformer',
	'launch-signal',
	'launch-ground',
	'launch-back-pad',
	'legend',
	'legend-slot'
] as const;

/** What a hole is for: the probe's pin, a via of an edge launch (top ground pads to the bottom ground), a back-side launch's flange hole. */
export const drillRoles = ['probe', 'launch-via', 'launch-flange', 'mounting'] as const;

export const shapeGeometrySchema = z.discriminatedUnion('kind', [
	/** A filled area bounded by line and arc segments. */
	z.strictObject({ kind: z.literal('region'), region: regionSchema }).readonly(),
	/** An exact filled circle (a flash of a round aperture in Gerber). */
	z.strictObject({ kind: z.literal('circle'), center: pointSchema, diameterMm: z.number().positive() }).readonly(),
	/** A closed line drawn with a round pen, not filled (the board profile). */
	z.strictObject({ kind: z.literal('outline'), contour: contourSchema, strokeWidthMm: z.number().positive() }).readonly(),
	/** An open polyline drawn with a round pen: the ink is every point within strokeWidthMm/2 of it (legend text and marks). */
	z.strictObject({ kind: z.literal('stroke'), points: z.array(pointSchema).min(2).readonly(), strokeWidthMm: z.number().positive() }).readonly()
]);

export const artworkShapeSchema = z
	.strictObject({
		id: z.string().meta({ description: 'Unique within the artwork, stable for the same design' }),
		role: z.enum(shapeRoles),
		polarity: z.enum(['dark', 'clear']).meta({ description: "dark adds to the layer's image, clear removes what earlier dark shapes drew (Gerber's LPD/LPC)" }),
		geometry: shapeGeometrySchema
	})
	.readonly();

export const layerFunctionSchema = z.discriminatedUnion('kind', [
	z.strictObject({ kind: z.literal('copper'), copperIndex: z.number().int().min(1), side: z.enum(['top', 'inner', 'bottom']) }).readonly(),
	z.strictObject({ kind: z.literal('profile') }).readonly(),
	z.strictObject({ kind: z.literal('solder-mask'), side: z.enum(['top', 'bottom']) }).readonly(),
	z.strictObject({ kind: z.literal('legend'), side: z.enum(['top', 'bottom']) }).readonly()
]);

export const artworkLayerSchema = z
	.strictObject({
		id: z.string().meta({ description: 'File-name and group id: copper-top, copper-inner-1, copper-bottom, profile, mask-top, mask-bottom, legend-top' }),
		title: z.string(),
		function: layerFunctionSchema,
		shapes: z.array(artworkShapeSchema).readonly().meta({ description: 'Drawn in order: a clear shape removes only what dark shapes before it drew' }),
		voids: z.array(artworkShapeSchema).readonly().meta({ description: 'Copper-free areas by design (inset notch gaps): not drawn, kept for checks and drawings' })
	})
	.readonly();

export const artworkDrillSchema = z
	.strictObject({
		id: z.string(),
		role: z.enum(drillRoles).meta({ description: 'probe: the plated feed pin hole; launch-via, launch-flange: the connector launch; mounting: a non-plated hole the user placed' }),
		plated: z.boolean(),
		center: pointSchema,
		diameterMm: z.number().positive().meta({ description: 'Finished hole diameter' }),
		fromCopper: z.number().int().min(1).meta({ description: 'Copper layers the hole spans, 1 = top' }),
		toCopper: z.number().int().min(1)
	})
	.readonly();

export const stackLayerSchema = z.discriminatedUnion('kind', [
	z
		.strictObject({
			kind: z.literal('copper'),
			id: z.string(),
			layerId: z.string().meta({ description: 'The artwork layer this copper is patterned by' }),
			zMm: z.number().min(0),
			thicknessMm: z.number().positive(),
			conductivitySPerM: z.number().positive()
		})
		.readonly(),
	z
		.strictObject({
			kind: z.literal('dielectric'),
			id: z.string(),
			zMm: z.number().min(0),
			thicknessMm: z.number().positive(),
			relativePermittivity: z.number().min(1),
			lossTangent: z.number().min(0),
			bonding: z.boolean().optional().meta({ description: 'true for a bonding film (prepreg) between cores' })
		})
		.readonly()
]);

export const artworkDimensionSchema = z
	.strictObject({
		id: z.enum([
			'patch-width',
			'patch-length',
			'patch-diameter',
			'corner-cut',
			'parasitic-width',
			'parasitic-length',
			'inset-depth',
			'notch-gap',
			'probe-x',
			'probe-y',
			'transformer-length',
			'transformer-width',
			'slot-length',
			'slot-width',
			'stub-length',
			'feed-overlap',
			'feed-width',
			'pitch-x',
			'pitch-y',
			'ground-width',
			'ground-length'
		]),
		label: z.string().meta({ description: 'Short label: W, L, D, c, Wp, Lp (or Dp) of a parasitic patch, y0, g, xp, yp (probe centre from the board corner), Lt, Wt, Ls, Ws, Lst, Lo, Wf, Sx, Sy, Wg, Lg' }),
		from: pointSchema,
		to: pointSchema,
		valueMm: z.number(),
		side: z.enum(['above', 'below', 'left', 'right'])
	})
	.readonly();

/**
 * What conducts in the probe hole. A solid pin fills the finished hole; a plated barrel is a copper
 * tube whose inside diameter is the finished hole and whose wall is the plating.
 */
export const artworkProbeSchema = z
	.strictObject({
		model: z.enum(probeModels),
		drillDiameterMm: z.number().positive(),
		platingThicknessUm: z.number().positive().nullable().meta({ description: 'Barrel wall copper; null for a solid pin' })
	})
	.readonly();

/** The connector launch as built: what the fab notes and drawings state about it (absent: no launch). */
export const artworkLaunchSchema = z.discriminatedUnion('kind', [
	z
		.strictObject({
			kind: z.literal('edge'),
			lengthMm: z.number().positive(),
			signalWidthMm: z.number().positive(),
			gapMm: z.number().positive(),
			gapSolved: z.boolean().meta({ description: 'true when the gap was solved for the line impedance, false when the design states it' }),
			groundWidthMm: z.number().positive(),
			lineImpedanceOhm: z.number().positive(),
			launchImpedanceOhm: z.number().positive().meta({ description: 'Grounded-coplanar Z0 of the launch section with this gap (closed form)' }),
			viaDrillMm: z.number().positive(),
			viaCount: z.number().int().min(0)
		})
		.readonly(),
	z
		.strictObject({
			kind: z.literal('back'),
			mount: z.enum(['pad', 'flange']),
			center: pointSchema,
			antiPadDiameterMm: z.number().positive(),
			padSideMm: z.number().positive().nullable(),
			flangeDrillMm: z.number().positive().nullable(),
			flangeSpacingMm: z.number().positive().nullable()
		})
		.readonly()
]);

/** The legend's lettering and what it holds: items placed, items left out for want of room. */
export const artworkLegendSchema = z
	.strictObject({
		textHeightMm: z.number().positive(),
		strokeWidthMm: z.number().positive(),
		placed: z.array(z.string()).readonly(),
		omitted: z.array(z.string()).readonly()
	})
	.readonly();

export const boardSchema = z.strictObject({ widthMm: z.number().min(0), lengthMm: z.number().min(0) }).readonly();

export const artworkSchema = z
	.strictObject({
		board: boardSchema.meta({ description: 'Board outline: a rectangle from (0, 0) to (widthMm, lengthMm)' }),
		layers: z.array(artworkLayerSchema).min(1).readonly().meta({ description: 'Top to bottom: copper top first, then the rest' }),
		drills: z.array(artworkDrillSchema).readonly(),
		stack: z.array(stackLayerSchema).readonly().meta({ description: 'Top to bottom: the first entry is the top copper' }),
		dimensions: z.array(artworkDimensionSchema).readonly(),
		metadata: z
			.strictObject({
				designName: z.string(),
				shape: z.enum(patchShapes),
				feedKind: z.enum(allFeedKinds),
				frequencyHz: z.number().positive(),
				copperLayerCount: z.number().int().min(2),
				probe: artworkProbeSchema.optional().meta({ description: 'The probe model the design states (absent: not stated)' }),
				launch: artworkLaunchSchema.optional().meta({ description: 'The connector launch as built (absent: none)' }),
				legend: artworkLegendSchema.optional().meta({ description: 'What the legend layer holds and what did not fit (absent: no legend)' }),
				mountingHoleKeepOutMm: z.number().min(0).optional().meta({ description: 'Least distance a mounting hole keeps from the patch (absent: no mounting holes)' })
			})
			.readonly()
	})
	.readonly()
	.meta({ id: 'Artwork', description: 'Layers of shapes, drills, the stack and dimensions of one design, in mm' });
