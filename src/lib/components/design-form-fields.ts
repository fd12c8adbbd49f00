// The editor's fields: how each maps to a path of the design-input document, with its label and unit.
// Pure: the browser uses it for live validation and preview, the form action for parsing the post.
import { feedKinds, handednesses, patchShapes, probeModels, type DesignInput, type DesignInputDocument, type InputIssue } from '../schemas';
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
	group: 'Design' | 'Substrate' | 'Feed' | 'Board';
	/** Blank means "use the default / solve it". */
	optional?: boolean;
	choices?: readonly string[];
	/** Form value = document value × toForm (GHz for Hz). */
	scale?: { toForm: (v: number) => number; toDocument: (v: number) => number; factor: number };
	hint?: string;
	step?: string;
}

const ghz = { toForm: ghzFromHz, toDocument: hzFromGhz, factor: 1e-9 };

export const designFormFields: readonly FormField[] = [
	{ name: 'name', path: 'name', label: 'Name', unit: '', kind: 'text', group: 'Design' },
	{ name: 'frequencyGHz', path: 'frequencyHz', label: 'Target frequency f₀', unit: 'GHz', kind: 'number', group: 'Design', scale: ghz, step: 'any' },
	{ name: 'shape', path: 'shape', label: 'Patch shape', unit: '', kind: 'choice', group: 'Design', choices: patchShapes },
	{ name: 'handedness', path: 'handedness', label: 'Circular polarisation sense', unit: '', kind: 'choice', group: 'Design', choices: handednesses },
	{ name: 'substrate.relativePermittivity', path: 'substrate.relativePermittivity', label: 'Permittivity εr', unit: '', kind: 'number', group: 'Substrate', step: 'any' },
	{ name: 'substrate.lossTangent', path: 'substrate.lossTangent', label: 'Loss tangent tanδ', unit: '', kind: 'number', group: 'Substrate', step: 'any' },
	{ name: 'substrate.heightMm', path: 'substrate.heightMm', label: 'Thickness h', unit: 'mm', kind: 'number', group: 'Substrate', step: 'any' },
	{ name: 'substrate.copperThicknessUm', path: 'substrate.copperThicknessUm', label: 'Copper thickness t', unit: 'µm', kind: 'number', group: 'Substrate', step: 'any' },
	{ name: 'substrate.copperConductivitySPerM', path: 'substrate.copperConductivitySPerM', label: 'Copper conductivity σ', unit: 'S/m', kind: 'number', group: 'Substrate', step: 'any' },
	{ name: 'substrate.relativePermittivityTolerance', path: 'substrate.relativePermittivityTolerance', label: 'εr tolerance ±', unit: '', kind: 'number', group: 'Substrate', step: 'any' },
	{ name: 'substrate.heightToleranceMm', path: 'substrate.heightToleranceMm', label: 'Thickness tolerance ±', unit: 'mm', kind: 'number', group: 'Substrate', step: 'any' },
	{ name: 'feed', path: 'feed', label: 'Feed', unit: '', kind: 'choice', group: 'Feed', choices: feedKinds },
	{ name: 'targetImpedanceOhm', path: 'targetImpedanceOhm', label: 'Feed-point resistance', unit: 'Ω', kind: 'number', group: 'Feed', step: 'any' },
	{ name: 'feedLineImpedanceOhm', path: 'feedLineImpedanceOhm', label: 'Feed-line impedance Z₀', unit: 'Ω', kind: 'number', group: 'Feed', step: 'any' },
	{ name: 'inset.notchGapMm', path: 'inset.notchGapMm', label: 'Notch gap', unit: 'mm', kind: 'number', group: 'Feed', optional: true, hint: 'inset feed; blank = one line width', step: 'any' },
	{ name: 'probe.drillDiameterMm', path: 'probe.drillDiameterMm', label: 'Probe drill ⌀', unit: 'mm', kind: 'number', group: 'Feed', step: 'any' },
	{ name: 'probe.padDiameterMm', path: 'probe.padDiameterMm', label: 'Probe pad ⌀', unit: 'mm', kind: 'number', group: 'Feed', optional: true, hint: 'blank = drill + 0.5 mm', step: 'any' },
	{ name: 'probe.clearanceDiameterMm', path: 'probe.clearanceDiameterMm', label: 'Ground clearance ⌀', unit: 'mm', kind: 'number', group: 'Feed', step: 'any' },
	{ name: 'probe.model', path: 'probe.model', label: 'Probe model', unit: '', kind: 'choice', group: 'Feed', optional: true, hint: 'blank = not stated', choices: ['', ...probeModels] },
	{ name: 'probe.platingThicknessUm', path: 'probe.platingThicknessUm', label: 'Barrel plating', unit: 'µm', kind: 'number', group: 'Feed', optional: true, hint: 'plated barrel; blank = 25 µm', step: 'any' },
	{ name: 'patchWidthMm', path: 'patchWidthMm', label: 'Fixed patch width W', unit: 'mm', kind: 'number', group: 'Board', optional: true, hint: 'rectangular only; blank = solved', step: 'any' },
	{ name: 'groundMarginMm', path: 'groundMarginMm', label: 'Ground margin', unit: 'mm', kind: 'number', group: 'Board', optional: true, hint: 'blank = 3 h', step: 'any' },
	{ name: 'solderMask', path: 'solderMask', label: 'Add solder-mask layers', unit: '', kind: 'flag', group: 'Board' }
];

/** Whether a field matters for this shape and feed (the editor hides the rest; tables leave them out). */
export function fieldApplies(field: FormField, shape: string, feed: string): boolean {
	if (field.name === 'handedness') return shape === 'truncated-corner' || shape === 'nearly-square';
	if (field.name === 'inset.notchGapMm') return feed === 'inset';
	if (field.name.startsWith('probe.')) return feed === 'probe';
	if (field.name === 'patchWidthMm') return shape === 'rectangular';
	return true;
}

/** What the form holds: every control's text (a flag is "on" or ""). */
export type FormValues = Record<string, string>;

/** The form's text as a design-input document: blanks become missing, numbers stay numbers (NaN for junk, so zod names it). */
export function documentFromFormValues(values: FormValues): DesignInputDocument {
	const doc: Record<string, unknown> = { schemaVersion: 1 };
	for (const f of designFormFields) {
		const text = (values[f.name] ?? '').trim();
		let value: unknown;
		if (f.kind === 'flag') value = text === 'on' || text === 'true';
		else if (text === '') value = undefined;
		else if (f.kind === 'number') {
			const n = Number(text);
			value = f.scale && Number.isFinite(n) ? f.scale.toDocument(n) : n;
		} else value = f.kind === 'text' ? values[f.name] : text;
		if (value === undefined) continue;
		setAt(doc, f.path, value);
	}
	return doc as DesignInputDocument;
}

/** A stored input as form text (the form's starting values). */
export function formValuesFromInput(input: DesignInput): FormValues {
	const out: FormValues = {};
	for (const f of designFormFields) {
		const v = getAt(input, f.path);
		if (f.kind === 'flag') out[f.name] = v ? 'on' : '';
		else if (v === undefined || v === null) out[f.name] = '';
		else if (typeof v === 'number') out[f.name] = String(f.scale ? roundForForm(f.scale.toForm(v)) : v);
		else out[f.name] = String(v);
	}
	return out;
}

/** Reads a posted FormData into FormValues (only the known controls). */
export function formValuesFromFormData(data: FormData): FormValues {
	const out: FormValues = {};
	for (const f of designFormFields) {
		const v = data.get(f.name);
		out[f.name] = typeof v === 'string' ? v : '';
	}
	return out;
}

/** Where an issue shows: the field it is about, or "" for the form as a whole. */
export function fieldNameForPath(path: string): string {
	return designFormFields.find((f) => f.path === path)?.name ?? '';
}

export interface FieldIssue {
	/** Form control name, or "" for the whole form. */
	field: string;
	message: string;
}

/** Input issues as the form shows them: per field, with ranges restated in the field's own unit. */
export function fieldIssues(issues: readonly InputIssue[]): FieldIssue[] {
	return issues.map((iss) => {
		const field = designFormFields.find((f) => f.path === iss.path);
		let message = iss.message;
		if (field?.scale) {
			const factor = field.scale.factor;
			message = message.replace(/(allowed range [[(])([-\d.e+]+), ([-\d.e+]+)([\])])/, (_m, open, lo, hi, close) => `${open}${roundForForm(Number(lo) * factor)}, ${roundForForm(Number(hi) * factor)}${close} ${field.unit}`);
		}
		if (!field && iss.path) message = `${iss.path}: ${message}`;
		return { field: field?.name ?? '', message };
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
