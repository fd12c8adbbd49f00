// The editor's fields: how each maps to a path of the design-input document, with its label and unit.
// Pure: the browser uses it for live validation and preview, the form action for parsing the post.
import { allFeedKinds, backMounts, edgeLaunchFeeds, handednesses, insetOptionsSchema, launchKinds, maskCoverages, patchShapes, probeModels, probeOptionsSchema, requiredCopperCount, type DesignInput, type DesignInputDocument, type InputIssue } from '../schemas';
import { ghzFromHz, hzFromGhz } from '../units';

export type FieldKind = 'text' | 'number' | 'choice' | 'flag';

export interface FormField {
	/** The form control's name (also its id suffix). */
	name: string;
	/** Dotted path in the design-input document. */
	path: string;
	label: string;
	/** Unit shown beside the control and in tables. */
	unit: string;
	kind: FieldKind;
	group: FieldGroup;
	/**
	 * A part of the document that only some designs have: the field is shown and written only when it
	 * is on (slot and proximity: the feed chooses them; parasitic and array: their switch).
	 */
	section?: FormSection;
	/** A switch whose "on" means the object at `path` is present (its fields follow in its section). */
	presence?: boolean;
	/** Blank means "use the default / solve it". */
	optional?: boolean;
	choices?: readonly string[];
	/** Form value = document value × toForm (GHz for Hz). */
	scale?: { toForm: (v: number) => number; toDocument: (v: number) => number; factor: number };
	hint?: string;
	step?: string;
	/** A value the form holds as one line of text (the mounting holes): how it is read and written. */
	codec?: { toDocument: (text: string) => unknown; toForm: (value: unknown) => string };
}

/**
 * Mounting holes as one line: "x y ⌀" per hole in mm, holes separated by ";" ("4 4 3.2; 49 4 3.2"). Blank: none.
 * A hole that is not three numbers becomes NaN values, which the schema refuses with the hole's path.
 */
export const mountingHolesCodec = {
	toDocument(text: string): unknown {
		const holes = text.split(';').map((h) => h.trim()).filter((h) => h.length > 0);
		if (holes.length === 0) return undefined;
		return holes.map((h) => {
			const parts = h.split(/[\s,]+/).map(Number);
			const [xMm, yMm, diameterMm] = parts.length === 3 ? parts : [NaN, NaN, NaN];
			return { xMm, yMm, diameterMm };
		});
	},
	toForm(value: unknown): string {
		if (!Array.isArray(value)) return '';
		return value.map((h: { xMm: number; yMm: number; diameterMm: number }) => `${h.xMm} ${h.yMm} ${h.diameterMm}`).join('; ');
	}
};

export type FieldGroup = 'Design' | 'Substrate' | 'Feed' | 'Parasitic' | 'Array' | 'Board';
export type FormSection = 'slot' | 'proximity' | 'parasitic' | 'array' | 'launch-edge' | 'launch-back' | 'mask-cover';

const ghz = { toForm: ghzFromHz, toDocument: hzFromGhz, factor: 1e-9 };

export const designFormFields: readonly FormField[] = [
	{ name: 'name', path: 'name', label: 'Name', unit: '', kind: 'text', group: 'Design' },
	{ name: 'frequencyGHz', path: 'frequencyHz', label: 'Target frequency f₀', unit: 'GHz', kind: 'number', group: 'Design', scale: ghz, step: 'any' },
	{ name: 'shape', path: 'shape', label: 'Patch shape', unit: '', kind: 'choice', group: 'Design', choices: patchShapes },
	{ name: 'handedness', path: 'handedness', label: 'Circular polarisation sense', unit: '', kind: 'choice', group: 'Design', choices: handednesses },
	{ name: 'bandToCover.lowerGHz', path: 'bandToCover.lowerHz', label: 'Band to cover, from', unit: 'GHz', kind: 'number', group: 'Design', scale: ghz, optional: true, hint: 'optional; blank = none', step: 'any' },
	{ name: 'bandToCover.upperGHz', path: 'bandToCover.upperHz', label: 'Band to cover, to', unit: 'GHz', kind: 'number', group: 'Design', scale: ghz, optional: true, hint: 'optional; blank = none', step: 'any' },
	{ name: 'overrides.lengthMm', path: 'overrides.lengthMm', label: 'Pinned length L', unit: 'mm', kind: 'number', group: 'Design', optional: true, hint: 'Homing or a retune pins it; blank = sized for f₀', step: 'any' },
	{ name: 'overrides.widthMm', path: 'overrides.widthMm', label: 'Pinned width W', unit: 'mm', kind: 'number', group: 'Design', optional: true, hint: 'blank = sized for f₀', step: 'any' },
	{ name: 'overrides.radiusMm', path: 'overrides.radiusMm', label: 'Pinned radius a', unit: 'mm', kind: 'number', group: 'Design', optional: true, hint: 'Homing or a retune pins it; blank = sized for f₀', step: 'any' },
	{ name: 'substrate.relativePermittivity', path: 'substrate.relativePermittivity', label: 'Permittivity εr', unit: '', kind: 'number', group: 'Substrate', step: 'any' },
	{ name: 'substrate.lossTangent', path: 'substrate.lossTangent', label: 'Loss tangent tanδ', unit: '', kind: 'number', group: 'Substrate', step: 'any' },
	{ name: 'substrate.heightMm', path: 'substrate.heightMm', label: 'Thickness h', unit: 'mm', kind: 'number', group: 'Substrate', step: 'any' },
	{ name: 'substrate.copperThicknessUm', path: 'substrate.copperThicknessUm', label: 'Copper thickness t', unit: 'µm', kind: 'number', group: 'Substrate', step: 'any' },
	{ name: 'substrate.copperConductivitySPerM', path: 'substrate.copperConductivitySPerM', label: 'Copper conductivity σ', unit: 'S/m', kind: 'number', group: 'Substrate', step: 'any' },
	{ name: 'substrate.relativePermittivityTolerance', path: 'substrate.relativePermittivityTolerance', label: 'εr tolerance ±', unit: '', kind: 'number', group: 'Substrate', step: 'any' },
	{ name: 'substrate.heightToleranceMm', path: 'substrate.heightToleranceMm', label: 'Thickness tolerance ±', unit: 'mm', kind: 'number', group: 'Substrate', step: 'any' },
	{ name: 'laminate.name', path: 'laminate.name', label: 'Laminate ordered', unit: '', kind: 'text', group: 'Substrate', optional: true, hint: 'the product the fab notes order; blank = none named' },
	{ name: 'laminate.relativePermittivity', path: 'laminate.relativePermittivity', label: 'Ordered laminate εr', unit: '', kind: 'number', group: 'Substrate', optional: true, hint: 'as its datasheet states; blank = the εr above', step: 'any' },
	{ name: 'laminate.relativePermittivityTolerance', path: 'laminate.relativePermittivityTolerance', label: 'Ordered laminate εr ±', unit: '', kind: 'number', group: 'Substrate', optional: true, hint: 'blank = not stated', step: 'any' },
	{ name: 'laminate.lossTangent', path: 'laminate.lossTangent', label: 'Ordered laminate tanδ', unit: '', kind: 'number', group: 'Substrate', optional: true, hint: 'blank = not stated', step: 'any' },
	{ name: 'feed', path: 'feed', label: 'Feed', unit: '', kind: 'choice', group: 'Feed', choices: allFeedKinds },
	{ name: 'targetImpedanceOhm', path: 'targetImpedanceOhm', label: 'Feed-point resistance', unit: 'Ω', kind: 'number', group: 'Feed', step: 'any' },
	{ name: 'feedLineImpedanceOhm', path: 'feedLineImpedanceOhm', label: 'Feed-line impedance Z₀', unit: 'Ω', kind: 'number', group: 'Feed', step: 'any' },
	{ name: 'inset.notchGapMm', path: 'inset.notchGapMm', label: 'Notch gap', unit: 'mm', kind: 'number', group: 'Feed', optional: true, hint: 'inset feed; blank = one line width', step: 'any' },
	{ name: 'probe.drillDiameterMm', path: 'probe.drillDiameterMm', label: 'Probe drill ⌀', unit: 'mm', kind: 'number', group: 'Feed', step: 'any' },
	{ name: 'probe.padDiameterMm', path: 'probe.padDiameterMm', label: 'Probe pad ⌀', unit: 'mm', kind: 'number', group: 'Feed', optional: true, hint: 'blank = drill + 0.5 mm', step: 'any' },
	{ name: 'probe.clearanceDiameterMm', path: 'probe.clearanceDiameterMm', label: 'Ground clearance ⌀', unit: 'mm', kind: 'number', group: 'Feed', step: 'any' },
	{ name: 'probe.model', path: 'probe.model', label: 'Probe model', unit: '', kind: 'choice', group: 'Feed', optional: true, hint: 'blank = not stated', choices: ['', ...probeModels] },
	{ name: 'probe.platingThicknessUm', path: 'probe.platingThicknessUm', label: 'Barrel plating', unit: 'µm', kind: 'number', group: 'Feed', optional: true, hint: 'plated barrel; blank = 25 µm', step: 'any' },
	{ name: 'overrides.insetDepthMm', path: 'overrides.insetDepthMm', label: 'Pinned inset depth', unit: 'mm', kind: 'number', group: 'Feed', optional: true, hint: 'Homing pins it; blank = solved for the feed-point resistance', step: 'any' },
	{ name: 'overrides.probeOffsetMm', path: 'overrides.probeOffsetMm', label: 'Pinned probe offset from the centre', unit: 'mm', kind: 'number', group: 'Feed', optional: true, hint: 'Homing pins it; blank = solved for the feed-point resistance', step: 'any' },
	{ name: 'overrides.transformerImpedanceOhm', path: 'overrides.transformerImpedanceOhm', label: 'Pinned λg/4 section impedance', unit: 'Ω', kind: 'number', group: 'Feed', optional: true, hint: 'Homing pins it; blank = √(R_edge·Z₀)', step: 'any' },
	{ name: 'slot.lengthMm', path: 'slot.lengthMm', label: 'Coupling slot length', unit: 'mm', kind: 'number', group: 'Feed', section: 'slot', optional: true, hint: 'blank = first-pass rule', step: 'any' },
	{ name: 'slot.widthMm', path: 'slot.widthMm', label: 'Coupling slot width', unit: 'mm', kind: 'number', group: 'Feed', section: 'slot', optional: true, hint: 'blank = first-pass rule', step: 'any' },
	{ name: 'slot.stubLengthMm', path: 'slot.stubLengthMm', label: 'Open stub past the slot', unit: 'mm', kind: 'number', group: 'Feed', section: 'slot', optional: true, hint: 'blank ≈ λg/4', step: 'any' },
	{ name: 'proximity.overlapMm', path: 'proximity.overlapMm', label: 'Line run under the patch', unit: 'mm', kind: 'number', group: 'Feed', section: 'proximity', optional: true, hint: 'blank = to the centre', step: 'any' },
	{ name: 'launch.kind', path: 'launch.kind', label: 'Connector launch', unit: '', kind: 'choice', group: 'Feed', optional: true, hint: 'edge: line feeds; back: probe; blank = none', choices: ['', ...launchKinds] },
	{ name: 'launch.lengthMm', path: 'launch.lengthMm', label: 'Launch length from the edge', unit: 'mm', kind: 'number', group: 'Feed', section: 'launch-edge', optional: true, hint: 'blank = 3 mm', step: 'any' },
	{ name: 'launch.groundWidthMm', path: 'launch.groundWidthMm', label: 'Launch ground pad width', unit: 'mm', kind: 'number', group: 'Feed', section: 'launch-edge', optional: true, hint: 'blank = 2 mm', step: 'any' },
	{ name: 'launch.gapMm', path: 'launch.gapMm', label: 'Launch gap to the line', unit: 'mm', kind: 'number', group: 'Feed', section: 'launch-edge', optional: true, hint: 'blank = solved for the line Z₀', step: 'any' },
	{ name: 'launch.viaDrillMm', path: 'launch.viaDrillMm', label: 'Launch via drill ⌀', unit: 'mm', kind: 'number', group: 'Feed', section: 'launch-edge', optional: true, hint: 'blank = 0.3 mm', step: 'any' },
	{ name: 'launch.viaPitchMm', path: 'launch.viaPitchMm', label: 'Launch via pitch', unit: 'mm', kind: 'number', group: 'Feed', section: 'launch-edge', optional: true, hint: 'blank = 1 mm', step: 'any' },
	{ name: 'launch.viaRows', path: 'launch.viaRows', label: 'Launch via rows per pad', unit: '', kind: 'number', group: 'Feed', section: 'launch-edge', optional: true, hint: '1 … 4; blank = 1', step: '1' },
	{ name: 'launch.viaInsetMm', path: 'launch.viaInsetMm', label: 'Gap edge to first via row', unit: 'mm', kind: 'number', group: 'Feed', section: 'launch-edge', optional: true, hint: 'blank = 0.5 mm', step: 'any' },
	{ name: 'launch.mount', path: 'launch.mount', label: 'Back launch mount', unit: '', kind: 'choice', group: 'Feed', section: 'launch-back', optional: true, hint: 'blank = pad', choices: ['', ...backMounts] },
	{ name: 'launch.padSideMm', path: 'launch.padSideMm', label: 'Back ground pad side', unit: 'mm', kind: 'number', group: 'Feed', section: 'launch-back', optional: true, hint: 'pad mount; blank = 6 mm', step: 'any' },
	{ name: 'launch.flangeDrillMm', path: 'launch.flangeDrillMm', label: 'Flange hole ⌀', unit: 'mm', kind: 'number', group: 'Feed', section: 'launch-back', optional: true, hint: 'flange mount; blank = 2.7 mm', step: 'any' },
	{ name: 'launch.flangeSpacingMm', path: 'launch.flangeSpacingMm', label: 'Flange hole spacing', unit: 'mm', kind: 'number', group: 'Feed', section: 'launch-back', optional: true, hint: 'flange mount; blank = 8.6 mm', step: 'any' },
	{ name: 'parasitic', path: 'parasitic', label: 'Stacked parasitic patch on the top copper', unit: '', kind: 'flag', group: 'Parasitic', presence: true },
	{ name: 'parasitic.sizeRatio', path: 'parasitic.sizeRatio', label: 'Size over the driven patch', unit: '×', kind: 'number', group: 'Parasitic', section: 'parasitic', optional: true, hint: 'blank = 1.07', step: 'any' },
	{ name: 'array', path: 'array', label: 'Repeat as an array with a corporate feed', unit: '', kind: 'flag', group: 'Array', presence: true },
	{ name: 'array.columns', path: 'array.columns', label: 'Columns (along x)', unit: '', kind: 'number', group: 'Array', section: 'array', hint: '1, 2, 4 … 64', step: '1' },
	{ name: 'array.rows', path: 'array.rows', label: 'Rows (along y)', unit: '', kind: 'number', group: 'Array', section: 'array', optional: true, hint: '1, 2, 4 … 64; blank = 1', step: '1' },
	{ name: 'array.spacingXWavelengths', path: 'array.spacingXWavelengths', label: 'Pitch along x', unit: 'λ₀', kind: 'number', group: 'Array', section: 'array', optional: true, hint: 'blank = 0.7', step: 'any' },
	{ name: 'array.spacingYWavelengths', path: 'array.spacingYWavelengths', label: 'Pitch along y', unit: 'λ₀', kind: 'number', group: 'Array', section: 'array', optional: true, hint: 'blank = 0.7', step: 'any' },
	{ name: 'array.scanAngleDeg', path: 'array.scanAngleDeg', label: 'Scan angle from broadside', unit: '°', kind: 'number', group: 'Array', section: 'array', optional: true, hint: 'x–z plane; blank = 0', step: 'any' },
	{ name: 'patchWidthMm', path: 'patchWidthMm', label: 'Fixed patch width W', unit: 'mm', kind: 'number', group: 'Board', optional: true, hint: 'rectangular only; blank = solved', step: 'any' },
	{ name: 'groundMarginMm', path: 'groundMarginMm', label: 'Ground margin', unit: 'mm', kind: 'number', group: 'Board', optional: true, hint: 'blank = 3 h', step: 'any' },
	{ name: 'solderMask', path: 'solderMask', label: 'Add solder-mask layers', unit: '', kind: 'flag', group: 'Board' },
	{ name: 'maskCoverage', path: 'maskCoverage', label: 'Mask over the patch', unit: '', kind: 'choice', group: 'Board', optional: true, hint: 'with mask; blank = exposed (patch bare)', choices: ['', ...maskCoverages] },
	{ name: 'maskCover.relativePermittivity', path: 'maskCover.relativePermittivity', label: 'Mask εr', unit: '', kind: 'number', group: 'Board', section: 'mask-cover', optional: true, hint: 'blank = 3.8', step: 'any' },
	{ name: 'maskCover.thicknessUm', path: 'maskCover.thicknessUm', label: 'Mask thickness', unit: 'µm', kind: 'number', group: 'Board', section: 'mask-cover', optional: true, hint: 'blank = 20 µm', step: 'any' },
	{ name: 'legend', path: 'legend', label: 'Top legend (name, revision, date, feed and polarisation marks)', unit: '', kind: 'flag', group: 'Board', presence: true },
	{ name: 'legend.orderText', path: 'legend.orderText', label: 'Legend order text', unit: '', kind: 'text', group: 'Board', optional: true, hint: 'A–Z 0–9 -./+:#(); blank = layers and thickness' },
	{ name: 'mountingHoles', path: 'mountingHoles', label: 'Mounting holes (NPTH), kept 5 h from the patch', unit: 'mm', kind: 'text', group: 'Board', optional: true, hint: 'x y ⌀ each, ";" between; blank = none', codec: mountingHolesCodec }
];

/** Whether the switch of an optional part of the document is on: from form values, or from a stored input. */
export type SectionSwitch = (section: 'parasitic' | 'array' | 'launch-edge' | 'launch-back' | 'mask-cover') => boolean;

const LAUNCH_SECTION_KIND = { 'launch-edge': 'edge', 'launch-back': 'back' } as const;

/** The launch fields follow the chosen launch kind; the mask-cover fields are on when the mask covers the patch (maskCoverage "covered"). */
export const switchesOfValues = (values: FormValues): SectionSwitch => (section) =>
	section === 'launch-edge' || section === 'launch-back'
		? values['launch.kind'] === LAUNCH_SECTION_KIND[section]
		: section === 'mask-cover'
			? values.maskCoverage === 'covered'
			: values[section] === 'on';
export const switchesOfInput = (input: Pick<DesignInput, 'parasitic' | 'array' | 'launch' | 'maskCoverage'>): SectionSwitch => (section) =>
	section === 'launch-edge' || section === 'launch-back'
		? input.launch?.kind === LAUNCH_SECTION_KIND[section]
		: section === 'mask-cover'
			? input.maskCoverage === 'covered'
			: input[section] !== undefined;

/**
 * Whether a field matters for this shape and feed (the editor hides the rest; tables leave them out).
 * The parasitic and array parts need `switches`; without it their fields do not apply.
 */
export function fieldApplies(field: FormField, shape: string, feed: string, switches?: SectionSwitch): boolean {
	if (field.section === 'slot') return feed === 'aperture-coupled';
	if (field.section === 'proximity') return feed === 'proximity-coupled';
	if (field.section === 'parasitic' || field.section === 'array' || field.section === 'mask-cover') return switches?.(field.section) ?? false;
	// the launch: edge for a line at the board edge, back under a probe; its dimensions once its kind is chosen
	if (field.section === 'launch-edge') return (edgeLaunchFeeds as readonly string[]).includes(feed) && (switches?.(field.section) ?? false);
	if (field.section === 'launch-back') return feed === 'probe' && (switches?.(field.section) ?? false);
	if (field.name === 'launch.kind') return feed === 'probe' || (edgeLaunchFeeds as readonly string[]).includes(feed);
	if (field.presence) return switches !== undefined;
	if (field.name === 'handedness') return shape === 'truncated-corner' || shape === 'nearly-square';
	if (field.name === 'inset.notchGapMm') return feed === 'inset';
	if (field.name.startsWith('probe.')) return feed === 'probe';
	if (field.name === 'patchWidthMm') return shape === 'rectangular';
	// the pinned dimensions each shape and feed takes (the document's override rules)
	if (field.name === 'overrides.lengthMm' || field.name === 'overrides.widthMm') return shape === 'rectangular';
	if (field.name === 'overrides.radiusMm') return shape === 'circular';
	if (field.name === 'overrides.insetDepthMm') return feed === 'inset';
	if (field.name === 'overrides.probeOffsetMm') return feed === 'probe' && shape !== 'nearly-square';
	if (field.name === 'overrides.transformerImpedanceOhm') return feed === 'quarter-wave';
	return true;
}

/** What the form holds: every control's text (a flag is "on" or ""); stack rows as "stack.<i>.<key>". */
export type FormValues = Record<string, string>;

/** The switch that turns the explicit stack on; its rows are the "stack.<i>.<key>" values. */
export const STACK_SWITCH = 'stack';

/** Keys a stack row holds: copper has a thickness, a dielectric its εr, tanδ, height and bonding flag. */
export const stackRowKeys = { copper: ['thicknessUm'], dielectric: ['relativePermittivity', 'lossTangent', 'heightMm', 'bonding'] } as const;
const STACK_KEY = /^stack\.(\d+)\.(kind|thicknessUm|relativePermittivity|lossTangent|heightMm|bonding)$/;

export interface StackRowValues {
	kind: 'copper' | 'dielectric';
	/** Text per key of this kind (bonding: "on" or ""). */
	fields: Record<string, string>;
}

/** The stack rows held in form values, top to bottom. */
export function stackRowsOfValues(values: FormValues): StackRowValues[] {
	const rows = new Map<number, StackRowValues>();
	for (const [key, text] of Object.entries(values)) {
		const m = STACK_KEY.exec(key);
		if (!m || m[2] !== 'kind') continue;
		rows.set(Number(m[1]), { kind: text === 'copper' ? 'copper' : 'dielectric', fields: {} });
	}
	const ordered = [...rows.keys()].sort((a, b) => a - b);
	return ordered.map((i) => {
		const row = rows.get(i)!;
		for (const k of stackRowKeys[row.kind]) row.fields[k] = values[`stack.${i}.${k}`] ?? '';
		return row;
	});
}

/** Form values with the stack rows replaced by `rows` (renumbered 0…n−1); the switch is left as it is. */
export function withStackRows(values: FormValues, rows: readonly StackRowValues[]): FormValues {
	const out: FormValues = {};
	for (const [k, v] of Object.entries(values)) if (!STACK_KEY.test(k)) out[k] = v;
	rows.forEach((row, i) => {
		out[`stack.${i}.kind`] = row.kind;
		for (const k of stackRowKeys[row.kind]) out[`stack.${i}.${k}`] = row.fields[k] ?? '';
	});
	return out;
}

/**
 * A starting stack for `copperCount` coppers from the substrate fields: copper, dielectric, copper, …
 * each dielectric a copy of the substrate (the designer then edits each layer).
 */
export function stackRowsFromSubstrate(values: FormValues, copperCount: number): StackRowValues[] {
	const copper = (): StackRowValues => ({ kind: 'copper', fields: { thicknessUm: '' } });
	const dielectric = (): StackRowValues => ({
		kind: 'dielectric',
		fields: { relativePermittivity: values['substrate.relativePermittivity'] ?? '', lossTangent: values['substrate.lossTangent'] ?? '', heightMm: values['substrate.heightMm'] ?? '', bonding: '' }
	});
	const rows = [copper()];
	for (let i = 1; i < copperCount; i++) rows.push(dielectric(), copper());
	return rows;
}

/** How many coppers the feed and the parasitic switch in the form need (2 or 3). */
export function copperCountNeeded(values: FormValues): number {
	return requiredCopperCount({ feed: values.feed as DesignInput['feed'], parasitic: values.parasitic === 'on' ? { sizeRatio: 1 } : undefined });
}

function numberOrJunk(text: string, scale?: FormField['scale']): number {
	const n = Number(text);
	return scale && Number.isFinite(n) ? scale.toDocument(n) : n;
}

/** The form's text as a design-input document: blanks become missing, numbers stay numbers (NaN for junk, so zod names it). */
export function documentFromFormValues(values: FormValues): DesignInputDocument {
	const doc: Record<string, unknown> = { schemaVersion: 1 };
	const switches = switchesOfValues(values);
	for (const f of designFormFields) {
		const text = (values[f.name] ?? '').trim();
		if (f.section && !fieldApplies(f, values.shape ?? '', values.feed ?? '', switches)) continue;
		if (f.presence) {
			if (text === 'on' || text === 'true') setAt(doc, f.path, (doc[f.path] as object | undefined) ?? {});
			continue;
		}
		let value: unknown;
		if (f.codec) value = f.codec.toDocument(text);
		else if (f.kind === 'flag') value = text === 'on' || text === 'true';
		else if (text === '') value = undefined;
		else if (f.kind === 'number') value = numberOrJunk(text, f.scale);
		else value = f.kind === 'text' ? values[f.name] : text;
		if (value === undefined) continue;
		setAt(doc, f.path, value);
	}
	if (values[STACK_SWITCH] === 'on') {
		doc.stack = stackRowsOfValues(values).map((row) => {
			const layer: Record<string, unknown> = { kind: row.kind };
			for (const k of stackRowKeys[row.kind]) {
				const text = (row.fields[k] ?? '').trim();
				if (k === 'bonding') layer.bonding = text === 'on' || text === 'true';
				else if (text !== '') layer[k] = numberOrJunk(text);
			}
			return layer;
		});
	}
	// a laminate named without its εr orders the substrate's (a form cannot leave the datasheet value to the schema)
	const laminate = doc.laminate as Record<string, unknown> | undefined;
	const substrateEr = (doc.substrate as Record<string, unknown> | undefined)?.relativePermittivity;
	if (laminate && laminate.relativePermittivity === undefined && Number.isFinite(substrateEr)) laminate.relativePermittivity = substrateEr;
	return doc as DesignInputDocument;
}

/**
 * The input as the form and the revision diff show it: it holds only its own feed's option object, and the other
 * feeds' option fields show their defaults, so switching the feed in the form finds them filled and two revisions on
 * different feeds compare as before the input was a union on its feed.
 */
export function withOtherFeedDefaults(input: DesignInput): DesignInput & Record<'inset' | 'probe', object> {
	return { inset: insetOptionsSchema.parse({}), probe: probeOptionsSchema.parse({}), ...input };
}

/** A stored input as form text (the form's starting values). */
export function formValuesFromInput(input: DesignInput): FormValues {
	const out: FormValues = {};
	const source = withOtherFeedDefaults(input);
	for (const f of designFormFields) {
		const v = getAt(source, f.path);
		if (f.codec) out[f.name] = f.codec.toForm(v);
		else if (f.presence || f.kind === 'flag') out[f.name] = v ? 'on' : '';
		else if (v === undefined || v === null) out[f.name] = '';
		else if (typeof v === 'number') out[f.name] = String(f.scale ? roundForForm(f.scale.toForm(v)) : v);
		else out[f.name] = String(v);
	}
	out[STACK_SWITCH] = input.stack ? 'on' : '';
	const rows = (input.stack ?? []).map((layer): StackRowValues =>
		layer.kind === 'copper'
			? { kind: 'copper', fields: { thicknessUm: layer.thicknessUm === undefined ? '' : String(layer.thicknessUm) } }
			: { kind: 'dielectric', fields: { relativePermittivity: String(layer.relativePermittivity), lossTangent: String(layer.lossTangent), heightMm: String(layer.heightMm), bonding: layer.bonding ? 'on' : '' } }
	);
	return withStackRows(out, rows);
}

/** Reads a posted FormData into FormValues (only the known controls and the stack rows). */
export function formValuesFromFormData(data: FormData): FormValues {
	const out: FormValues = {};
	for (const f of designFormFields) {
		const v = data.get(f.name);
		out[f.name] = typeof v === 'string' ? v : '';
	}
	const sw = data.get(STACK_SWITCH);
	out[STACK_SWITCH] = typeof sw === 'string' ? sw : '';
	const rowCount = new Set<number>();
	for (const [key, v] of data.entries()) {
		const m = STACK_KEY.exec(key);
		if (m && typeof v === 'string' && Number(m[1]) < 64) {
			out[key] = v;
			rowCount.add(Number(m[1]));
		}
	}
	// an unchecked bonding box is not posted: a dielectric row without it is not bonding
	for (const i of rowCount) if (out[`stack.${i}.kind`] === 'dielectric') out[`stack.${i}.bonding`] ??= '';
	return out;
}

/** Where an issue shows: the field it is about, or "" for the form as a whole. */
export function fieldNameForPath(path: string): string {
	return fieldOfPath(path)?.name ?? (isStackPath(path) ? path : '');
}

/** The field an issue's path belongs to: its own, or for a one-line value (the mounting holes) the line holding it. */
function fieldOfPath(path: string): FormField | undefined {
	return designFormFields.find((f) => f.path === path) ?? designFormFields.find((f) => f.codec && path.startsWith(`${f.path}.`));
}

/** "stack", or a stack row or one of its keys: shown in the stack-up section, beside the row. */
function isStackPath(path: string): boolean {
	return path === 'stack' || /^stack\.\d+(\.[A-Za-z]+)?$/.test(path);
}

export interface FieldIssue {
	/** Form control name (a stack path for the stack-up rows), or "" for the whole form. */
	field: string;
	message: string;
}

/** Input issues as the form shows them: per field, with ranges restated in the field's own unit. */
export function fieldIssues(issues: readonly InputIssue[]): FieldIssue[] {
	return issues.map((iss) => {
		const field = fieldOfPath(iss.path);
		let message = field?.codec && iss.path !== field.path ? `${iss.path.slice(field.path.length + 1)}: ${iss.message}` : iss.message;
		if (field?.scale) {
			const factor = field.scale.factor;
			message = message.replace(/(allowed range [[(])([-\d.e+]+), ([-\d.e+]+)([\])])/, (_m, open, lo, hi, close) => `${open}${roundForForm(Number(lo) * factor)}, ${roundForForm(Number(hi) * factor)}${close} ${field.unit}`);
		}
		if (field) return { field: field.name, message };
		if (isStackPath(iss.path)) return { field: iss.path, message };
		return { field: '', message: iss.path ? `${iss.path}: ${message}` : message };
	});
}

/** Rounds away binary noise from unit scaling (2.45e9 × 1e-9 = 2.4500000000000002). */
function roundForForm(v: number): number {
	return Number(v.toPrecision(12));
}

function setAt(doc: Record<string, unknown>, path: string, value: unknown): void {
	const keys = path.split('.');
	let node = doc;
	for (const key of keys.slice(0, -1)) {
		node[key] ??= {};
		node = node[key] as Record<string, unknown>;
	}
	node[keys[keys.length - 1]] = value;
}

function getAt(root: unknown, path: string): unknown {
	let node = root;
	for (const key of path.split('.')) node = node && typeof node === 'object' ? (node as Record<string, unknown>)[key] : undefined;
	return node;
}

export { getAt as valueAtPath };
