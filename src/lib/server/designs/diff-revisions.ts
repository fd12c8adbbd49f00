// Two revisions side by side: every input field and every derived dimension, with what changed. Pure.
import { designFormFields, fieldApplies, switchesOfInput, valueAtPath, withOtherFeedDefaults } from '$lib/design';
import { derivedQuantities, formatPlain, formatValue } from '$lib/design';
import type { SizedDesign } from '../../rf';
import type { DesignInput } from '../../schemas';

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

export function diffRevisions(a: DiffSide, b: DiffSide): RevisionDiff {
	// Fields that apply to neither side (probe sizes of two inset-fed revisions) are left out.
	const applies = (f: (typeof designFormFields)[number]) =>
		fieldApplies(f, a.input.shape, a.input.feed, switchesOfInput(a.input)) || fieldApplies(f, b.input.shape, b.input.feed, switchesOfInput(b.input));
	const inputs = designFormFields.filter(applies).map((f) => {
		const va = valueAtPath(withOtherFeedDefaults(a.input), f.path);
		const vb = valueAtPath(withOtherFeedDefaults(b.input), f.path);
		const show = (v: unknown) => (f.presence ? (v ? 'yes' : 'no') : v === undefined || v === null ? '—' : f.codec ? f.codec.toForm(v) : typeof v === 'number' ? formatPlain(f.scale ? f.scale.toForm(v) : v) : typeof v === 'boolean' ? (v ? 'yes' : 'no') : String(v));
		return row(f.name, f.group, f.label, f.unit, va, vb, show(va), show(vb));
	});

	const qa = new Map(derivedQuantities(a.results).map((q) => [q.key, q]));
	const qb = new Map(derivedQuantities(b.results).map((q) => [q.key, q]));
	const keys = [...qa.keys(), ...[...qb.keys()].filter((k) => !qa.has(k))];
	const derived = keys.map((k) => {
		const x = qa.get(k);
		const y = qb.get(k);
		const meta = (x ?? y)!;
		return row(k, meta.group, meta.label, meta.unit, x?.value, y?.value, x ? formatValue(x.value, x.digits) : '—', y ? formatValue(y.value, y.digits) : '—');
	});
	return { a: a.label, b: b.label, inputs, derived, changedCount: [...inputs, ...derived].filter((r) => r.changed).length };
}

function row(key: string, group: string, label: string, unit: string, va: unknown, vb: unknown, a: string, b: string): DiffRow {
	const bothNumbers = typeof va === 'number' && typeof vb === 'number';
	return {
		key,
		group,
		label,
		unit,
		a,
		b,
		// Compare the shown text: a change below the shown digits is not a change to a reader.
		changed: a !== b,
		relativeChange: bothNumbers && va !== 0 ? (vb - va) / Math.abs(va) : null
	};
}
