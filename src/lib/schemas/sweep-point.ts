// One point of a sweep document as one zod schema: the point sized and drawn (derived values, board, layers, drills,
// stack) or refused with the reason. The published sweep JSON Schema (/schemas/sweep-v2.json) is generated from it;
// version 2 adds to each sized point what a solver needs to set up the model (solverSetupSchema).
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

const sizedPointShape = {
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
				"Every copper and dielectric layer in order, bottom up: the first entry is the bottom copper at zMm 0 (zMm is each slab's bottom face, measured up from the bottom copper's lower face) and zMm increases along the list to the top copper; each slab starts where the one before it ends. Each copper states its thickness and conductivity. A probe entry, when the design states a probe model, comes last."
		})
};

const refusedPointSchema = z
	.strictObject({
		index: z.number().int().min(0),
		status: z.literal('refused'),
		parameters: parametersSchema,
		error: z.strictObject({ kind: z.enum(['input', 'geometry']), path: z.string(), message: z.string() }).readonly().meta({ description: 'Why this point has no design: bad input for sizing, or a broken geometry rule' })
	})
	.readonly();

/** Where the solver drives the structure: a microstrip line at the board edge, or a coaxial probe through the stack. */
export const solverPortSchema = z.discriminatedUnion('kind', [
	z
		.strictObject({
			kind: z.literal('edge-line'),
			id: z.string(),
			location: pointSchema.meta({ description: "Middle of the line's end on the board edge, [x, y] in mm from the board's lower-left corner" }),
			edge: z.enum(['bottom', 'top', 'left', 'right']).meta({ description: 'The board edge the line ends on (bottom: y = 0)' }),
			lineWidthMm: z.number().positive(),
			referenceImpedanceOhm: z.number().positive().meta({ description: "The line's characteristic impedance: the port's reference" }),
			signalCopper: z.string().meta({ description: 'Id of the stack copper (and artwork layer) the line is drawn on' }),
			returnCopper: z.string().meta({ description: 'Id of the stack copper holding the ground plane under the line' })
		})
		.readonly(),
	z
		.strictObject({
			kind: z.literal('coaxial-probe'),
			id: z.string(),
			location: pointSchema.meta({ description: "The probe's centre, [x, y] in mm from the board's lower-left corner" }),
			referenceImpedanceOhm: z.number().positive().meta({ description: 'Impedance of the coaxial feed: the port reference' }),
			signalCopper: z.string().meta({ description: 'Id of the stack copper the pin feeds (the patch)' }),
			returnCopper: z.string().meta({ description: "Id of the stack copper the coax shield meets (the ground plane with the anti-pad)" }),
			model: z.enum(probeModels).meta({ description: 'solid-pin: a conductor filling the finished hole; plated-barrel: a copper tube of inside diameter pinDiameterMm and wall platingThicknessUm' }),
			modelStated: z.boolean().meta({ description: 'false: the design states no probe model and a solid pin (a connector centre pin soldered through) is written' }),
			pinDiameterMm: z.number().positive().meta({ description: 'Finished hole diameter: the pin, or the inside of the barrel' }),
			platingThicknessUm: z.number().positive().nullable().meta({ description: 'Barrel wall copper; null for a solid pin' }),
			padDiameterMm: z.number().positive().meta({ description: 'Copper pad around the pin on the signal copper' }),
			antiPadDiameterMm: z.number().positive().meta({ description: 'Clearance cut around the pin in the return copper' })
		})
		.readonly()
]);

/** What a solver needs beside the geometry and the stack, stated so that nothing is guessed. */
export const solverSetupSchema = z
	.strictObject({
		ports: z.array(solverPortSchema).min(1).readonly(),
		frequencyWindow: z
			.strictObject({ startHz: z.number().positive(), stopHz: z.number().positive() })
			.readonly()
			.meta({ description: 'Band to simulate: the design frequency ±20 % (room for the first-pass resonance error and a material spread)' }),
		materialsHoldAtHz: z.number().positive().meta({ description: "Frequency at which every dielectric's relativePermittivity and lossTangent hold: the design frequency, where sizing used them" }),
		dielectricOutline: z
			.strictObject({
				origin: z.literal('board-lower-left').meta({ description: 'Every x, y in this point is measured from the board outline\'s lower-left corner' }),
				contour: z.array(pointSchema).min(3).readonly().meta({ description: 'Closed outline, counter-clockwise, [x, y] in mm; every dielectric of the stack fills it' })
			})
			.readonly()
	})
	.readonly();

/** A point of the sweep document (version 2: a sized point carries its solver set-up; version 1 is frozen in formats/sweep/sweep-v1.schema.json). */
export const sweepPointSchema = z.discriminatedUnion('status', [z.strictObject({ ...sizedPointShape, solverSetup: solverSetupSchema }).readonly(), refusedPointSchema]);
