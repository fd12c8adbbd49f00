// One point of a sweep document as one zod schema: the point sized and drawn (derived values, board, layers, drills,
// stack) or refused with the reason. The published sweep JSON Schema (/schemas/sweep-v1.json) is generated from it.
import { z } from 'zod';
import { artworkDrillSchema, artworkLayerSchema, boardSchema, pointSchema, stackLayerSchema } from './artwork';
import { probeModels } from './design-input';
import { sizedDerivedSchema, sizingWarningSchema } from './sized-design';

/** What conducts in the probe hole, listed last in a point's stack when the design states a probe model. */
export const sweepProbeEntrySchema = z
	.strictObject({
		kind: z.literal('probe'),
		id: z.string(),
		model: z.enum(probeModels),
		center: pointSchema,
		drillDiameterMm: z.number().positive(),
		platingThicknessUm: z.number().positive().nullable(),
		zMm: z.number().min(0),
		thicknessMm: z.number().positive()
	})
	.readonly()
	.meta({
		description:
			'Not a slab: what conducts in the probe hole, listed last when the design states a probe model. It spans the stack from zMm over thicknessMm; a plated barrel is a copper tube of inside diameter drillDiameterMm and wall platingThicknessUm, a solid pin fills the hole.'
	});

const parametersSchema = z.record(z.string(), z.number()).meta({ description: "The swept fields' values at this point, keyed by dotted path" });

export const sweepPointSchema = z.discriminatedUnion('status', [
	z
		.strictObject({
			index: z.number().int().min(0),
			status: z.literal('sized'),
			parameters: parametersSchema,
			derived: sizedDerivedSchema.meta({ description: 'What sizing derived (every SizedDesign field but the input and warnings); new fields may appear.' }),
			warnings: z.array(sizingWarningSchema).readonly(),
			board: boardSchema,
			layers: z.array(artworkLayerSchema).min(1).readonly(),
			drills: z.array(artworkDrillSchema).readonly(),
			stack: z
				.array(z.union([stackLayerSchema, sweepProbeEntrySchema]))
				.min(1)
				.readonly()
				.meta({
					description:
						"Every copper and dielectric layer in order, bottom up: the first entry is the bottom copper at zMm 0 (zMm is each slab's bottom face, measured up from the bottom copper's lower face) and zMm increases along the list to the top copper; each slab starts where the one before it ends. A probe entry, when the design states a probe model, comes last."
				})
		})
		.readonly(),
	z
		.strictObject({
			index: z.number().int().min(0),
			status: z.literal('refused'),
			parameters: parametersSchema,
			error: z.strictObject({ kind: z.enum(['input', 'geometry']), path: z.string(), message: z.string() }).readonly().meta({ description: 'Why this point has no design: bad input for sizing, or a broken geometry rule' })
		})
		.readonly()
]);
