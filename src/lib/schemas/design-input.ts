// The design-input document: what a user types, what the API and the CLI take, what a revision stores.
import { z } from 'zod';
import { plainText } from './plain-text';
import { launchMisfit, launchSchema } from './launch';

/** Speed of light in vacuum, m/s (exact, SI definition). */
const SPEED_OF_LIGHT_M_PER_S = 299_792_458;

export const patchShapes = ['rectangular', 'circular', 'truncated-corner', 'nearly-square'] as const;
export const feedKinds = ['inset', 'probe', 'edge', 'quarter-wave'] as const;
/**
 * Feeds that need a stack of three copper layers: aperture-coupled (patch on top, coupling slot in
 * the middle ground, microstrip feed on the bottom) and proximity-coupled (feed line between the two
 * dielectrics ending under the patch, ground at the bottom).
 */
export const layeredFeedKinds = ['aperture-coupled', 'proximity-coupled'] as const;
/** Every feed the document accepts: the single-layer ones, then the layered ones. */
export const allFeedKinds = [...feedKinds, ...layeredFeedKinds] as const;
export const handednesses = ['rhcp', 'lhcp'] as const;

export type PatchShape = (typeof patchShapes)[number];
export type FeedKind = (typeof allFeedKinds)[number];
export type LayeredFeedKind = (typeof layeredFeedKinds)[number];
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

/** Layered feeds each shape supports (the slot and the line under the patch are built for the rectangular patch). */
export const allowedLayeredFeeds: Record<PatchShape, readonly FeedKind[]> = {
	rectangular: layeredFeedKinds,
	'truncated-corner': [],
	circular: [],
	'nearly-square': []
};

/** Feeds whose line is microstrip on one copper layer: what a corporate array feed and a stacked parasitic patch can be fed by. */
export const microstripFeedKinds: readonly FeedKind[] = ['inset', 'edge', 'quarter-wave', 'aperture-coupled', 'proximity-coupled'];

/** Largest element count along one array axis. */
export const MAX_ARRAY_AXIS_COUNT = 64;

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
	/**
	 * Dielectric loss tangent tanδ. No silent default: when it is missing, sizing assumes the typical
	 * value of the εr's material class (laminateClassFor), writes it into the document and warns.
	 */
	lossTangent: bounded(0, 1, { exclusiveMax: true }).optional(),
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

/**
 * The laminate as it is bought: its name and the values its datasheet (or, for a built-in material
 * class, the class) states. The substrate holds the values the sizing uses; they are the laminate's
 * unless the substrate's εr is a fitted model value, such as a retune's apparent εr back-solved from
 * a measured board. The fab notes order this laminate, never a fitted value. Absent: the substrate
 * values are the laminate's, and it has no recorded name.
 */
export const orderedLaminateSchema = z.strictObject({
	/** The product's name as the team's laminate library has it; absent: no product named (the εr's material class applies). */
	name: z.string().trim().min(1, { error: 'must not be empty' }).max(80, { error: 'at most 80 characters' }).superRefine(plainText('name')).optional(),
	/** εr as the datasheet (or class) states it. */
	relativePermittivity: bounded(1, 30, { exclusiveMin: true }),
	/** ± on εr as the datasheet states it; absent: not stated. */
	relativePermittivityTolerance: bounded(0, 5).optional(),
	/** tanδ as the datasheet states it; absent: not stated. */
	lossTangent: bounded(0, 1, { exclusiveMax: true }).optional()
});
export type OrderedLaminate = z.output<typeof orderedLaminateSchema>;

export const insetOptionsSchema = z.strictObject({
	/** Gap between the feed line and the patch on each side of the inset notch. */
	notchGapMm: bounded(0.01, 20).optional()
});

/**
 * What conducts in the probe hole, for the simulation and the fab: a solid pin filling the finished
 * hole (a connector's centre pin soldered in), or only the hole's plated copper barrel, a tube whose
 * wall is the plating. Absent: not stated (the files say nothing about it, as before).
 */
export const probeModels = ['solid-pin', 'plated-barrel'] as const;
export type ProbeModel = (typeof probeModels)[number];

export const probeOptionsSchema = z
	.strictObject({
		/** Finished hole (pin) diameter. */
		drillDiameterMm: bounded(0.1, 10).default(1.3),
		/** Copper pad on the patch side around the pin. */
		padDiameterMm: bounded(0.2, 20).optional(),
		/** Anti-pad: clearance cut in the ground around the pin. */
		clearanceDiameterMm: bounded(0.2, 30).default(4.1),
		/** Solid pin or plated barrel (see probeModels); absent: not stated. */
		model: z.enum(probeModels).optional(),
		/** Barrel wall copper of a plated-barrel probe; absent: 25 µm (artwork's DEFAULT_PLATING_THICKNESS_UM). */
		platingThicknessUm: bounded(5, 100).optional()
	})
	.superRefine((p, ctx) => {
		if (p.platingThicknessUm !== undefined && p.model !== 'plated-barrel') {
			ctx.addIssue({ code: 'custom', path: ['platingThicknessUm'], input: p.platingThicknessUm, message: 'only a probe.model "plated-barrel" takes a plating thickness' });
		}
	});

/** One copper layer of an explicit stack (top to bottom). */
export const stackCopperSchema = z.strictObject({
	kind: z.literal('copper'),
	/** Finished copper thickness; default substrate.copperThicknessUm. */
	thicknessUm: bounded(1, 210).optional()
});

/** One dielectric layer of an explicit stack: a core, or a bonding film (prepreg) between cores. */
export const stackDielectricSchema = z.strictObject({
	kind: z.literal('dielectric'),
	relativePermittivity: bounded(1, 30, { exclusiveMin: true }),
	lossTangent: bounded(0, 1, { exclusiveMax: true }).default(0.0009),
	heightMm: bounded(0, 100, { exclusiveMin: true }),
	/** A bonding film (prepreg, adhesive) rather than a core; drawn and listed the same, named apart in the notes. */
	bonding: z.boolean().default(false)
});

/**
 * An ordered stack, top to bottom: copper, one or more dielectrics (cores and bonding films),
 * copper, … Starts and ends with copper; two coppers are never adjacent. Dielectrics between the
 * same two coppers act as one layer of thickness Σh and series permittivity Σh / Σ(h/εr).
 */
export const layerStackSchema = z
	.array(z.discriminatedUnion('kind', [stackCopperSchema, stackDielectricSchema]))
	.min(3, { error: 'needs at least copper, dielectric, copper; allowed length [3, 15]' })
	.max(15, { error: 'at most 15 layers; allowed length [3, 15]' });

/** Starting values of the aperture-coupled feed; each defaults to the published first-pass rule (see rf/aperture-coupling.ts). */
export const slotOptionsSchema = z.strictObject({
	/** Slot length across the feed line (parallel to the radiating edges). */
	lengthMm: bounded(0.1, 1000).optional(),
	/** Slot width along the feed line. */
	widthMm: bounded(0.01, 100).optional(),
	/** Open stub of the feed line past the slot centre. */
	stubLengthMm: bounded(0, 1000).optional()
});

export const proximityOptionsSchema = z.strictObject({
	/** How far the feed line runs under the patch past its edge; default half the patch length (to the centre). */
	overlapMm: bounded(0, 1000).optional()
});

export const parasiticOptionsSchema = z.strictObject({
	/** Parasitic patch size over the driven patch's, both sides scaled alike. */
	sizeRatio: bounded(0.8, 1.3).default(1.07)
});

const axisCount = bounded(1, MAX_ARRAY_AXIS_COUNT).refine(Number.isInteger, { error: `must be a whole number; allowed range [1, ${MAX_ARRAY_AXIS_COUNT}]` });

export const arrayOptionsSchema = z.strictObject({
	/** Elements along x (the patch width direction). A power of two for the corporate feed. */
	columns: axisCount,
	/** Elements along y (the feed direction). A power of two for the corporate feed. */
	rows: axisCount.default(1),
	/** Element pitch along x in free-space wavelengths λ0. */
	spacingXWavelengths: bounded(0.3, 2).default(0.7),
	/** Element pitch along y in free-space wavelengths λ0. */
	spacingYWavelengths: bounded(0.3, 2).default(0.7),
	/** Largest scan angle from broadside the array must reach (any plane); the pattern is steered to it in the x–z plane. */
	scanAngleDeg: bounded(0, 80).default(0)
});

/**
 * Explicit dimensions the sizing uses instead of its formulas (what Homing writes after a full-wave
 * study, or a designer after measuring). Each is honoured as given; the derived values and warnings
 * then describe the overridden patch, and the formula's own value stays visible beside it.
 */
export const dimensionOverridesSchema = z.strictObject({
	/** Resonant length of a rectangular patch (y, the feed's direction). */
	lengthMm: bounded(0.1, 2000).optional(),
	/** Width of a rectangular patch (x). */
	widthMm: bounded(0.1, 2000).optional(),
	/** Physical radius of a circular patch. */
	radiusMm: bounded(0.05, 1000).optional(),
	/** Inset notch depth y0 from the radiating edge (feed "inset"). */
	insetDepthMm: bounded(0, 1000).optional(),
	/** Probe distance from the patch centre along the feed axis (feed "probe"). */
	probeOffsetMm: bounded(0, 1000).optional(),
	/** Characteristic impedance of the λg/4 section (feed "quarter-wave"); its width and λg/4 length follow from it. */
	transformerImpedanceOhm: bounded(10, 300).optional()
});
export type DimensionOverrides = z.infer<typeof dimensionOverridesSchema>;

const isPowerOfTwo = (n: number) => Number.isInteger(n) && n >= 1 && (n & (n - 1)) === 0;

/**
 * The band the antenna must serve, e.g. 5.725–5.875 GHz. Optional; when given, sizing warns if the
 * design's usable band (a CP patch: where AR ≤ 3 dB and VSWR ≤ 2 overlap; otherwise the VSWR ≤ 2
 * band) does not hold all of it.
 */
export const bandToCoverSchema = z.strictObject({
	/** Lower edge of the band to cover. */
	lowerHz: bounded(100e6, 100e9),
	/** Upper edge of the band to cover; above lowerHz. */
	upperHz: bounded(100e6, 100e9)
});
export type BandToCover = z.infer<typeof bandToCoverSchema>;

/**
 * How the top solder mask meets the radiating copper: "exposed" opens the mask over all top copper (the patch
 * stays bare, as the sizing assumes); "covered" leaves the patch and its feed under the mask and tells the sizing,
 * which then sizes the patch on the covered εeff (see rf/mask-cover.ts). Absent: exposed (what a revision stored
 * before the choice existed always meant).
 */
export const maskCoverages = ['exposed', 'covered'] as const;
export type MaskCoverage = (typeof maskCoverages)[number];

/** The mask's dielectric over covered copper; each absent value takes rf/mask-cover.ts's stated default. */
export const maskCoverSchema = z.strictObject({
	/** εr of the cured mask; absent: 3.8 (common practice, no source: liquid photoimageable masks state 3.5–4.2). */
	relativePermittivity: bounded(1, 10, { exclusiveMin: true }).optional(),
	/** Mask thickness over the copper; absent: 20 µm (common practice, no source: 10–30 µm over copper). */
	thicknessUm: bounded(1, 200).optional()
});
export type MaskCover = z.infer<typeof maskCoverSchema>;

/**
 * Characters the legend's stroke font draws (artwork/stroke-font.ts): capital letters, digits, space and a few
 * signs. Legend text is upper-cased and accents are dropped; other characters in the design name are left out.
 */
export const LEGEND_CHARACTERS = 'ABCDEFGHIJKLMNOPQRSTUVWXYZ0123456789 -./+:#()';

/** Legend text as the stroke font draws it: upper case, accents dropped, other characters removed, spaces collapsed. */
export function toLegendText(text: string): string {
	const upper = text.normalize('NFKD').replace(/[\u0300-\u036f]/g, '').toUpperCase();
	return [...upper]
		.map((c) => (LEGEND_CHARACTERS.includes(c) ? c : ' '))
		.join('')
		.replace(/\s+/g, ' ')
		.trim();
}

/** The legend (silkscreen) on the top side: the design name, revision and date, feed and polarisation marks, an order text. */
export const legendOptionsSchema = z.strictObject({
	/** A short line for the board house (e.g. "FR4 1.6MM ENIG"); absent: copper count and board thickness. */
	orderText: z
		.string()
		.trim()
		.min(1, { error: 'must not be empty' })
		.max(32, { error: 'at most 32 characters' })
		.refine((t) => [...t.toUpperCase()].every((c) => LEGEND_CHARACTERS.includes(c)), { error: `letters, digits, spaces and ${LEGEND_CHARACTERS.slice(37)} only (the legend font)` })
		.optional()
});
export type LegendOptions = z.infer<typeof legendOptionsSchema>;

/** Most mounting holes one design takes. */
export const MAX_MOUNTING_HOLES = 8;

/** A non-plated mounting hole the user places, board origin at its lower-left corner (x right, y up). */
export const mountingHoleSchema = z.strictObject({
	xMm: bounded(0, 2000),
	yMm: bounded(0, 2000),
	/** Finished hole diameter (M2 screw: 2.2 mm, M3: 3.2 mm). */
	diameterMm: bounded(0.5, 10)
});
export type MountingHole = z.infer<typeof mountingHoleSchema>;

/** A design's name: shown in every file of its exports (titles, comments, the fab notes). */
export const designNameSchema = z.string().trim().min(1, { error: 'must not be empty' }).max(120, { error: 'at most 120 characters' }).superRefine(plainText('name'));

/**
 * Every field the document may hold, in the order a parsed document lists them (writers that print the document keep
 * that order): the shared fields and every feed's option object. It is the document's published outline (JSON Schema,
 * OpenAPI), what old documents look like; the parser is designInputSchema, one branch of it per feed kind. A new
 * optional field shared by every feed goes here and reaches every branch.
 */
export const designInputOutline = z.strictObject({
	schemaVersion: z.literal(1).default(1),
	name: designNameSchema.default('Untitled patch'),
	/** Target resonant frequency f0. */
	frequencyHz: bounded(100e6, 100e9),
	shape: z.enum(patchShapes).default('rectangular'),
	feed: z.enum(allFeedKinds).default('inset'),
	substrate: substrateSchema,
	/** The laminate that is bought, when it is named or the substrate's εr is a fitted value (see orderedLaminateSchema). */
	laminate: orderedLaminateSchema.optional(),
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
	/** Add solder-mask layers to the exports. A document without the key has none (new designs from the editor start with them on). */
	solderMask: z.boolean().default(false),
	/** With solder mask: the patch bare under an opening or covered (see maskCoverages); absent: exposed. */
	maskCoverage: z.enum(maskCoverages).optional(),
	/** The mask's εr and thickness over covered copper (maskCoverage "covered" only). */
	maskCover: maskCoverSchema.optional(),
	/** A top legend layer (see legendOptionsSchema); absent: none. */
	legend: legendOptionsSchema.optional(),
	/** Non-plated mounting holes (see mountingHoleSchema); absent: none. */
	mountingHoles: z.array(mountingHoleSchema).max(MAX_MOUNTING_HOLES, { error: `at most ${MAX_MOUNTING_HOLES} mounting holes` }).optional(),
	/** Explicit stack, top to bottom; absent: copper / substrate / copper. With a stack, its dielectrics' εr, tanδ and h are used instead of the substrate's. */
	stack: layerStackSchema.optional(),
	/** Aperture-coupled starting sizes (feed "aperture-coupled"). */
	slot: slotOptionsSchema.optional(),
	/** Proximity-coupled starting overlap (feed "proximity-coupled"). */
	proximity: proximityOptionsSchema.optional(),
	/** A parasitic patch on the top copper over the driven patch (needs a three-copper stack). */
	parasitic: parasiticOptionsSchema.optional(),
	/** Repeat the element as a 1×N or N×M array with a corporate feed. */
	array: arrayOptionsSchema.optional(),
	/** Explicit dimensions that replace the sizing formulas' values (see dimensionOverridesSchema). */
	overrides: dimensionOverridesSchema.optional(),
	/** The band the antenna must serve (see bandToCoverSchema); absent: none stated. */
	bandToCover: bandToCoverSchema.optional(),
	/** The connector launch footprint (see launchSchema in ./launch); absent: none, the artwork as before. */
	launch: launchSchema.optional()
});

/** The option object each feed kind carries in the document (none for the edge and quarter-wave feeds). */
export const feedOptionKeys = {
	inset: 'inset',
	probe: 'probe',
	edge: undefined,
	'quarter-wave': undefined,
	'aperture-coupled': 'slot',
	'proximity-coupled': 'proximity'
} as const satisfies Record<FeedKind, FeedOptionKey | undefined>;
export type FeedOptionKey = 'inset' | 'probe' | 'slot' | 'proximity';
const allFeedOptionKeys: readonly FeedOptionKey[] = ['inset', 'probe', 'slot', 'proximity'];

/** The fields every branch shares: the outline without the feed option objects (feed keeps its place). */
const sharedFields = designInputOutline.omit({ inset: true, probe: true, slot: true, proximity: true });

// One branch per feed kind, each with only its own option object. Built by omitting the others from the outline so the
// parsed document keeps the outline's key order.
const insetBranch = designInputOutline.omit({ probe: true, slot: true, proximity: true }).extend({ feed: z.literal('inset').default('inset') });
const probeBranch = designInputOutline.omit({ inset: true, slot: true, proximity: true }).extend({ feed: z.literal('probe') });
const edgeBranch = sharedFields.extend({ feed: z.literal('edge') });
const quarterWaveBranch = sharedFields.extend({ feed: z.literal('quarter-wave') });
const apertureCoupledBranch = designInputOutline.omit({ inset: true, probe: true, proximity: true }).extend({ feed: z.literal('aperture-coupled') });
const proximityCoupledBranch = designInputOutline.omit({ inset: true, probe: true, slot: true }).extend({ feed: z.literal('proximity-coupled') });

const feedError = `must be one of: ${allFeedKinds.join(', ')}`;
const feedBranches = z.discriminatedUnion('feed', [insetBranch, probeBranch, edgeBranch, quarterWaveBranch, apertureCoupledBranch, proximityCoupledBranch], {
	error: (iss) => (iss.code === 'invalid_union' && iss.path?.[0] === 'feed' ? feedError : undefined)
});

/**
 * The parse-time upgrade of documents written before the input was a union on its feed: every parsed document then
 * carried an inset and a probe option object whatever its feed (their defaults were filled in), and stored revisions,
 * CLI files and API clients still send them. The option object of another feed is dropped, so such a document parses
 * as before. A slot or proximity object on another feed was never accepted and is still refused, by name.
 */
export function upgradeFeedOptions(raw: unknown, ctx?: z.core.$RefinementCtx<unknown>): unknown {
	if (!raw || typeof raw !== 'object' || Array.isArray(raw)) return raw;
	const doc = raw as Record<string, unknown>;
	const feed = doc.feed === undefined ? 'inset' : doc.feed;
	if (!(allFeedKinds as readonly unknown[]).includes(feed)) return raw;
	const own: FeedOptionKey | undefined = feedOptionKeys[feed as FeedKind];
	const out = { ...doc };
	for (const key of allFeedOptionKeys) {
		if (key === own || out[key] === undefined) continue;
		if (key === 'slot' || key === 'proximity') {
			const owner = key === 'slot' ? 'an aperture-coupled' : 'a proximity-coupled';
			ctx?.addIssue({ code: 'custom', path: [key], input: out[key], message: `only ${owner} feed takes ${key} options` });
		}
		delete out[key];
	}
	return out;
}

export const designInputSchema = z.preprocess(upgradeFeedOptions, feedBranches).superRefine((d, ctx) => {
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
	const feedsForShape = [...allowedFeeds[d.shape], ...allowedLayeredFeeds[d.shape]];
	if (!feedsForShape.includes(d.feed)) {
		ctx.addIssue({
			code: 'custom',
			path: ['feed'],
			input: d.feed,
			message: `a ${d.shape} patch takes one of: ${feedsForShape.join(', ')}`
		});
	}
	layeredRules(d, ctx);
	overrideRules(d, ctx);
	const misfit = launchMisfit(d.launch, d.feed, copperLayerCountOf(d));
	if (misfit) ctx.addIssue({ code: 'custom', path: ['launch', 'kind'], input: d.launch?.kind, message: misfit });
	boardFinishRules(d, ctx);
	if (d.bandToCover && !(d.bandToCover.upperHz > d.bandToCover.lowerHz)) {
		ctx.addIssue({ code: 'custom', path: ['bandToCover', 'upperHz'], input: d.bandToCover.upperHz, message: `must be above bandToCover.lowerHz (${d.bandToCover.lowerHz})` });
	}
	if (d.feed === 'probe' && d.probe.clearanceDiameterMm <= d.probe.drillDiameterMm) {
		ctx.addIssue({
			code: 'custom',
			path: ['probe', 'clearanceDiameterMm'],
			input: d.probe.clearanceDiameterMm,
			message: `must be larger than probe.drillDiameterMm (${d.probe.drillDiameterMm})`
		});
	}
});

/**
 * The parser described by the outline's JSON Schema (input side), for documents generated from the zod schemas (the
 * OpenAPI document): JSON Schema cannot state the parse-time upgrade and the union behind it, and the outline is the
 * document's public shape, the same before and after the input became a union on its feed.
 */
export const documentedDesignInputSchema = designInputSchema.meta(outlineJsonSchema());

function outlineJsonSchema(): Record<string, unknown> {
	const json: Record<string, unknown> = z.toJSONSchema(designInputOutline, { target: 'draft-2020-12', io: 'input' });
	delete json.$schema;
	return json;
}

/** The document as written by a user (defaults may be missing; the outline, so an option object of another feed is let in and dropped). */
export type DesignInputDocument = z.input<typeof designInputOutline>;
/** The document after validation: every default filled in. */
export type DesignInput = z.output<typeof designInputSchema>;

type ParsedDocument = z.output<typeof feedBranches>;
/** What every feed kind's document holds: a validated document without its feed's option object. */
export type SharedDesignFields = z.output<typeof sharedFields>;

/** The document without its feed's option object: the start of the same design on another feed. */
export function sharedFieldsOf(d: DesignInput): SharedDesignFields {
	const shared: SharedDesignFields & Partial<Record<FeedOptionKey, unknown>> = { ...d };
	const own = feedOptionKeys[d.feed];
	if (own !== undefined) delete shared[own];
	return shared;
}
type RefineContext = z.core.$RefinementCtx<ParsedDocument>;

/** How many copper layers a document's feed and parasitic patch need. */
export function requiredCopperCount(d: Pick<ParsedDocument, 'feed' | 'parasitic'>): number {
	return (layeredFeedKinds as readonly string[]).includes(d.feed) || d.parasitic ? 3 : 2;
}

/** How many copper layers a validated document's board has: its explicit stack's, else what its feed needs. */
export function copperLayerCountOf(d: Pick<ParsedDocument, 'feed' | 'parasitic' | 'stack'>): number {
	return d.stack ? d.stack.filter((l) => l.kind === 'copper').length : requiredCopperCount(d);
}

/** Mask coverage needs the mask; a covered mask is sized for one single-layer element only. */
function boardFinishRules(d: ParsedDocument, ctx: RefineContext): void {
	if (d.maskCoverage !== undefined && !d.solderMask) ctx.addIssue({ code: 'custom', path: ['maskCoverage'], input: d.maskCoverage, message: 'needs solderMask: true' });
	if (d.maskCover !== undefined && d.maskCoverage !== 'covered') ctx.addIssue({ code: 'custom', path: ['maskCover'], input: d.maskCover, message: 'only maskCoverage "covered" takes a mask cover' });
	if (d.maskCoverage === 'covered' && (d.array || d.parasitic || (layeredFeedKinds as readonly string[]).includes(d.feed))) {
		ctx.addIssue({ code: 'custom', path: ['maskCoverage'], input: d.maskCoverage, message: 'a covered patch is sized for one single-layer element only (no array, parasitic patch or layered feed); choose "exposed"' });
	}
}

/** Which overrides apply to which shapes and feeds. */
function overrideRules(d: ParsedDocument, ctx: RefineContext): void {
	const o = d.overrides;
	if (!o) return;
	const issue = (key: keyof DimensionOverrides, message: string) => ctx.addIssue({ code: 'custom', path: ['overrides', key], input: o[key], message });
	if (o.lengthMm !== undefined && d.shape !== 'rectangular') issue('lengthMm', 'only a rectangular patch takes a length override');
	if (o.widthMm !== undefined && d.shape !== 'rectangular') issue('widthMm', 'only a rectangular patch takes a width override');
	if (o.widthMm !== undefined && d.patchWidthMm !== undefined) issue('widthMm', 'give the width once: patchWidthMm or overrides.widthMm');
	if (o.radiusMm !== undefined && d.shape !== 'circular') issue('radiusMm', 'only a circular patch takes a radius override');
	if (o.insetDepthMm !== undefined && d.feed !== 'inset') issue('insetDepthMm', 'only an inset feed takes an inset depth override');
	if (o.probeOffsetMm !== undefined && d.feed !== 'probe') issue('probeOffsetMm', 'only a probe feed takes a probe offset override');
	if (o.transformerImpedanceOhm !== undefined && d.feed !== 'quarter-wave') issue('transformerImpedanceOhm', 'only a quarter-wave feed takes a transformer impedance override');
	if (o.probeOffsetMm !== undefined && d.shape === 'nearly-square') issue('probeOffsetMm', 'a nearly-square patch is fed on its diagonal; its probe offset cannot be overridden');
}

/** Rules of the stack, the layered feeds, the parasitic patch and the array. */
function layeredRules(d: ParsedDocument, ctx: RefineContext): void {
	const issue = (path: (string | number)[], input: unknown, message: string) => ctx.addIssue({ code: 'custom', path, input, message });
	const need = requiredCopperCount(d);
	if (d.stack) {
		const s = d.stack;
		if (s[0].kind !== 'copper') issue(['stack', 0, 'kind'], s[0].kind, 'the stack must start with copper (top to bottom)');
		if (s[s.length - 1].kind !== 'copper') issue(['stack', s.length - 1, 'kind'], s[s.length - 1].kind, 'the stack must end with copper (top to bottom)');
		s.forEach((layer, i) => {
			if (i > 0 && layer.kind === 'copper' && s[i - 1].kind === 'copper') issue(['stack', i], layer.kind, 'two copper layers need a dielectric between them');
		});
		const totalMm = s.reduce((a, l) => a + (l.kind === 'dielectric' ? l.heightMm : 0), 0);
		const quarterWaveMm = ((SPEED_OF_LIGHT_M_PER_S / d.frequencyHz) * 1000) / 4;
		if (totalMm >= quarterWaveMm) issue(['stack'], totalMm, `the dielectrics add up to ${totalMm.toFixed(3)} mm; they must stay under λ0/4 = ${quarterWaveMm.toFixed(3)} mm at this frequency; allowed range (0, ${quarterWaveMm.toFixed(3)})`);
		const coppers = s.filter((l) => l.kind === 'copper').length;
		if (coppers !== need) issue(['stack'], d.stack, `a ${d.feed} feed${d.parasitic ? ' with a parasitic patch' : ''} needs exactly ${need} copper layers; this stack has ${coppers}`);
	} else if (need === 3) {
		issue(['stack'], undefined, `required: a ${d.feed} feed${d.parasitic ? ' with a parasitic patch' : ''} needs a stack of 3 copper layers (copper, dielectric, copper, dielectric, copper)`);
	}
	if (d.parasitic && !['inset', 'edge', 'quarter-wave'].includes(d.feed)) {
		issue(['parasitic'], d.parasitic, 'a parasitic patch takes a driven patch fed by microstrip on the inner copper: feed inset, edge or quarter-wave');
	}
	if (d.array) {
		if (!microstripFeedKinds.includes(d.feed)) issue(['feed'], d.feed, `an array's corporate feed is microstrip; choose one of: ${microstripFeedKinds.join(', ')}`);
		for (const axis of ['columns', 'rows'] as const) {
			const n = d.array[axis];
			if (!isPowerOfTwo(n)) {
				const lower = 2 ** Math.floor(Math.log2(n));
				issue(['array', axis], n, `must be a power of two (1, 2, 4, … ${MAX_ARRAY_AXIS_COUNT}) for a corporate feed of equal T-junction splits; nearest: ${lower} or ${lower * 2}`);
			}
		}
	}
}
