// Two revisions side by side: every input field and every derived dimension, with what changed. Pure.
import { designFormFields, fieldApplies, fieldUnitLabel, switchesOfInput, valueAtPath, withOtherFeedDefaults } from '$lib/design';
import { derivedQuantities, formatPlain, formatValue } from '$lib/design';
import type { SizedDesign } from '../../rf';
import type { DesignInput } from '../../schemas';
import { formatCopperNumber, formatLengthNumber, lengthInUnit, lengthSymbol, DEFAULT_DISPLAY_UNITS, type DisplayUnits } from '../../units';

export interface DiffSide {
	label: string;
	input: DesignInput;
	results: SizedDesign;
}

export interface DiffRow {
	key: string;
	group: string;
	label: string;
	unit: string;
	/** Display text; "—" where the quantity does not apply to that revision. */
	a: string;
	b: string;
	changed: boolean;
	/** (b − a) / |a| for numbers present on both sides, else null. */
	relativeChange: number | null;
}

export interface RevisionDiff {
	a: string;
	b: string;
	inputs: DiffRow[];
	derived: DiffRow[];
	changedCount: number;
}

/** Lengths and foil are shown in `units` (mm and µm when not given); what counts as changed is judged on the mm text, whatever the units. */
export function diffRevisions(a: DiffSide, b: DiffSide, units: DisplayUnits = DEFAULT_DISPLAY_UNITS): RevisionDiff {
	// Fields that apply to neither side (probe sizes of two inset-fed revisions) are left out.
	const applies = (f: (typeof designFormFields)[number]) =>
		fieldApplies(f, a.input.shape, a.input.feed, switchesOfInput(a.input)) || fieldApplies(f, b.input.shape, b.input.feed, switchesOfInput(b.input));
	const inputs = designFormFields.filter(applies).map((f) => {
		const va = valueAtPath(withOtherFeedDefaults(a.input), f.path);
		const vb = valueAtPath(withOtherFeedDefaults(b.input), f.path);
		const show = (v: unknown) => (f.presence ? (v ? 'yes' : 'no') : v === undefined || v === null ? '—' : f.codec ? f.codec.toForm(v) : typeof v === 'number' ? formatPlain(f.scale ? f.scale.toForm(v) : v) : typeof v === 'boolean' ? (v ? 'yes' : 'no') : String(v));
		// as the revision page's input table shows them: a length in mil to four figures, foil in oz to two decimals
		const unit = fieldUnitLabel(f, units);
		const shown = (v: unknown) => (typeof v !== 'number' || f.presence || f.codec || unit === f.unit ? show(v) : f.unit === 'mm' ? formatPlain(Number(lengthInUnit(v, units.length).toPrecision(4))) : formatCopperNumber(v, units.copper));
		return row(f.name, f.group, f.label, unit, va, vb, shown(va), shown(vb), show(va) !== show(vb));
	});

	const qa = new Map(derivedQuantities(a.results).map((q) => [q.key, q]));
	const qb = new Map(derivedQuantities(b.results).map((q) => [q.key, q]));
	const keys = [...qa.keys(), ...[...qb.keys()].filter((k) => !qa.has(k))];
	const derived = keys.map((k) => {
		const x = qa.get(k);
		const y = qb.get(k);
		const meta = (x ?? y)!;
		const text = (q: typeof x) => (q ? formatValue(q.value, q.digits) : '—');
		const inUnit = (q: typeof x) => (q && typeof q.value === 'number' && q.unit === 'mm' ? formatLengthNumber(q.value, units.length, q.digits) : text(q));
		return row(k, meta.group, meta.label, meta.unit === 'mm' ? lengthSymbol(units.length) : meta.unit, x?.value, y?.value, inUnit(x), inUnit(y), text(x) !== text(y));
	});
	return { a: a.label, b: b.label, inputs, derived, changedCount: [...inputs, ...derived].filter((r) => r.changed).length };
}

function row(key: string, group: string, label: string, unit: string, va: unknown, vb: unknown, a: string, b: string, changed: boolean): DiffRow {
	const bothNumbers = typeof va === 'number' && typeof vb === 'number';
	return {
		key,
		group,
		label,
		unit,
		a,
		b,
		// Compare the text shown in mm: a change below the shown digits is not a change to a reader (the same in any unit).
		changed,
		relativeChange: bothNumbers && va !== 0 ? (vb - va) / Math.abs(va) : null
	};
}
