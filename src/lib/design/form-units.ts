// The editor's form in the person's display units: lengths in mm or mil, copper foil in µm or oz. The form's text is in
// those units (or names its own: "8 mil"); the document built from it is always in mm and µm.
import { copperFormText, copperSymbol, formatTrimmed, lengthFormText, milFromMm, ozFromUm, lengthSymbol, parseCopperUm, parseLengthMm, DEFAULT_DISPLAY_UNITS, isCopperUnit, isLengthUnit, type DisplayUnits } from '../units';
import { designFormFields, type FieldIssue, type FormField, type FormValues } from './design-form-fields';

/** The hidden controls that say which units a posted editor form was typed in. */
export const LENGTH_UNIT_FIELD = 'lengthUnit';
export const COPPER_UNIT_FIELD = 'copperUnit';

const lengthFieldNames = new Set(designFormFields.filter((f) => f.kind === 'number' && f.unit === 'mm').map((f) => f.name));
/** Foil only: a barrel's plating is not ordered by weight, so it stays in µm. */
const copperFieldNames = new Set(['substrate.copperThicknessUm']);
const STACK_LENGTH = /^stack\.\d+\.heightMm$/;
const STACK_COPPER = /^stack\.\d+\.thicknessUm$/;

const quantityOf = (name: string): 'length' | 'copper' | null => (lengthFieldNames.has(name) || STACK_LENGTH.test(name) ? 'length' : copperFieldNames.has(name) || STACK_COPPER.test(name) ? 'copper' : null);

/** The unit shown beside a field in `units` (mil for a length field of a person in mil, oz for foil). */
export function fieldUnitLabel(field: Pick<FormField, 'name' | 'unit'>, units: DisplayUnits): string {
	const q = quantityOf(field.name);
	return q === 'length' ? lengthSymbol(units.length) : q === 'copper' ? copperSymbol(units.copper) : field.unit;
}

/** Form values in mm and µm (as `formValuesFromInput` gives them) rewritten in `units`; blanks and other fields stay as they are. */
export function formValuesInUnits(values: FormValues, units: DisplayUnits): FormValues {
	const out: FormValues = { ...values };
	for (const [name, text] of Object.entries(values)) {
		const q = quantityOf(name);
		const n = Number(text);
		if (!q || text.trim() === '' || !Number.isFinite(n)) continue;
		out[name] = q === 'length' ? lengthFormText(n, units.length) : copperFormText(n, units.copper);
	}
	return out;
}

/**
 * Form values typed in `units` rewritten in mm and µm, ready for `documentFromFormValues`. Text the parser refuses is
 * left as typed (the schema then names the field) and listed in `issues` with the parser's reason.
 */
export function formValuesInStoredUnits(values: FormValues, units: DisplayUnits): { values: FormValues; issues: FieldIssue[] } {
	const out: FormValues = { ...values };
	const issues: FieldIssue[] = [];
	for (const [name, text] of Object.entries(values)) {
		const q = quantityOf(name);
		if (!q || text.trim() === '') continue;
		const parsed = q === 'length' ? parseLengthMm(text, units.length) : parseCopperUm(text, units.copper);
		if (parsed.ok) out[name] = String(parsed.value);
		else issues.push({ field: name, message: parsed.message });
	}
	return { values: out, issues };
}

/** The units a posted editor form says it was typed in; mm and µm when it does not say (forms and scripts from before). */
export function displayUnitsOfFormData(data: FormData): DisplayUnits {
	const length = data.get(LENGTH_UNIT_FIELD);
	const copper = data.get(COPPER_UNIT_FIELD);
	return { length: isLengthUnit(length) ? length : DEFAULT_DISPLAY_UNITS.length, copper: isCopperUnit(copper) ? copper : DEFAULT_DISPLAY_UNITS.copper };
}

/**
 * Issues as the person reads them: a length field's range (stated in mm, with or without the symbol) restated in mil
 * when they read mil ("allowed range [0.1, 10]" → "allowed range [3.94, 394] mil"), a foil field's µm range in oz;
 * other messages, and everything for a person in mm and µm, unchanged.
 */
export function issuesInUnits(issues: readonly FieldIssue[], units: DisplayUnits): FieldIssue[] {
	return issues.map((issue) => {
		const q = quantityOf(issue.field);
		const restate = q === 'length' && units.length === 'mil' ? { from: 'mm', to: 'mil', convert: milFromMm } : q === 'copper' && units.copper === 'oz' ? { from: 'µm', to: 'oz', convert: ozFromUm } : null;
		if (!restate) return issue;
		// the schema states ranges in the stored unit, with or without its symbol
		const range = new RegExp(String.raw`allowed range ([[(])([-\d.e+]+), ([-\d.e+]+)([\])])(?: ${restate.from})?`);
		const message = issue.message.replace(range, (_m, open, lo, hi, close) => `allowed range ${open}${formatTrimmed(restate.convert(Number(lo)), 3)}, ${formatTrimmed(restate.convert(Number(hi)), 3)}${close} ${restate.to}`);
		return { ...issue, message };
	});
}
