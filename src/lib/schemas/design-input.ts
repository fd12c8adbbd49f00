// The design-input document: what a user types, what the API and the CLI take, what a revision stores.
import { z } from 'zod';

/** Speed of light in vacuum, m/s (exact, SI definition). */
const SPEED_OF_LIGHT_M_PER_S = 299_792_458;

export const patchShapes = ['rectangular', 'circular', 'truncated-corner', 'nearly-square'] as const;
export const feedKinds = ['inset', 'probe', 'edge', 'quarter-wave'] as const;
export const handednesses = ['rhcp', 'lhcp'] as const;

export type PatchShape = (typeof patchShapes)[number];
export type FeedKind = (typeof feedKinds)[number];
export type Handedness = (typeof handednesses)[number];

/**
 * Feeds each shape supports: a circular patch has no cos² inset relation, and a nearly-square patch
 * is fed on its diagonal, which only a probe reaches.
 */
export const allowedFeeds: Record<PatchShape, readonly FeedKind[]> = {
	rectangular: feedKinds,
	'truncated-corner': feedKinds,
	circular: ['probe', 'edge', 'quarter-wave'],
	'nearly-square': ['probe']
};

/** The feed to choose when only a shape is given (the first the shape supports, inset for the rest). */
export function defaultFeedFor(shape: PatchShape): FeedKind {
	return allowedFeeds[shape].includes('inset') ? 'inset' : 'probe';
}

/** A finite number in [min, max] whose error message states the allowed range. */
function bounded(min: number, max: number, opts: { exclusiveMin?: boolean; exclusiveMax?: boolean } = {}) {
	const lo = opts.exclusiveMin ? `(${min}` : `[${min}`;
	const hi = opts.exclusiveMax ? `${max})` : `${max}]`;
	const range = `allowed range ${lo}, ${hi}`;
	let n = z.number({ error: (iss) => (iss.input === undefined ? `required; ${range}` : `must be a finite number; ${range}`) });
	n = opts.exclusiveMin ? n.gt(min, { error: range }) : n.gte(min, { error: range });
	n = opts.exclusiveMax ? n.lt(max, { error: range }) : n.lte(max, { error: range });
	return n;
}

export const substrateSchema = z.strictObject({
	/** Relative permittivity εr of the dielectric. */
	relativePermittivity: bounded(1, 30, { exclusiveMin: true }),
	/** Dielectric loss tangent tanδ. */
	lossTangent: bounded(0, 1, { exclusiveMax: true }).default(0.0009),
	/** Dielectric thickness h between patch copper and ground copper. */
	heightMm: bounded(0, 100, { exclusiveMin: true }),
	/** Finished copper thickness (35 µm ≈ 1 oz/ft²). */
	copperThicknessUm: bounded(1, 210).default(35),
	/** Copper conductivity, S/m (annealed copper 5.8e7). */
	copperConductivitySPerM: bounded(1e6, 1e8).default(5.8e7),
	/** ± tolerance on εr stated by the laminate's datasheet. */
	relativePermittivityTolerance: bounded(0, 5).default(0),
	/** ± tolerance on h. */
	heightToleranceMm: bounded(0, 10).default(0)
});

export const insetOptionsSchema = z.strictObject({
	/** Gap between the feed line and the patch on each side of the inset notch. */
	notchGapMm: bounded(0.01, 20).optional()
});

export const probeOptionsSchema = z.strictObject({
	/** Finished hole (pin) diameter. */
	drillDiameterMm: bounded(0.1, 10).default(1.3),
	/** Copper pad on the patch side around the pin. */
	padDiameterMm: bounded(0.2, 20).optional(),
	/** Anti-pad: clearance cut in the ground around the pin. */
	clearanceDiameterMm: bounded(0.2, 30).default(4.1)
});

export const designInputSchema = z
	.strictObject({
		schemaVersion: z.literal(1).default(1),
		name: z.string().trim().min(1, { error: 'must not be empty' }).max(120, { error: 'at most 120 characters' }).default('Untitled patch'),
		/** Target resonant frequency f0. */
		frequencyHz: bounded(100e6, 100e9),
		shape: z.enum(patchShapes).default('rectangular'),
		feed: z.enum(feedKinds).default('inset'),
		substrate: substrateSchema,
		/** Input resistance the feed point should present (usually the line's Z0). */
		targetImpedanceOhm: bounded(10, 200).default(50),
		/** Characteristic impedance of the feed line from the board edge. */
		feedLineImpedanceOhm: bounded(10, 200).default(50),
		/** Fixes the patch width; only the length is solved. Rectangular shapes only. */
		patchWidthMm: bounded(0.1, 2000, {}).optional(),
		/** Copper margin beyond the patch on every side; default 3h. */
		groundMarginMm: bounded(0, 1000).optional(),
		inset: insetOptionsSchema.default({}),
		probe: probeOptionsSchema.default({ drillDiameterMm: 1.3, clearanceDiameterMm: 4.1 }),
		/** Sense of circular polarisation for truncated-corner and nearly-square patches. */
		handedness: z.enum(handednesses).default('rhcp'),
		/** Add solder-mask layers to the exports. */
		solderMask: z.boolean().default(false)
	})
	.superRefine((d, ctx) => {
		const wavelengthMm = (SPEED_OF_LIGHT_M_PER_S / d.frequencyHz) * 1000;
		if (d.substrate.heightMm >= wavelengthMm / 4) {
			ctx.addIssue({
				code: 'custom',
				path: ['substrate', 'heightMm'],
				input: d.substrate.heightMm,
				message: `must be less than λ0/4 = ${(wavelengthMm / 4).toFixed(3)} mm at this frequency; allowed range (0, ${(wavelengthMm / 4).toFixed(3)})`
			});
		}
		if (d.patchWidthMm !== undefined && d.shape !== 'rectangular') {
			ctx.addIssue({ code: 'custom', path: ['patchWidthMm'], input: d.patchWidthMm, message: 'only a rectangular patch takes a fixed width' });
		}
		const feedsForShape = allowedFeeds[d.shape];
		if (!feedsForShape.includes(d.feed)) {
			ctx.addIssue({
				code: 'custom',
				path: ['feed'],
				input: d.feed,
				message: `a ${d.shape} patch takes one of: ${feedsForShape.join(', ')}`
			});
		}
		if (d.probe.clearanceDiameterMm <= d.probe.drillDiameterMm) {
			ctx.addIssue({
				code: 'custom',
				path: ['probe', 'clearanceDiameterMm'],
				input: d.probe.clearanceDiameterMm,
				message: `must be larger than probe.drillDiameterMm (${d.probe.drillDiameterMm})`
			});
		}
	});

/** The document as written by a user (defaults may be missing). */
export type DesignInputDocument = z.input<typeof designInputSchema>;
/** The document after validation: every default filled in. */
export type DesignInput = z.output<typeof designInputSchema>;
