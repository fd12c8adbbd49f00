// Field check: a full-wave (FDTD) simulation of a revision's own artwork, and Homing, the automatic
// study that moves the resonant dimension and then the feed until the simulated patch meets its target.
// These schemas are the contract between the pure model writer / post-processor (src/lib/simulation),
// the engine runner (src/worker/fullwave), the job queue (src/lib/server/jobs) and the pages and API.
import { z } from 'zod';

/**
 * How finely the model is meshed.
 * - `quick`: coarse mesh and short run, for tests and a first look (resonance within about 2 %).
 * - `standard`: the default check (λ/20 in the dielectric, ≥ 4 cells through each layer).
 * - `accurate`: `standard` refined 1.5× in every direction; reports how far the resonance moved.
 */
export const fieldCheckModes = ['quick', 'standard', 'accurate'] as const;
export type FieldCheckMode = (typeof fieldCheckModes)[number];

export const fieldCheckOptionsSchema = z.strictObject({
	mode: z.enum(fieldCheckModes).default('standard'),
	/** Wall-clock budget of one engine run, seconds; the run is stopped and reported when exceeded. */
	budgetSeconds: z.number().int().min(10).max(7200).default(900)
});
export type FieldCheckOptions = z.infer<typeof fieldCheckOptionsSchema>;

/** One frequency point of a simulated (or measured) one-port: S11 as a complex number and Zin = R + jX. */
export const s11SampleSchema = z.strictObject({
	frequencyHz: z.number().positive(),
	s11Re: z.number(),
	s11Im: z.number(),
	resistanceOhm: z.number(),
	reactanceOhm: z.number()
});
export type S11Sample = z.infer<typeof s11SampleSchema>;

export const meshStatisticsSchema = z.strictObject({
	cellsX: z.number().int().positive(),
	cellsY: z.number().int().positive(),
	cellsZ: z.number().int().positive(),
	cellCount: z.number().int().positive(),
	smallestCellMm: z.number().positive(),
	largestCellMm: z.number().positive(),
	timesteps: z.number().int().nonnegative()
});
export type MeshStatistics = z.infer<typeof meshStatisticsSchema>;

/**
 * A pattern cut: the level against θ (−180° to 180°, 0° = broadside) in the plane φ = `phiDeg`
 * through broadside, in dB relative to the pattern's peak (0 dB at the peak, floored at −40 dB).
 */
export const patternCutSchema = z.strictObject({
	phiDeg: z.number(),
	levels: z.array(z.strictObject({ thetaDeg: z.number().min(-180).max(180), levelDb: z.number().max(1e-9) })).min(3)
});
export type PatternCut = z.infer<typeof patternCutSchema>;

/**
 * The far field of a Field check at the target frequency (the engine's near-to-far-field transform
 * over a box around the board): broadside (θ = 0) and peak directivity, gain with the port's
 * accepted power (G = D·P_rad/P_accepted; the mismatch is not counted), and the E- and H-plane cuts.
 */
export const fieldCheckPatternSchema = z.strictObject({
	frequencyHz: z.number().positive(),
	directivityDbi: z.number(),
	peakDirectivityDbi: z.number(),
	gainDbi: z.number().nullable(),
	/** P_rad / P_accepted: dielectric, copper and surface-wave loss; null when the port accepted no power. */
	radiationEfficiency: z.number().nonnegative().nullable(),
	radiatedPowerW: z.number().nonnegative(),
	acceptedPowerW: z.number().positive().nullable(),
	/** The cut in the plane of the broadside field's polarisation (the patch's resonant dimension). */
	ePlane: patternCutSchema,
	hPlane: patternCutSchema
});
export type FieldCheckPattern = z.infer<typeof fieldCheckPatternSchema>;

export const fieldCheckResultSchema = z.strictObject({
	engine: z.strictObject({ name: z.string(), version: z.string() }),
	mode: z.enum(fieldCheckModes),
	targetFrequencyHz: z.number().positive(),
	referenceImpedanceOhm: z.number().positive(),
	mesh: meshStatisticsSchema,
	/** Energy left in the model when the run stopped, dB below its peak (END_CRITERION_DB of src/lib/simulation, −35, or lower is settled; checks stored before it ran to −40). */
	energyDecayDb: z.number(),
	runSeconds: z.number().nonnegative(),
	samples: z.array(s11SampleSchema).min(2),
	/** Frequency of the S11 minimum (parabolic refinement) and its depth; null when no dip lies in the band. */
	resonance: z.strictObject({ frequencyHz: z.number().positive(), s11Db: z.number() }).nullable(),
	/** (resonance − target) / target; negative when the patch resonates low. */
	deviationFraction: z.number().nullable(),
	/** S11 at the target frequency, dB. */
	s11AtTargetDb: z.number(),
	/** The −10 dB band around the resonance, interpolated; null when S11 never reaches −10 dB. */
	band: z.strictObject({ lowHz: z.number().positive(), highHz: z.number().positive() }).nullable(),
	minimumVswr: z.number().min(1),
	/** The far field at the target (directivity, gain, E/H-plane cuts); null when it was not computed (results stored before it existed). */
	pattern: fieldCheckPatternSchema.nullable(),
	/** Accurate mode only: resonance of the standard mesh, and how far refinement moved it (fraction). */
	refinement: z.strictObject({ standardResonanceHz: z.number().positive(), shiftFraction: z.number() }).nullable()
});
export type FieldCheckResult = z.infer<typeof fieldCheckResultSchema>;

/** Dimensions Homing moves: the resonant one first, then the feed. */
export const homingParameters = ['lengthMm', 'radiusMm', 'insetDepthMm', 'probeOffsetMm', 'transformerImpedanceOhm'] as const;
export type HomingParameter = (typeof homingParameters)[number];

export const homingIterationSchema = z.strictObject({
	step: z.number().int().positive(),
	parameter: z.enum(homingParameters),
	value: z.number(),
	resonanceHz: z.number().positive().nullable(),
	s11AtTargetDb: z.number(),
	/** Simulations run so far, this one included. */
	simulations: z.number().int().positive()
});
export type HomingIteration = z.infer<typeof homingIterationSchema>;

export const homingResultSchema = z.strictObject({
	converged: z.boolean(),
	/** Why the study stopped, in words ("resonance within 0.3 % and S11 −24.1 dB at target"). */
	stoppedBecause: z.string(),
	iterations: z.array(homingIterationSchema),
	/** The design-input document of the tuned patch (its dimension overrides set). */
	tunedInput: z.record(z.string(), z.unknown()),
	/** The field check of the tuned patch. */
	final: fieldCheckResultSchema
});
export type HomingResult = z.infer<typeof homingResultSchema>;

/** Progress a running check reports: overall fraction and what the engine is doing. */
export const fieldCheckProgressSchema = z.strictObject({
	fraction: z.number().min(0).max(1),
	message: z.string(),
	/** Simulation n of m within a Homing study. */
	simulation: z.number().int().positive().optional(),
	ofSimulations: z.number().int().positive().optional()
});
export type FieldCheckProgress = z.infer<typeof fieldCheckProgressSchema>;
