// The connector launch a design asks for: an edge-launch footprint on the feed line's board edge, or a back-side footprint under a probe.
// Dimensions are the user's (no vendor part data); each default is stated with what it rests on.
import { z } from 'zod';

/** Launch kinds: none (as before), an edge launch at the feed line's board edge, a back-side footprint under the probe. */
export const launchKinds = ['none', 'edge', 'back'] as const;
export type LaunchKind = (typeof launchKinds)[number];
/** How a back-side connector's body meets the ground: soldered to a ground pad, or screwed through four plated flange holes. */
export const backMounts = ['pad', 'flange'] as const;
export type BackMount = (typeof backMounts)[number];

/** The feeds whose line reaches the board edge on the top copper (an array's network input included). */
export const edgeLaunchFeeds = ['inset', 'edge', 'quarter-wave'] as const;

function bounded(min: number, max: number, opts: { exclusiveMin?: boolean } = {}) {
	const range = `allowed range ${opts.exclusiveMin ? '(' : '['}${min}, ${max}]`;
	const n = z.number({ error: (iss) => (iss.input === undefined ? `required; ${range}` : `must be a finite number; ${range}`) });
	return (opts.exclusiveMin ? n.gt(min, { error: range }) : n.gte(min, { error: range })).lte(max, { error: range });
}

/** Edge-launch defaults (common practice, no source): sizes of a typical edge-mount coaxial footprint and a via fence on a 2-layer board. */
export const EDGE_LAUNCH_DEFAULTS = {
	lengthMm: 3,
	groundWidthMm: 2,
	viaDrillMm: 0.3,
	viaPitchMm: 1,
	viaRows: 1,
	viaInsetMm: 0.5
} as const;

/** Back-side footprint defaults (common practice, no source): a square solder pad, or a square four-hole flange. */
export const BACK_LAUNCH_DEFAULTS = {
	mount: 'pad',
	padSideMm: 6,
	flangeDrillMm: 2.7,
	flangeSpacingMm: 8.6
} as const;

export const edgeLaunchSchema = z.strictObject({
	kind: z.literal('edge'),
	/** How far the launch runs in from the board edge along the line (signal pad and ground pads alike). */
	lengthMm: bounded(0.2, 50).default(EDGE_LAUNCH_DEFAULTS.lengthMm),
	/** Width of each top ground pad beside the line (across the line). */
	groundWidthMm: bounded(0.2, 50).default(EDGE_LAUNCH_DEFAULTS.groundWidthMm),
	/** Copper-free gap between the line and each ground pad; absent: solved so the grounded-coplanar section keeps the line's Z0. */
	gapMm: bounded(0.01, 50).optional(),
	/** Finished hole of the plated vias tying the top ground pads to the bottom ground. */
	viaDrillMm: bounded(0.05, 5).default(EDGE_LAUNCH_DEFAULTS.viaDrillMm),
	/** Centre-to-centre step of the vias along the line, and between rows. */
	viaPitchMm: bounded(0.1, 20).default(EDGE_LAUNCH_DEFAULTS.viaPitchMm),
	/** Rows of vias in each ground pad, the first nearest the gap. */
	viaRows: bounded(1, 4).refine(Number.isInteger, { error: 'must be a whole number; allowed range [1, 4]' }).default(EDGE_LAUNCH_DEFAULTS.viaRows),
	/** From the ground pad's edge at the gap to the centres of the first row of vias. */
	viaInsetMm: bounded(0.05, 20).default(EDGE_LAUNCH_DEFAULTS.viaInsetMm)
});

export const backLaunchSchema = z.strictObject({
	kind: z.literal('back'),
	/** Solder pad or four plated flange holes (see backMounts). */
	mount: z.enum(backMounts).default(BACK_LAUNCH_DEFAULTS.mount),
	/** Side of the square ground pad on the bottom copper, centred on the pin (mount "pad"). */
	padSideMm: bounded(0.5, 50).default(BACK_LAUNCH_DEFAULTS.padSideMm),
	/** Finished hole of each plated flange hole (mount "flange"). */
	flangeDrillMm: bounded(0.1, 10).default(BACK_LAUNCH_DEFAULTS.flangeDrillMm),
	/** Centre-to-centre side of the square the four flange holes sit on, centred on the pin (mount "flange"). */
	flangeSpacingMm: bounded(0.5, 50).default(BACK_LAUNCH_DEFAULTS.flangeSpacingMm)
});

/**
 * The connector launch (see launchKinds). Absent or kind "none": no launch footprint, the artwork as
 * before. The ground clearance (anti-pad) around a probe's pin stays `probe.clearanceDiameterMm`.
 */
export const launchSchema = z.discriminatedUnion('kind', [z.strictObject({ kind: z.literal('none') }), edgeLaunchSchema, backLaunchSchema]);
export type LaunchInput = z.output<typeof launchSchema>;
export type EdgeLaunch = z.output<typeof edgeLaunchSchema>;
export type BackLaunch = z.output<typeof backLaunchSchema>;

/** Why a launch does not fit the design's feed (null when it does): the edge launch wants a microstrip line at the edge of a 2-copper board, the back one a probe. */
export function launchMisfit(launch: LaunchInput | undefined, feed: string, copperCount: number): string | null {
	if (!launch || launch.kind === 'none') return null;
	if (launch.kind === 'edge') {
		if (!(edgeLaunchFeeds as readonly string[]).includes(feed)) return `an edge launch needs a feed line that reaches the board edge: feed ${edgeLaunchFeeds.join(', ')}`;
		if (copperCount !== 2) return `an edge launch ties its top ground pads to the bottom ground: it needs a board of 2 copper layers (this one has ${copperCount})`;
		return null;
	}
	return feed === 'probe' ? null : 'a back-side launch sits under a probe: feed probe';
}
