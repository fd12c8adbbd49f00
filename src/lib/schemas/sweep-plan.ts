// The sweep-plan FORM: what an editor types (rows of text, display units) and its conversion to a sweep-plan
// document. The document itself, its point count and its 10 000-point limit are formats/sweep/plan.ts: one schema per concept.
import { z } from 'zod';
import { plainText } from './plain-text';
import { lengthFormText, lengthSymbol, parseLengthMm, type LengthUnit } from '../units';

/**
 * What a material (or any input) change does to the geometry: `resize` sizes every point afresh (a laminate change
 * gives a re-designed patch); `hold-geometry` keeps the revision's patch, inset depth or probe offset and ground
 * margin and varies only the swept fields. A plan without a mode (every plan stored before it existed) means resize.
 */
export const sweepModes = ['resize', 'hold-geometry'] as const;
export type SweepMode = (typeof sweepModes)[number];

/** Rows the form offers (the document allows up to 6 axes; four cover every practical study). */
export const SWEEP_FORM_AXES = 4;

export interface SweepFieldChoice {
	/** Dotted design-input path (one of formats/sweep's sweepable fields). */
	field: string;
	label: string;
	/** Unit the form shows and the user types. */
	unit: string;
	/** Stored units per displayed unit (GHz → Hz: 1e9). */
	perUnit: number;
	/** What a change of it moves in the sized design. */
	moves: string;
}

/**
 * The fields an editor picks from. Inputs (frequency, laminate, impedances) move what sizing derives from them, or,
 * in hold-geometry mode, only the material; the geometry rows (patch length, width, radius, inset depth, probe offset)
 * set that dimension and always hold the rest of the revision's geometry.
 */
export const sweepFieldChoices: readonly SweepFieldChoice[] = [
	{ field: 'frequencyHz', label: 'Design frequency', unit: 'GHz', perUnit: 1e9, moves: 'patch length (and width)' },
	{ field: 'patchWidthMm', label: 'Patch width', unit: 'mm', perUnit: 1, moves: 'patch width held fixed (rectangular)' },
	{ field: 'substrate.relativePermittivity', label: 'Laminate εr', unit: '', perUnit: 1, moves: 'every dimension' },
	{ field: 'substrate.heightMm', label: 'Laminate thickness h', unit: 'mm', perUnit: 1, moves: 'every dimension, feed width' },
	{ field: 'targetImpedanceOhm', label: 'Feed-point resistance', unit: 'Ω', perUnit: 1, moves: 'inset depth or probe offset' },
	{ field: 'feedLineImpedanceOhm', label: 'Feed-line impedance', unit: 'Ω', perUnit: 1, moves: 'feed width' },
	{ field: 'inset.notchGapMm', label: 'Inset notch gap', unit: 'mm', perUnit: 1, moves: 'notch gap' },
	{ field: 'groundMarginMm', label: 'Ground margin', unit: 'mm', perUnit: 1, moves: 'board size' },
	{ field: 'probe.drillDiameterMm', label: 'Probe drill', unit: 'mm', perUnit: 1, moves: 'probe hole' },
	{ field: 'probe.clearanceDiameterMm', label: 'Probe anti-pad', unit: 'mm', perUnit: 1, moves: 'ground clearance' },
	{ field: 'substrate.lossTangent', label: 'Loss tangent tanδ', unit: '', perUnit: 1, moves: 'estimates only' },
	{ field: 'substrate.copperThicknessUm', label: 'Copper thickness', unit: 'µm', perUnit: 1, moves: 'feed width (slightly)' },
	{ field: 'overrides.lengthMm', label: 'Patch length L', unit: 'mm', perUnit: 1, moves: 'patch length only (rectangular)' },
	{ field: 'overrides.widthMm', label: 'Patch width W (geometry)', unit: 'mm', perUnit: 1, moves: 'patch width only (rectangular)' },
	{ field: 'overrides.radiusMm', label: 'Patch radius', unit: 'mm', perUnit: 1, moves: 'patch radius only (circular)' },
	{ field: 'overrides.insetDepthMm', label: 'Inset depth y0', unit: 'mm', perUnit: 1, moves: 'inset depth only (inset feed)' },
	{ field: 'overrides.probeOffsetMm', label: 'Probe offset', unit: 'mm', perUnit: 1, moves: 'probe position only (probe feed)' }
];

export function sweepFieldChoice(field: string): SweepFieldChoice | undefined {
	return sweepFieldChoices.find((c) => c.field === field);
}

/** Whether a field is a length (stored in mm): its from/to/step and values are read and shown in the person's length unit. */
export const isLengthSweepField = (field: string): boolean => sweepFieldChoice(field)?.unit === 'mm';

/** The unit a field's values are typed and shown in for a person who reads lengths in `lengthUnit` (mil for a length field). */
export function sweepFieldUnit(field: string, lengthUnit: LengthUnit = 'mm'): string {
	const c = sweepFieldChoice(field);
	if (!c) return '';
	return isLengthSweepField(field) ? lengthSymbol(lengthUnit) : c.unit;
}

/** A stored value as the person reads it: GHz for frequency, `lengthUnit` for a length field, six significant figures. */
export function sweepValueInUnit(field: string, stored: number, lengthUnit: LengthUnit = 'mm'): number {
	if (isLengthSweepField(field)) return Number(Number(lengthFormText(stored, lengthUnit)).toPrecision(6));
	return Number((stored / (sweepFieldChoice(field)?.perUnit ?? 1)).toPrecision(6));
}

const text = (max: number) => z.string().max(max, { error: `at most ${max} characters` }).default('');

export const sweepAxisDraftSchema = z.object({
	/** '' = row unused. */
	field: text(60),
	mode: z.enum(['range', 'list']).default('range'),
	from: text(40),
	to: text(40),
	step: text(40),
	/** Comma- or space-separated. */
	values: text(20_000)
});

export const sweepPlanDraftSchema = z.object({
	name: z.string().trim().min(1, { error: 'give the plan a name' }).max(80, { error: 'at most 80 characters' }).superRefine(plainText('name')),
	combine: z.enum(['grid', 'zip']).default('grid'),
	mode: z.enum(sweepModes).default('resize'),
	axes: z.array(sweepAxisDraftSchema).max(SWEEP_FORM_AXES)
});
export type SweepPlanDraft = z.output<typeof sweepPlanDraftSchema>;
export type SweepAxisDraft = z.output<typeof sweepAxisDraftSchema>;

export function emptyAxisDraft(field = ''): SweepAxisDraft {
	return { field, mode: 'range', from: '', to: '', step: '', values: '' };
}

/** Reads the form's fields (`name`, `combine`, `axes.<i>.field|mode|from|to|step|values`); unknown values become ''. */
export function sweepDraftFromFields(get: (name: string) => unknown): unknown {
	const str = (name: string) => {
		const v = get(name);
		return typeof v === 'string' ? v : undefined;
	};
	return {
		name: str('name') ?? '',
		combine: str('combine') || undefined,
		mode: str('mode') || undefined,
		axes: Array.from({ length: SWEEP_FORM_AXES }, (_, i) => ({
			field: str(`axes.${i}.field`),
			mode: str(`axes.${i}.mode`) || undefined,
			from: str(`axes.${i}.from`),
			to: str(`axes.${i}.to`),
			step: str(`axes.${i}.step`),
			values: str(`axes.${i}.values`)
		}))
	};
}

/** A typed number, or NaN (which the plan schema refuses as "must be a finite number"). */
function number(textValue: string): number {
	const t = textValue.trim();
	return t === '' ? NaN : Number(t);
}

/** A typed length in mm through the one unit parser (a bare number in `lengthUnit`, or "8 mil", "0.2 mm"), or NaN. */
function lengthMm(textValue: string, lengthUnit: LengthUnit): number {
	const parsed = parseLengthMm(textValue, lengthUnit);
	return parsed.ok ? parsed.value : NaN;
}

/** Keeps twelve significant digits so that 2.41 GHz becomes 2410000000 Hz, not 2409999999.9999995. */
function toStored(value: number, perUnit: number): number {
	return Number.isFinite(value) ? Number((value * perUnit).toPrecision(12)) : value;
}

/**
 * The sweep-plan document a draft describes (not yet validated: formats/sweep's parseSweepPlan does that),
 * and for each of its axes the form row it came from. Rows without a field are left out. Length fields are typed in
 * `lengthUnit` (or name their unit: "8 mil") and stored in mm; a list of lengths is split on commas and semicolons
 * only, so "8 mil, 10 mil" keeps its units. Other fields are typed in their own unit (GHz, Ω, none) as before.
 */
export function sweepPlanFromDraft(draft: SweepPlanDraft, lengthUnit: LengthUnit = 'mm'): { plan: { planVersion: 1; combine: 'grid' | 'zip'; mode?: SweepMode; axes: Record<string, unknown>[] }; rows: number[] } {
	const rows: number[] = [];
	const axes: Record<string, unknown>[] = [];
	draft.axes.forEach((a, row) => {
		if (a.field === '') return;
		const perUnit = sweepFieldChoice(a.field)?.perUnit ?? 1;
		const length = isLengthSweepField(a.field);
		const read = (t: string) => (length ? lengthMm(t, lengthUnit) : toStored(number(t), perUnit));
		rows.push(row);
		if (a.mode === 'list') {
			// "1.5 mm" must stay one entry: with units present, only commas and semicolons separate
			const separator = length && /[a-zµμ"]/i.test(a.values) ? /\s*[,;]\s*/ : /[\s,;]+/;
			const values = a.values.split(separator).map((v) => v.trim()).filter((v) => v !== '').map(read);
			axes.push({ field: a.field, values });
		} else {
			axes.push({ field: a.field, from: read(a.from), to: read(a.to), step: read(a.step) });
		}
	});
	// a resize plan is written as plans were before modes (no mode: resize), so its document keeps its bytes
	return { plan: { planVersion: 1, combine: draft.combine, ...(draft.mode === 'hold-geometry' ? { mode: draft.mode } : {}), axes }, rows };
}

/** The draft of a saved plan document (the inverse of sweepPlanFromDraft, for "start from this plan"), lengths in `lengthUnit`. */
export function sweepDraftFromPlan(name: string, plan: { combine: 'grid' | 'zip'; mode?: SweepMode; axes: readonly ({ field: string } & ({ from: number; to: number; step: number } | { values: readonly number[] }))[] }, lengthUnit: LengthUnit = 'mm'): SweepPlanDraft {
	const axes = plan.axes.slice(0, SWEEP_FORM_AXES).map((a) => {
		const perUnit = sweepFieldChoice(a.field)?.perUnit ?? 1;
		const shown = (v: number) => (isLengthSweepField(a.field) ? lengthFormText(v, lengthUnit) : String(Number((v / perUnit).toPrecision(12))));
		return 'values' in a
			? { ...emptyAxisDraft(a.field), mode: 'list' as const, values: a.values.map(shown).join(', ') }
			: { ...emptyAxisDraft(a.field), from: shown(a.from), to: shown(a.to), step: shown(a.step) };
	});
	while (axes.length < SWEEP_FORM_AXES) axes.push(emptyAxisDraft());
	return { name, combine: plan.combine, mode: plan.mode ?? 'resize', axes };
}
