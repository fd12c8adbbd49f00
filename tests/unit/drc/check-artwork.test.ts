// Each rule fires alone on an artwork that breaks it by 1 µm and stays quiet when nudged 1 µm inside.
import { describe, expect, it } from 'vitest';
import type { Artwork, ArtworkLayer } from '../../../src/lib/artwork';
import { checkArtwork, DRC_RULE_IDS, type DrcRuleId } from '../../../src/lib/drc';
import { LEGEND_DEFAULTS, STANDARD_QUICK_TURN_PROFILE as P } from '../../../src/lib/schemas/fab-profile';
import { BOARD_MM, craftArtwork, edgeFedArtwork, edgeLaunchedArtwork, insetFedArtwork, probeFedArtwork, rect, roundRegion, disc } from './crafted-artwork';

const UM = 1e-3;
const rulesOf = (a: Artwork) => checkArtwork(a, P).map((v) => v.ruleId);

interface RuleCase {
	rule: DrcRuleId;
	what: string;
	/** The artwork with its critical size set to `valueMm`. */
	build: (valueMm: number) => Artwork;
	limitMm: number;
	/** The measured value the violation must report for a given valueMm. */
	measured?: (valueMm: number) => number;
}

const cases: RuleCase[] = [
	// a feed line narrower than the minimum trace
	{ rule: 'trace-width', what: 'edge feed line width', build: (w) => edgeFedArtwork(w), limitMm: P.minTraceWidthMm },
	// a quarter-wave section narrower than the minimum trace, joined at both ends
	{
		rule: 'trace-width',
		what: 'transformer width between patch and feed line',
		build: (w) =>
			craftArtwork({
				top: [rect('patch', 'patch', 10, 15, 30, 35), rect('transformer', 'transformer', 20 - w / 2, 5, 20 + w / 2, 15), rect('feed-line', 'feed-line', 19, 0, 21, 5)]
			}),
		limitMm: P.minTraceWidthMm
	},
	// two separate copper features too close: segment to segment
	{
		rule: 'copper-spacing',
		what: 'gap from the patch to a separate strip',
		build: (g) => craftArtwork({ top: [...edgeFedArtwork().layers[0].shapes, rect('strip', 'patch', 30 + g, 15, 32, 35)] }),
		limitMm: P.minSpacingMm
	},
	// arc to segment: a circular patch next to a strip
	{
		rule: 'copper-spacing',
		what: 'gap from a circular patch (arcs) to a strip',
		build: (g) => craftArtwork({ top: [roundRegion('patch', 'patch', [20, 25], 8), rect('strip', 'patch', 28 + g, 20, 30, 30)] }),
		limitMm: P.minSpacingMm
	},
	// arc to arc: two round features
	{
		rule: 'copper-spacing',
		what: 'gap between two round patches (arcs)',
		build: (g) => craftArtwork({ top: [roundRegion('patch', 'patch', [14, 20], 5), roundRegion('second', 'patch', [24 + g, 20], 5)] }),
		limitMm: P.minSpacingMm
	},
	// circle to segment: a round pad near a strip
	{
		rule: 'copper-spacing',
		what: 'gap from a flashed pad to a strip',
		build: (g) => craftArtwork({ top: [disc('probe-pad', 'probe-pad', [20, 20], 2), rect('strip', 'patch', 21 + g, 10, 25, 30)] }),
		limitMm: P.minSpacingMm
	},
	// a hole smaller than the smallest drill
	{ rule: 'drill-size', what: 'drill diameter', build: (d) => probeFedArtwork({ drillMm: d, padMm: d + 0.5, clearanceMm: d + 1 }), limitMm: P.minDrillMm },
	// a pad ring thinner than the minimum annular ring
	{ rule: 'annular-ring', what: 'probe pad ring', build: (r) => probeFedArtwork({ drillMm: 1.3, padMm: 1.3 + 2 * r, clearanceMm: 4.1 }), limitMm: P.minAnnularRingMm },
	// a ground clearance leaving less than the minimum spacing around the hole
	{ rule: 'annular-ring', what: 'ground clearance ring', build: (r) => probeFedArtwork({ drillMm: 1.3, padMm: 1.8, clearanceMm: 1.3 + 2 * r }), limitMm: P.minSpacingMm },
	// copper too near the left board edge
	{ rule: 'edge-clearance', what: 'patch to the left edge', build: (x) => edgeFedArtwork(2, x), limitMm: P.copperToEdgeMm },
	// an arc's extreme point too near the top edge
	{
		rule: 'edge-clearance',
		what: 'circular patch (arcs) to the top edge',
		build: (g) => craftArtwork({ top: [roundRegion('patch', 'patch', [20, BOARD_MM - 8 - g], 8), rect('feed-line', 'feed-line', 19, 0, 21, BOARD_MM - 16 - g + 0.01)] }),
		limitMm: P.copperToEdgeMm
	},
	// a ground plane pulled back from the edge, but not far enough
	{
		rule: 'edge-clearance',
		what: 'ground pulled back from the edge',
		build: (g) => craftArtwork({ top: edgeFedArtwork().layers[0].shapes.slice(), bottom: [rect('ground', 'ground', g, g, BOARD_MM - g, BOARD_MM - g)] }),
		limitMm: P.copperToEdgeMm
	},
	// an inset notch gap narrower than the minimum slot
	{ rule: 'slot-width', what: 'inset notch gap', build: (g) => insetFedArtwork(g), limitMm: P.minSlotWidthMm },
	// an edge launch's ground pads too near the line (left pad 16.5..18.5 − g, line 19..21; common practice, no source: the profile's minimum space)
	{ rule: 'launch-gap', what: 'launch ground pad gap to the line', build: (g) => edgeLaunchedArtwork({ gapMm: g }), limitMm: P.minSpacingMm },
	// a 0.4 mm launch via whose wall comes within c of the bottom board edge
	{ rule: 'launch-via-edge', what: 'launch via wall to the board edge', build: (c) => edgeLaunchedArtwork({ vias: [{ center: [17.5, 0.2 + c] }] }), limitMm: P.copperToEdgeMm },
	// two 0.4 mm launch vias whose walls are s apart
	{ rule: 'launch-via-spacing', what: 'web between two launch vias', build: (s) => edgeLaunchedArtwork({ vias: [{ center: [17.5, 1] }, { center: [17.5, 1.4 + s] }] }), limitMm: P.minSpacingMm },
	// a 0.4 mm launch via leaving a ring of a to the left pad's outer edge (x = 16.5)
	{ rule: 'launch-annular-ring', what: 'launch via ring to its pad edge', build: (a) => edgeLaunchedArtwork({ vias: [{ center: [16.5 + 0.2 + a, 1.5] }] }), limitMm: P.minAnnularRingMm },
	// a legend line thinner than the least the profile prints (defaults: common practice, no source)
	{ rule: 'legend-width', what: 'legend line width', build: (w) => withLegendStroke(edgeFedArtwork(), [[2, 30], [6, 30]], w), limitMm: LEGEND_DEFAULTS.minLegendWidthMm },
	// legend ink too near the left board edge: the pen's edge, not its centre line, is measured
	{ rule: 'legend-edge', what: 'legend ink to the left edge', build: (g) => withLegendStroke(edgeFedArtwork(), [[g + 0.1, 30], [g + 4, 30]], 0.2), limitMm: LEGEND_DEFAULTS.legendToEdgeMm },
	// legend ink too near bare copper (no mask: the whole top copper is an opening)
	{ rule: 'legend-clearance', what: 'legend ink to the patch', build: (g) => withLegendStroke(edgeFedArtwork(), [[10 - g - 0.1, 20], [10 - g - 0.1, 25]], 0.2), limitMm: LEGEND_DEFAULTS.legendToOpeningMm },
	// a mounting hole inside the patch's near-field keep-out (8 mm stated in the artwork)
	{ rule: 'hole-keep-out', what: 'mounting hole wall to the patch', build: (g) => withMountingHole(edgeFedArtwork(), [10 - g - 1, 25], 2, 8), limitMm: 8 },
	// a mounting hole too near other copper: a drilled edge keeps the copper-to-edge distance
	{ rule: 'hole-keep-out', what: 'mounting hole wall to the feed line', build: (g) => withMountingHole(edgeFedArtwork(), [21 + g + 0.5, 5], 1, 8), limitMm: P.copperToEdgeMm }
];

/** The artwork with a top legend layer holding one stroke. */
function withLegendStroke(a: Artwork, points: [number, number][], widthMm: number): Artwork {
	const legend: ArtworkLayer = {
		id: 'legend-top',
		title: 'Top legend',
		function: { kind: 'legend', side: 'top' },
		shapes: [{ id: 'legend-mark', role: 'legend', polarity: 'dark', geometry: { kind: 'stroke', points, strokeWidthMm: widthMm } }],
		voids: []
	};
	return { ...a, layers: [...a.layers, legend] };
}

/** The artwork with one non-plated mounting hole and the keep-out it states. */
function withMountingHole(a: Artwork, center: [number, number], diameterMm: number, keepOutMm: number): Artwork {
	return {
		...a,
		drills: [...a.drills, { id: 'mounting-hole-1', role: 'mounting', plated: false, center, diameterMm, fromCopper: 1, toCopper: 2 }],
		metadata: { ...a.metadata, mountingHoleKeepOutMm: keepOutMm }
	};
}

describe('checkArtwork, one rule at a time', () => {
	it('covers every rule with at least one crafted case', () => {
		// stack-build judges the stack against the profile's process, not a length: tests/unit/drc/check-stack-build.test.ts;
		// launch-outside-board's copper off the board is also edge-clearance's, so it is judged alone: tests/unit/drc/check-launch.test.ts
		expect([...new Set(cases.map((c) => c.rule))].sort()).toEqual(DRC_RULE_IDS.filter((r) => r !== 'stack-build' && r !== 'launch-outside-board').sort());
	});

	it.each(cases)('$rule fires alone when the $what is 1 µm under the limit', ({ rule, build, limitMm }) => {
		const violations = checkArtwork(build(limitMm - UM), P);
		expect(violations.length).toBeGreaterThan(0);
		expect(new Set(violations.map((v) => v.ruleId))).toEqual(new Set([rule]));
		for (const v of violations) {
			expect(v.measuredMm).toBeCloseTo(limitMm - UM, 6);
			expect(v.requiredMm).toBe(limitMm);
			expect(v.shapeIds.length).toBeGreaterThan(0);
			expect(v.message).toContain(String(limitMm));
		}
	});

	it.each(cases)('$rule passes when the $what is 1 µm over the limit', ({ build, limitMm }) => {
		expect(checkArtwork(build(limitMm + UM), P)).toEqual([]);
	});
});

describe('checkArtwork details', () => {
	it('names both shapes and puts the marker halfway across the gap', () => {
		const a = craftArtwork({ top: [...edgeFedArtwork().layers[0].shapes, rect('strip', 'patch', 30.1, 15, 32, 35)] });
		const [v] = checkArtwork(a, P);
		expect(v).toMatchObject({ ruleId: 'copper-spacing', layerId: 'copper-top', shapeIds: ['patch', 'strip'], measuredMm: 0.1 });
		expect(v.location.xMm).toBeCloseTo(30.05, 9);
		expect(v.location.yMm).toBeGreaterThanOrEqual(15);
		expect(v.location.yMm).toBeLessThanOrEqual(35);
	});

	it('measures a feed line across, not along: a stub shorter than the minimum trace is still its width', () => {
		// a 2 mm wide, 0.1 mm long transformer between a feed line and the patch
		const a = craftArtwork({
			top: [rect('patch', 'patch', 10, 5.1, 30, 25), rect('transformer', 'transformer', 19, 5, 21, 5.1), rect('feed-line', 'feed-line', 19.5, 0, 20.5, 5)]
		});
		expect(checkArtwork(a, P)).toEqual([]);
	});

	it('lets the feed line and a full-board ground run flush to the edge, but not other copper', () => {
		expect(rulesOf(edgeFedArtwork())).toEqual([]);
		const flushPatch = craftArtwork({ top: [rect('patch', 'patch', 0, 15, 30, 35), rect('feed-line', 'feed-line', 19, 0, 21, 15)] });
		const [v] = checkArtwork(flushPatch, P);
		expect(v).toMatchObject({ ruleId: 'edge-clearance', shapeIds: ['patch'], measuredMm: 0 });
	});

	it('reports copper past the edge with a negative clearance', () => {
		const a = craftArtwork({ top: [rect('patch', 'patch', -0.5, 15, 30, 35), rect('feed-line', 'feed-line', 19, 0, 21, 15)] });
		const [v] = checkArtwork(a, P);
		expect(v).toMatchObject({ ruleId: 'edge-clearance', measuredMm: -0.5 });
		expect(v.message).toMatch(/past the left board edge/);
	});

	it('treats a pad inside the patch as the same copper, not as a spacing problem', () => {
		expect(checkArtwork(probeFedArtwork({ drillMm: 1.3, padMm: 1.8, clearanceMm: 4.1 }), P)).toEqual([]);
	});

	it('reports a drill bigger than its pad as a negative ring', () => {
		const v = checkArtwork(probeFedArtwork({ drillMm: 1.3, padMm: 1.1, clearanceMm: 4.1 }), P);
		expect(v.map((x) => [x.ruleId, x.measuredMm])).toEqual([['annular-ring', -0.1]]);
	});

	it('returns the same list for the same artwork (deterministic order)', () => {
		const a = craftArtwork({ top: [rect('patch', 'patch', 0.1, 15, 30, 35), rect('feed-line', 'feed-line', 19.95, 0, 20.05, 15), rect('strip', 'patch', 30.05, 15, 32, 35)] });
		const first = checkArtwork(a, P);
		expect(first.map((v) => v.ruleId)).toEqual(['trace-width', 'copper-spacing', 'edge-clearance']);
		expect(checkArtwork(a, P)).toEqual(first);
	});
});
