// Base design + plan → sweep document: each point sized by rf.size and drawn by artwork.buildArtwork.
import { buildArtwork, type Artwork, type StackLayer } from '../../artwork';
import { GeometryError } from '../../geometry';
import { size, type SizedDesign } from '../../rf';
import { InputError, parseDesignInput, sharedFieldsOf, type DesignInput, type DesignInputDocument } from '../../schemas';
import { replaceControlCharacters } from '../../schemas/plain-text';
import { SOFTWARE_NAME, type ExportMeta } from '../export-meta';
import { SWEEP_FORMAT, SWEEP_FORMAT_VERSION, SWEEP_SCHEMA_PATH, type SweepDocument, type SweepPoint, type SweepProbeEntry } from './document';
import { axisValues, holdsGeometry, parseSweepPlan, type SweepPlan } from './plan';
import { solverSetupOf } from './solver-setup';

/** Shapes whose polarisation is circular: only they take a handedness. */
const CIRCULARLY_POLARISED = ['truncated-corner', 'nearly-square'];

/**
 * The design input with only what applies to its shape and feed: no handedness on a linearly polarised patch, no
 * probe sizes without a probe, no inset, slot or proximity options for another feed, no feed-line impedance without a
 * line. What is left sizes to the same design.
 */
export function applicableInput(input: DesignInput): DesignInputDocument {
	const { handedness, feedLineImpedanceOhm, ...rest } = sharedFieldsOf(input);
	const cp = CIRCULARLY_POLARISED.includes(input.shape) ? { handedness } : {};
	// the key order is the sweep file's: shared fields, the line impedance, the feed's options, handedness, slot/proximity
	switch (input.feed) {
		case 'inset':
			return { ...rest, feedLineImpedanceOhm, inset: input.inset, ...cp };
		case 'probe':
			return { ...rest, probe: input.probe, ...cp };
		case 'edge':
		case 'quarter-wave':
			return { ...rest, feedLineImpedanceOhm, ...cp };
		case 'aperture-coupled':
			return { ...rest, feedLineImpedanceOhm, ...cp, ...(input.slot ? { slot: input.slot } : {}) };
		case 'proximity-coupled':
			return { ...rest, feedLineImpedanceOhm, ...cp, ...(input.proximity ? { proximity: input.proximity } : {}) };
		default:
			return input satisfies never;
	}
}

/**
 * Throws InputError (path "plan.mode") when the plan holds the geometry of a patch whose geometry cannot be held:
 * truncated-corner and nearly-square patches take no dimension overrides. Saving a plan checks this too.
 */
export function checkPlanFitsDesign(base: Pick<DesignInput, 'shape'>, plan: Pick<SweepPlan, 'mode' | 'axes'>): void {
	if (!holdsGeometry(plan) || base.shape === 'rectangular' || base.shape === 'circular') return;
	throw new InputError([{ path: 'plan.mode', value: plan.mode ?? 'resize', message: `a ${base.shape} patch cannot hold its geometry (only rectangular and circular patches take dimension overrides); choose "re-size at each point" and no geometry axis` }]);
}

/**
 * The base with the revision's geometry written in as overrides (patch length and width or radius, inset depth or
 * probe offset) and its ground margin fixed, so a point that changes the material or one dimension keeps the rest.
 * What the base already states wins; the plan's axes are applied on top. Throws InputError for a patch whose
 * geometry cannot be held (truncated-corner and nearly-square patches take no overrides).
 */
function withHeldGeometry(base: DesignInput, plan: SweepPlan): DesignInput {
	checkPlanFitsDesign(base, plan);
	const sized = size(base);
	const patch = sized.patch as { lengthMm?: number; widthMm?: number; radiusMm?: number };
	const feed = sized.feed as { insetDepthMm?: number; offsetYMm?: number };
	const swept = new Set(plan.axes.map((a) => a.field));
	const held: Record<string, number> = {};
	if (base.shape === 'rectangular') {
		held.lengthMm = patch.lengthMm as number;
		if (base.patchWidthMm === undefined && !swept.has('patchWidthMm')) held.widthMm = patch.widthMm as number;
	} else held.radiusMm = patch.radiusMm as number;
	if (base.feed === 'inset' && feed.insetDepthMm !== undefined) held.insetDepthMm = feed.insetDepthMm;
	if (base.feed === 'probe' && feed.offsetYMm !== undefined) held.probeOffsetMm = feed.offsetYMm;
	return { ...base, groundMarginMm: base.groundMarginMm ?? sized.ground.marginMm, overrides: { ...held, ...base.overrides } };
}

/**
 * The stack bottom up (z increasing: the bottom copper at z = 0 first, the top copper last; the
 * artwork keeps it top to bottom), with the stated probe model appended so the simulation models
 * what will be built (no probe entry when none is stated).
 */
function sweepStack(artwork: Artwork): readonly (StackLayer | SweepProbeEntry)[] {
	const slabs = [...artwork.stack].sort((a, b) => a.zMm - b.zMm);
	const probe = artwork.metadata.probe;
	const hole = artwork.drills.find((d) => d.role === 'probe');
	if (!probe || !hole) return slabs;
	const bottomMm = slabs[0].zMm;
	const topMm = slabs.reduce((top, l) => Math.max(top, l.zMm + l.thicknessMm), -Infinity);
	const entry: SweepProbeEntry = { kind: 'probe', id: hole.id, ...probe, center: [hole.center[0], hole.center[1]], zMm: bottomMm, thicknessMm: topMm - bottomMm };
	return [...slabs, entry];
}

/** Every point's field values, in order: the last axis varies fastest on a grid. */
export function sweepCombinations(plan: SweepPlan): Record<string, number>[] {
	const axes = plan.axes.map((a) => ({ field: a.field, values: axisValues(a) }));
	if (plan.combine === 'zip') return axes[0].values.map((_, i) => Object.fromEntries(axes.map((a) => [a.field, a.values[i]])));
	let combos: Record<string, number>[] = [{}];
	for (const a of axes) combos = combos.flatMap((c) => a.values.map((v) => ({ ...c, [a.field]: v })));
	return combos;
}

function withField(doc: unknown, path: string, value: number): unknown {
	const copy = structuredClone(doc) as Record<string, unknown>;
	const keys = path.split('.');
	let node = copy;
	for (const k of keys.slice(0, -1)) {
		if (node[k] === undefined || node[k] === null || typeof node[k] !== 'object') node[k] = {};
		node = node[k] as Record<string, unknown>;
	}
	node[keys[keys.length - 1]] = value;
	return copy;
}

/**
 * A revision stored before names with control characters were refused still sweeps: its name (a label,
 * sized by nothing) has them replaced by spaces instead of failing the schema. New input is refused earlier.
 */
function withoutControlCharactersInName(raw: unknown): unknown {
	if (!raw || typeof raw !== 'object' || Array.isArray(raw)) return raw;
	const name = (raw as { name?: unknown }).name;
	return typeof name === 'string' ? { ...raw, name: replaceControlCharacters(name) } : raw;
}

/**
 * The design-input document of one point: the base (with the revision's geometry held when the plan says so) and
 * the point's field values written in. The browser's point preview and the sweep build use this one function.
 */
export function sweepPointInput(base: DesignInput, plan: SweepPlan, parameters: Record<string, number>): unknown {
	let doc: unknown = holdsGeometry(plan) ? withHeldGeometry(base, plan) : base;
	for (const [field, value] of Object.entries(parameters)) doc = withField(doc, field, value);
	return doc;
}

type KnownDesign = { readonly sized: SizedDesign; readonly artwork: Artwork };

/** One point of the sweep: sized and drawn, or refused with the reason (a bad point never stops the sweep). */
function sweepPoint(base: unknown, parameters: Record<string, number>, index: number, known?: KnownDesign): SweepPoint {
	let doc: unknown = base;
	for (const [field, value] of Object.entries(parameters)) doc = withField(doc, field, value);
	try {
		const sized = size(parseDesignInput(doc));
		// a point that is the known design itself (the one-point sweep of an export) reuses its artwork
		const artwork = known && JSON.stringify(sized) === JSON.stringify(known.sized) ? known.artwork : buildArtwork(sized);
		const { input: _input, warnings, ...derived } = sized;
		void _input;
		return {
			index,
			status: 'sized',
			parameters,
			derived,
			warnings: warnings.map((w) => ({ code: w.code, message: w.message })),
			board: artwork.board,
			layers: artwork.layers,
			drills: artwork.drills,
			stack: sweepStack(artwork),
			solverSetup: solverSetupOf(artwork, sized)
		};
	} catch (e) {
		if (e instanceof InputError) return { index, status: 'refused', parameters, error: { kind: 'input', path: e.first.path, message: e.first.message } };
		if (e instanceof GeometryError) return { index, status: 'refused', parameters, error: { kind: 'geometry', path: e.code, message: e.message } };
		throw e;
	}
}

/** The parsed base and plan, every point's parameters, and the document without its points. */
function startSweep(baseRaw: unknown, planRaw: unknown, meta: ExportMeta) {
	const base = parseDesignInput(withoutControlCharactersInName(baseRaw));
	const plan = parseSweepPlan(planRaw);
	const combinations = sweepCombinations(plan);
	const pointBase = holdsGeometry(plan) ? withHeldGeometry(base, plan) : base;
	const head: Omit<SweepDocument, 'points'> = {
		$schema: SWEEP_SCHEMA_PATH,
		format: SWEEP_FORMAT,
		formatVersion: SWEEP_FORMAT_VERSION,
		design: { name: meta.designName, slug: meta.designSlug, revision: meta.revisionLabel, revisionDate: meta.revisionDate, software: `${SOFTWARE_NAME} ${meta.softwareVersion}` },
		base: applicableInput(base),
		plan,
		pointCount: combinations.length
	};
	return { base: pointBase, combinations, head };
}

/**
 * Builds the sweep. Throws InputError for a bad base design or plan (including more than
 * MAX_SWEEP_POINTS points) before sizing anything; a point that sizing or geometry refuses is
 * recorded as refused, with the reason. `known` is a design already drawn: a point that sizes to exactly
 * it takes its artwork instead of drawing it again.
 */
export function buildSweepDocument(baseRaw: unknown, planRaw: unknown, meta: ExportMeta, known?: KnownDesign): SweepDocument {
	const { base, combinations, head } = startSweep(baseRaw, planRaw, meta);
	return { ...head, points: combinations.map((parameters, index) => sweepPoint(base, parameters, index, known)) };
}

/**
 * The bytes of `serializeSweep(buildSweepDocument(…))`, as text pieces made one point at a time, so a
 * 10 000-point file is written without ever holding all its points (or all its text) at once. Throws
 * InputError before the first piece, as buildSweepDocument does.
 */
export function* sweepTextPieces(baseRaw: unknown, planRaw: unknown, meta: ExportMeta): Generator<string, void, undefined> {
	const { base, combinations, head } = startSweep(baseRaw, planRaw, meta);
	// the document with an empty point list ends in `"points":[]}`; the points go between the brackets
	const shell = JSON.stringify({ ...head, points: [] });
	yield shell.slice(0, -2);
	for (let index = 0; index < combinations.length; index++) yield (index > 0 ? ',' : '') + JSON.stringify(sweepPoint(base, combinations[index], index));
	yield ']}\n';
}

/** Compact JSON with a final newline: the bytes of a .sweep.json file. */
export function serializeSweep(doc: SweepDocument): string {
	return JSON.stringify(doc) + '\n';
}
