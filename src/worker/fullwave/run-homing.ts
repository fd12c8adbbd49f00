// Homing: secant steps on the resonant dimension, then on the feed, each step one Field check.
import { size } from '../../lib/rf';
import type { SizedDesign } from '../../lib/rf/sized-design';
import type { FieldCheckOptions, FieldCheckResult, HomingIteration, HomingParameter, HomingResult } from '../../lib/schemas/field-check';
import { InputError, parseDesignInput, type DesignInput, type DimensionOverrides } from '../../lib/schemas';
import { cosineModelStep, feedPointResistance, nextTransformerImpedance, secant, transformerStep, type FeedKey } from './homing-steps';
import { runFieldCheck, type FieldCheckContext } from './run-field-check';

/** Resonance within this fraction of the target ends the first phase. */
export const RESONANCE_TOLERANCE_FRACTION = 0.003;
/** S11 at the target at or below this ends the second phase, dB. */
export const MATCH_GOAL_DB = -20;
/** Most simulations one study runs. */
export const MAX_HOMING_SIMULATIONS = 8;
/** Simulations kept back for the feed when the design has a feed Homing can move. */
const FEED_RESERVE = 3;
/** Largest relative change of a dimension in one step (keeps a poor secant from leaving the design). */
const MAX_STEP_FRACTION = 0.15;

type ResonantKey = 'lengthMm' | 'radiusMm';

interface Trial {
	overrides: DimensionOverrides;
	result: FieldCheckResult;
}

/** Largest relative change of the feed dimension in one step (a feed moves further than the patch). */
const MAX_FEED_STEP_FRACTION = 0.4;
const clampFeedStep = (from: number, to: number) => {
	const base = Math.max(from, 0.5);
	return Math.min(base * (1 + MAX_FEED_STEP_FRACTION), Math.max(base * (1 - MAX_FEED_STEP_FRACTION), to));
};
/** The bounds of overrides.transformerImpedanceOhm. */
const TRANSFORMER_MIN_OHM = 10;
const TRANSFORMER_MAX_OHM = 300;
const clampStep = (from: number, to: number) => Math.min(from * (1 + MAX_STEP_FRACTION), Math.max(from * (1 - MAX_STEP_FRACTION), to));

function resonantDimension(sized: SizedDesign): { key: ResonantKey; valueMm: number } {
	if (sized.patch.kind === 'rectangular') return { key: 'lengthMm', valueMm: sized.patch.lengthMm };
	if (sized.patch.kind === 'circular') return { key: 'radiusMm', valueMm: sized.patch.radiusMm };
	throw new InputError([{ path: 'shape', value: sized.shape, message: 'Homing moves the length of a rectangular patch or the radius of a circular one' }]);
}

function feedDimension(sized: SizedDesign): { key: FeedKey; valueMm: number } | null {
	const feed = sized.feed;
	switch (feed.kind) {
		case 'inset':
			return { key: 'insetDepthMm', valueMm: feed.insetDepthMm };
		case 'probe':
			return { key: 'probeOffsetMm', valueMm: Math.hypot(feed.offsetXMm, feed.offsetYMm) };
		case 'quarter-wave':
			return { key: 'transformerImpedanceOhm', valueMm: feed.transformer.impedanceOhm };
		case 'edge':
		case 'aperture-coupled':
		case 'proximity-coupled':
			return null; // no feed position to move
		default:
			return feed satisfies never;
	}
}

/**
 * Moves the resonant dimension (length or radius) until the simulated resonance is within 0.3 % of
 * the target, then the feed (inset depth, probe offset, a quarter-wave section's impedance) until S11 ≤ −20 dB at the target; at most 8
 * simulations. Returns the iterations and the tuned design-input document (its overrides set).
 * Feeds Homing cannot move (edge) stop after the first phase.
 */
export async function runHoming(input: unknown, options: Partial<FieldCheckOptions>, context: Omit<FieldCheckContext, 'workDir'> = {}): Promise<HomingResult> {
	const document: DesignInput = parseDesignInput(input);
	const first = size(document);
	const resonant = resonantDimension(first);
	const feed = feedDimension(first);
	const target = document.frequencyHz;
	const iterations: HomingIteration[] = [];
	const trials: Trial[] = [];

	const simulate = async (overrides: DimensionOverrides, parameter: HomingParameter, value: number): Promise<Trial> => {
		const n = trials.length + 1;
		const doc = { ...document, overrides: { ...document.overrides, ...overrides } };
		const result = await runFieldCheck(doc, options, {
			...context,
			onProgress: (p) => context.onProgress?.({ fraction: Math.min(1, (n - 1 + p.fraction) / MAX_HOMING_SIMULATIONS), message: `Homing step ${n}: ${p.message}`, simulation: n, ofSimulations: MAX_HOMING_SIMULATIONS })
		});
		const trial = { overrides: doc.overrides, result };
		trials.push(trial);
		iterations.push({ step: iterations.length + 1, parameter, value, resonanceHz: result.resonance?.frequencyHz ?? null, s11AtTargetDb: result.s11AtTargetDb, simulations: n });
		return trial;
	};

	// phase 1: the resonant dimension
	const phaseOneLimit = feed ? MAX_HOMING_SIMULATIONS - FEED_RESERVE : MAX_HOMING_SIMULATIONS;
	const startOverrides: DimensionOverrides = { [resonant.key]: resonant.valueMm, ...(feed ? { [feed.key]: feed.valueMm } : {}) };
	let current = await simulate(startOverrides, resonant.key, resonant.valueMm);
	const errorOf = (t: Trial) => (t.result.resonance ? (t.result.resonance.frequencyHz - target) / target : null);
	if (errorOf(current) === null) {
		return finish(false, 'no resonance inside the check band: the design is too far from its target for Homing', current);
	}
	let previous: Trial | null = null;
	while (Math.abs(errorOf(current)!) > RESONANCE_TOLERANCE_FRACTION && trials.length < phaseOneLimit) {
		const x1 = current.overrides[resonant.key]!;
		const e1 = errorOf(current)!;
		// f ∝ 1/size: the scaling step, and the secant once two points exist
		const scaled = x1 * (1 + e1);
		const pe = previous ? errorOf(previous) : null;
		const next = previous && pe !== null ? secant(previous.overrides[resonant.key]!, pe, x1, e1, scaled) : scaled;
		previous = current;
		const value = clampStep(x1, next);
		current = await simulate({ ...current.overrides, [resonant.key]: value }, resonant.key, value);
		if (errorOf(current) === null) return finish(false, 'the resonance left the check band while Homing moved the patch', bestBy(trials, (t) => Math.abs(errorOf(t) ?? 1)));
	}
	const tuned = bestBy(trials, (t) => Math.abs(errorOf(t) ?? 1));
	const resonanceOk = Math.abs(errorOf(tuned)!) <= RESONANCE_TOLERANCE_FRACTION;
	if (!feed) {
		return finish(resonanceOk, resonanceOk ? `resonance within ${(Math.abs(errorOf(tuned)!) * 100).toFixed(2)} % of the target; a ${document.feed} feed is not moved by Homing` : `resonance still ${(errorOf(tuned)! * 100).toFixed(2)} % from the target after ${trials.length} simulations`, tuned);
	}

	// phase 2: the feed, from the best resonant trial; each step also corrects the resonant
	// dimension by the scaling rule, since moving the feed pulls the resonance a little
	const zRef = tuned.result.referenceImpedanceOhm;
	const sizedAt = (t: Trial) => size(parseDesignInput({ ...document, overrides: t.overrides }));
	const mismatch = (t: Trial) => feedPointResistance(sizedAt(t), t.result) - zRef;
	const done = (t: Trial) => t.result.s11AtTargetDb <= MATCH_GOAL_DB && errorOf(t) !== null && Math.abs(errorOf(t)!) <= RESONANCE_TOLERANCE_FRACTION;
	let feedPrev: Trial | null = null;
	let feedCur = tuned;
	while (!done(feedCur) && trials.length < MAX_HOMING_SIMULATIONS) {
		const y1 = feedCur.overrides[feed.key]!;
		let value: number;
		if (feed.key === 'transformerImpedanceOhm') {
			// the section's impedance from the de-embedded patch edge, by the secant on the step's residual once two
			// trials exist (the bare step overshoots when the drawn section is not exactly λg/4), within 10–300 Ω
			const point = (t: Trial) => ({ impedanceOhm: t.overrides.transformerImpedanceOhm!, proposedOhm: transformerStep(sizedAt(t), t.result) });
			const next = nextTransformerImpedance(point(feedCur), feedPrev ? point(feedPrev) : null);
			value = Math.min(TRANSFORMER_MAX_OHM, Math.max(TRANSFORMER_MIN_OHM, clampFeedStep(y1, next)));
		} else {
			const m1 = mismatch(feedCur);
			const modelStep = cosineModelStep(sizedAt(feedCur), feed.key, y1, m1 + zRef, zRef);
			const next = feedPrev ? secant(feedPrev.overrides[feed.key]!, mismatch(feedPrev), y1, m1, modelStep) : modelStep;
			value = Math.max(0, clampFeedStep(y1, next));
		}
		feedPrev = feedCur;
		const x1 = feedCur.overrides[resonant.key]!;
		const e1 = errorOf(feedCur);
		const resonantValue = e1 !== null && Math.abs(e1) > RESONANCE_TOLERANCE_FRACTION ? clampStep(x1, x1 * (1 + e1)) : x1;
		const n = trials.length + 1;
		if (resonantValue !== x1) iterations.push({ step: iterations.length + 1, parameter: resonant.key, value: resonantValue, resonanceHz: null, s11AtTargetDb: feedCur.result.s11AtTargetDb, simulations: n });
		feedCur = await simulate({ ...feedCur.overrides, [feed.key]: value, [resonant.key]: resonantValue }, feed.key, value);
	}
	const feedTrials = trials.slice(trials.indexOf(tuned));
	const best = bestBy(feedTrials, (t) => t.result.s11AtTargetDb);
	const bestError = errorOf(best);
	const resonanceText = bestError === null ? 'no resonance in the band' : `resonance ${(bestError * 100).toFixed(2)} % from the target`;
	return finish(
		done(best),
		`${resonanceText} and S11 ${best.result.s11AtTargetDb.toFixed(1)} dB at the target${best.result.s11AtTargetDb <= MATCH_GOAL_DB ? '' : ` (goal ${MATCH_GOAL_DB} dB)`} after ${trials.length} simulations`,
		best
	);

	function finish(converged: boolean, stoppedBecause: string, chosen: Trial): HomingResult {
		return { converged, stoppedBecause, iterations, tunedInput: { ...document, overrides: chosen.overrides }, final: chosen.result };
	}
}

function bestBy(trials: readonly Trial[], score: (t: Trial) => number): Trial {
	return trials.reduce((best, t) => (score(t) < score(best) ? t : best), trials[0]);
}
