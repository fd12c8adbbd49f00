// A fab capability profile: the smallest features a board house promises to build, and its tolerances.
import { z } from 'zod';
import { parseWith } from './input-error';
import { plainText } from './plain-text';

/**
 * Surface finishes a board house plates on bare copper (trade names, IPC-4552/4553/4554 families;
 * from memory). ENIG and immersion silver stay flat and thin; HASL leaves an uneven solder coat.
 */
export const fabFinishes = ['ENIG', 'immersion silver', 'immersion tin', 'OSP', 'HASL (lead-free)', 'bare copper'] as const;
export type FabFinish = (typeof fabFinishes)[number];

/** A finite length in mm within [min, max]; the error message states the allowed range. */
function lengthMm(min: number, max: number) {
	const range = `allowed range [${min}, ${max}] mm`;
	return z
		.number({ error: (iss) => (iss.input === undefined ? `required; ${range}` : `must be a finite number; ${range}`) })
		.gte(min, { error: range })
		.lte(max, { error: range });
}

/**
 * What one board house can make. Every minimum is a finished (as-built) size; the tolerances are
 * the ± spread the house states around a drawn size. 0.15 mm trace / 0.15 mm space, for example,
 * means a 0.15 mm line next to a 0.15 mm gap is still built without opens or shorts.
 */
export const fabProfileSchema = z
	.strictObject({
		/** Human name, shown in the check report and the fab notes. */
		name: z.string().trim().min(1, { error: 'must not be empty' }).max(120, { error: 'at most 120 characters' }).superRefine(plainText('name')),
		/** Narrowest copper line (feed line, transformer section). */
		minTraceWidthMm: lengthMm(0.01, 10),
		/** Narrowest gap between two separate copper features on one layer; also drill barrel to plane. */
		minSpacingMm: lengthMm(0.01, 10),
		/** Smallest finished hole. */
		minDrillMm: lengthMm(0.01, 10),
		/** Narrowest copper ring left around a hole: (pad diameter − drill) / 2. */
		minAnnularRingMm: lengthMm(0, 10),
		/** Copper kept back from the routed board outline. */
		copperToEdgeMm: lengthMm(0, 20),
		/** Narrowest copper-free slot inside one copper feature (an inset notch gap). */
		minSlotWidthMm: lengthMm(0.01, 10),
		/** ± change of a drawn copper edge after etching. */
		etchToleranceMm: lengthMm(0, 1),
		/** ± on a plated hole's finished diameter. */
		platedDrillToleranceMm: lengthMm(0, 1),
		/** ± on a non-plated hole's diameter. */
		nonPlatedDrillToleranceMm: lengthMm(0, 1),
		/**
		 * The most copper layers the house laminates in this process: 2 for a double-sided service; a
		 * three-copper stack (two cores bonded with a film) needs a multilayer process. Absent in profiles
		 * stored before it existed: 2 (the conservative reading of a profile that never said).
		 */
		maxCopperLayers: z
			.number({ error: 'must be a whole number; allowed range [1, 32]' })
			.int({ error: 'must be a whole number; allowed range [1, 32]' })
			.gte(1, { error: 'allowed range [1, 32]' })
			.lte(32, { error: 'allowed range [1, 32]' })
			.default(2),
		/** Whether the house bonds cores of different materials (different εr or tanδ) into one board. Absent: false. */
		mixedCores: z.boolean({ error: 'must be true or false' }).default(false),
		/** ± on the finished board thickness, in percent of the nominal. Absent: 10 % (common practice, no source). */
		boardThicknessTolerancePercent: z
			.number({ error: 'must be a finite number; allowed range [0, 50] %' })
			.gte(0, { error: 'allowed range [0, 50] %' })
			.lte(50, { error: 'allowed range [0, 50] %' })
			.default(10),
		/** Narrowest legend (silkscreen) line the house prints. Absent: LEGEND_DEFAULTS.minLegendWidthMm. */
		minLegendWidthMm: lengthMm(0.01, 2).optional(),
		/** Legend ink kept from a mask opening (bare copper the ink would not stick to or would smear onto). Absent: LEGEND_DEFAULTS. */
		legendToOpeningMm: lengthMm(0, 5).optional(),
		/** Legend ink kept from the routed board edge. Absent: LEGEND_DEFAULTS.legendToEdgeMm. */
		legendToEdgeMm: lengthMm(0, 5).optional(),
		/** The surface finish ordered from this house (see fabFinishes). Absent: ENIG. */
		finish: z.enum(fabFinishes, { error: `must be one of: ${fabFinishes.join(', ')}` }).default('ENIG')
	})
	.superRefine((p, ctx) => {
		// A slot is a gap too: a house that cannot hold a 0.15 mm space cannot hold a 0.1 mm notch.
		if (p.minSlotWidthMm < p.minSpacingMm) {
			ctx.addIssue({
				code: 'custom',
				path: ['minSlotWidthMm'],
				input: p.minSlotWidthMm,
				message: `must be at least minSpacingMm (${p.minSpacingMm} mm); allowed range [${p.minSpacingMm}, 10] mm`
			});
		}
	});

export type FabProfile = z.output<typeof fabProfileSchema>;

/**
 * The legend rules of a profile that states none: common practice, no source — typical of quick-turn houses,
 * which print legend lines from about 0.12–0.15 mm, clip ink about 0.1–0.15 mm back from mask openings and keep
 * it a quarter millimetre inside the routed edge.
 */
export const LEGEND_DEFAULTS = Object.freeze({ minLegendWidthMm: 0.15, legendToOpeningMm: 0.15, legendToEdgeMm: 0.25 });

/** A profile's legend rules, its own values where it states them. */
export function legendRulesOf(profile: FabProfile): { minLegendWidthMm: number; legendToOpeningMm: number; legendToEdgeMm: number } {
	return {
		minLegendWidthMm: profile.minLegendWidthMm ?? LEGEND_DEFAULTS.minLegendWidthMm,
		legendToOpeningMm: profile.legendToOpeningMm ?? LEGEND_DEFAULTS.legendToOpeningMm,
		legendToEdgeMm: profile.legendToEdgeMm ?? LEGEND_DEFAULTS.legendToEdgeMm
	};
}

/**
 * The built-in profile. All values: common practice, no source — typical of low-cost quick-turn
 * two-layer FR-4 services, chosen on the conservative side:
 * - 0.15 mm (≈ 6 mil) trace and space;
 * - 0.3 mm smallest finished drill;
 * - 0.15 mm annular ring;
 * - 0.3 mm copper to the routed edge;
 * - 0.2 mm notch/slot: a little wider than the space, because a narrow slot cut into a wide copper
 *   area is etched from both walls and closes first;
 * - ±0.05 mm etch, ±0.075 mm plated and ±0.05 mm non-plated drill diameter;
 * - two copper layers on one core, no mixed materials; ±10 % finished thickness; ENIG finish.
 */
export const STANDARD_QUICK_TURN_PROFILE: FabProfile = Object.freeze({
	name: 'standard quick-turn two-layer',
	minTraceWidthMm: 0.15,
	minSpacingMm: 0.15,
	minDrillMm: 0.3,
	minAnnularRingMm: 0.15,
	copperToEdgeMm: 0.3,
	minSlotWidthMm: 0.2,
	etchToleranceMm: 0.05,
	platedDrillToleranceMm: 0.075,
	nonPlatedDrillToleranceMm: 0.05,
	maxCopperLayers: 2,
	mixedCores: false,
	boardThicknessTolerancePercent: 10,
	finish: 'ENIG'
});

/**
 * The built-in profile for stacks of more than two coppers: the quick-turn minimums (common practice,
 * no source) in a multilayer process that bonds cores with a film, of one or of different materials
 * (the usual build of an aperture- or proximity-coupled patch).
 */
export const STANDARD_MULTILAYER_PROFILE: FabProfile = Object.freeze({
	...STANDARD_QUICK_TURN_PROFILE,
	name: 'standard multilayer, bonded cores',
	maxCopperLayers: 6,
	mixedCores: true
});

/** The built-in profile that can build a stack of `copperLayerCount` coppers: two-layer when it can, else multilayer. */
export function builtInFabProfileFor(copperLayerCount: number): FabProfile {
	return copperLayerCount <= STANDARD_QUICK_TURN_PROFILE.maxCopperLayers ? STANDARD_QUICK_TURN_PROFILE : STANDARD_MULTILAYER_PROFILE;
}

/** Validates a fab profile document or throws InputError (field path, value, allowed range). */
export function parseFabProfile(raw: unknown): FabProfile {
	return parseWith(fabProfileSchema, raw);
}
