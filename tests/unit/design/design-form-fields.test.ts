// The editor's form values ⇄ design-input document for layered designs and arrays: stack rows, switches, issue placement.
import { describe, expect, it } from 'vitest';
import {
	copperCountNeeded,
	designFormFields,
	documentFromFormValues,
	fieldApplies,
	fieldIssues,
	formValuesFromFormData,
	formValuesFromInput,
	stackRowsFromSubstrate,
	stackRowsOfValues,
	switchesOfInput,
	withStackRows
} from '../../../src/lib/design/design-form-fields';
import { elementCountOfFormValues, LIVE_PREVIEW_ELEMENT_LIMIT } from '../../../src/lib/design/live-sizing';
import { designInputSchema, fromZodError, parseDesignInput } from '../../../src/lib/schemas';
import { layeredCases } from '../../fixtures/designs/layered-cases';

describe('editor form values for layered designs and arrays', () => {
	it('shows the probe defaults (drill 1.3 mm, clearance 4.1 mm: the schema defaults) on an inset design, so switching to a probe finds them filled', () => {
		const input = parseDesignInput({ name: 'Form demo', frequencyHz: 2.45e9, feed: 'inset', substrate: { relativePermittivity: 4.4, heightMm: 1.6 } });
		expect('probe' in input).toBe(false);
		const values = formValuesFromInput(input);
		expect([values['probe.drillDiameterMm'], values['probe.clearanceDiameterMm']]).toEqual(['1.3', '4.1']);
		const probeDoc = parseDesignInput(documentFromFormValues({ ...values, feed: 'probe' }));
		expect(probeDoc.feed === 'probe' && probeDoc.probe).toEqual({ drillDiameterMm: 1.3, clearanceDiameterMm: 4.1 });
		// and the inset design itself posts back without a probe object
		expect(parseDesignInput(documentFromFormValues(values))).toEqual(input);
	});

	it.each(layeredCases)('$name: stored input → form values → document parses back to the same input', ({ doc }) => {
		const input = parseDesignInput(doc);
		const values = formValuesFromInput(input);
		expect(parseDesignInput(documentFromFormValues(values))).toEqual(input);
	});

	it.each(layeredCases)('$name: the posted form (FormData) gives the same document as the live form', ({ doc }) => {
		const values = formValuesFromInput(parseDesignInput(doc));
		const data = new FormData();
		// a browser posts checked boxes as "on" and leaves unchecked ones out
		for (const [k, v] of Object.entries(values)) if (!(v === '' && (k.endsWith('.bonding') || ['parasitic', 'array', 'stack', 'solderMask'].includes(k)))) data.set(k, v);
		expect(documentFromFormValues(formValuesFromFormData(data))).toEqual(documentFromFormValues(values));
	});

	it('keeps the stack rows in order top to bottom, with the bonding film flagged', () => {
		const aperture = layeredCases.find((c) => c.name === 'aperture-coupled patch')!;
		const rows = stackRowsOfValues(formValuesFromInput(parseDesignInput(aperture.doc)));
		expect(rows.map((r) => r.kind)).toEqual(['copper', 'dielectric', 'dielectric', 'copper', 'dielectric', 'copper']);
		expect(rows[2].fields).toMatchObject({ relativePermittivity: '3', heightMm: '0.1', bonding: 'on' });
		expect(rows[1].fields.bonding).toBe('');
	});

	it('starts a stack from the substrate with the coppers the feed needs', () => {
		const values: Record<string, string> = { ...formValuesFromInput(parseDesignInput(layeredCases[0].doc)), feed: 'aperture-coupled' };
		expect(copperCountNeeded(values)).toBe(3);
		expect(copperCountNeeded({ ...values, feed: 'inset' })).toBe(2);
		expect(copperCountNeeded({ ...values, feed: 'inset', parasitic: 'on' })).toBe(3);
		const rows = stackRowsFromSubstrate(values, 3);
		expect(rows.map((r) => r.kind)).toEqual(['copper', 'dielectric', 'copper', 'dielectric', 'copper']);
		expect(rows[1].fields.heightMm).toBe(values['substrate.heightMm']);
		// renumbered when rows go: no gap in the indices, the old keys gone
		const fewer = withStackRows({ ...values, stack: 'on' }, rows.slice(0, 3));
		expect(Object.keys(fewer).filter((k) => k.startsWith('stack.')).sort()).toEqual(['stack.0.kind', 'stack.0.thicknessUm', 'stack.1.bonding', 'stack.1.heightMm', 'stack.1.kind', 'stack.1.lossTangent', 'stack.1.relativePermittivity', 'stack.2.kind', 'stack.2.thicknessUm']);
	});

	it('writes no array, parasitic, slot or proximity part while its switch or feed is off', () => {
		const array = layeredCases.find((c) => c.name === '1×4 inset array')!;
		const values = formValuesFromInput(parseDesignInput(array.doc));
		expect(documentFromFormValues(values).array).toMatchObject({ columns: 4 });
		const off = documentFromFormValues({ ...values, array: '', 'slot.lengthMm': '12', 'proximity.overlapMm': '3' });
		expect(off.array).toBeUndefined();
		expect(off.slot).toBeUndefined();
		expect(off.proximity).toBeUndefined();
		expect(documentFromFormValues({ ...values, feed: 'aperture-coupled', 'slot.lengthMm': '12' }).slot).toEqual({ lengthMm: 12 });
	});

	it('places issues beside their stack row and array field, the rest on the form', () => {
		const values = formValuesFromInput(parseDesignInput(layeredCases[0].doc));
		values['stack.1.heightMm'] = '-1';
		const bad = designInputSchema.safeParse(documentFromFormValues({ ...values, array: 'on', 'array.columns': '3' }));
		expect(bad.success).toBe(false);
		const issues = fieldIssues(fromZodError(bad.error!, {}).issues);
		expect(issues.find((i) => i.field === 'stack.1.heightMm')?.message).toMatch(/allowed range \(0, 100\]/);
		expect(issues.find((i) => i.field === 'array.columns')?.message).toMatch(/power of two/);
		expect(fieldIssues([{ path: 'stack', value: undefined, message: 'needs 3' }])).toEqual([{ field: 'stack', message: 'needs 3' }]);
		expect(fieldIssues([{ path: 'slot', value: {}, message: 'only aperture' }])).toEqual([{ field: '', message: 'slot: only aperture' }]);
	});

	it('shows array and parasitic fields only where their part is present (tables of stored inputs too)', () => {
		const columns = designFormFields.find((f) => f.name === 'array.columns')!;
		const input = parseDesignInput(layeredCases.find((c) => c.name === '1×4 inset array')!.doc);
		expect(fieldApplies(columns, 'rectangular', 'inset', switchesOfInput(input))).toBe(true);
		expect(fieldApplies(columns, 'rectangular', 'inset', switchesOfInput({ ...input, array: undefined }))).toBe(false);
		// without switches (the revision diff), the optional parts stay out
		expect(fieldApplies(columns, 'rectangular', 'inset')).toBe(false);
		const slot = designFormFields.find((f) => f.name === 'slot.lengthMm')!;
		expect(fieldApplies(slot, 'rectangular', 'aperture-coupled')).toBe(true);
		expect(fieldApplies(slot, 'rectangular', 'proximity-coupled')).toBe(false);
	});
});

describe('the band to cover in the editor', () => {
	it('turns the two GHz fields into bandToCover in Hz and back, and leaves it out when both are blank', () => {
		const values = { ...formValuesFromInput(parseDesignInput({ frequencyHz: 5.8e9, shape: 'truncated-corner', substrate: { relativePermittivity: 2.2, heightMm: 0.787 } })) };
		expect(documentFromFormValues(values)).not.toHaveProperty('bandToCover');
		const doc = documentFromFormValues({ ...values, 'bandToCover.lowerGHz': '5.725', 'bandToCover.upperGHz': '5.875' });
		expect(doc.bandToCover).toEqual({ lowerHz: 5.725e9, upperHz: 5.875e9 });
		const back = formValuesFromInput(parseDesignInput(doc));
		expect([back['bandToCover.lowerGHz'], back['bandToCover.upperGHz']]).toEqual(['5.725', '5.875']);
	});

	it('shows an upper edge below the lower one beside the upper field, in GHz', () => {
		const issues = fieldIssues([{ path: 'bandToCover.upperHz', value: 5.7e9, message: 'must be above bandToCover.lowerHz (5875000000)' }]);
		expect(issues[0].field).toBe('bandToCover.upperGHz');
		expect(designFormFields.find((f) => f.name === 'bandToCover.lowerGHz')?.unit).toBe('GHz');
	});
});

describe('pinned dimensions and the ordered laminate in the editor', () => {
	// A revision Homing tuned and started on a library laminate (demo values): editing it through the form must keep both.
	const tuned = parseDesignInput({
		name: 'Tuned feeder patch',
		frequencyHz: 2.45e9,
		feed: 'inset',
		substrate: { relativePermittivity: 4.31, lossTangent: 0.018, heightMm: 1.6 },
		laminate: { name: 'Team glass-epoxy 1.6', relativePermittivity: 4.4, relativePermittivityTolerance: 0.2, lossTangent: 0.02 },
		overrides: { lengthMm: 28.73, insetDepthMm: 5.41 }
	});

	it('a tuned revision on a named laminate → form values → document parses back to the same input', () => {
		const values = formValuesFromInput(tuned);
		expect(values['overrides.lengthMm']).toBe('28.73');
		expect(values['laminate.name']).toBe('Team glass-epoxy 1.6');
		expect(parseDesignInput(documentFromFormValues(values))).toEqual(tuned);
	});

	it('blank pinned fields and a blank laminate leave both out of the document', () => {
		const values = { ...formValuesFromInput(tuned), 'overrides.lengthMm': '', 'overrides.insetDepthMm': '', 'laminate.name': '', 'laminate.relativePermittivity': '', 'laminate.relativePermittivityTolerance': '', 'laminate.lossTangent': '' };
		const doc = documentFromFormValues(values);
		expect(doc).not.toHaveProperty('overrides');
		expect(doc).not.toHaveProperty('laminate');
	});

	it('a laminate named without its εr orders the substrate εr; junk in the substrate εr is not copied into it', () => {
		const base = { ...formValuesFromInput(tuned), 'laminate.relativePermittivity': '', 'laminate.relativePermittivityTolerance': '', 'laminate.lossTangent': '' };
		expect(documentFromFormValues(base).laminate).toEqual({ name: 'Team glass-epoxy 1.6', relativePermittivity: 4.31 });
		expect(documentFromFormValues({ ...base, 'substrate.relativePermittivity': 'four' }).laminate).toEqual({ name: 'Team glass-epoxy 1.6' });
	});

	it('offers each pinned dimension only where the document takes it (the schema override rules)', () => {
		const field = (name: string) => designFormFields.find((f) => f.name === name)!;
		expect(fieldApplies(field('overrides.lengthMm'), 'rectangular', 'inset')).toBe(true);
		expect(fieldApplies(field('overrides.lengthMm'), 'circular', 'probe')).toBe(false);
		expect(fieldApplies(field('overrides.radiusMm'), 'circular', 'probe')).toBe(true);
		expect(fieldApplies(field('overrides.insetDepthMm'), 'rectangular', 'probe')).toBe(false);
		expect(fieldApplies(field('overrides.probeOffsetMm'), 'rectangular', 'probe')).toBe(true);
		expect(fieldApplies(field('overrides.probeOffsetMm'), 'nearly-square', 'probe')).toBe(false);
		expect(fieldApplies(field('overrides.transformerImpedanceOhm'), 'rectangular', 'quarter-wave')).toBe(true);
		// a pinned length posted for a circular patch is refused by the schema, at its field
		const circular = { ...documentFromFormValues(formValuesFromInput(tuned)), shape: 'circular', feed: 'probe', inset: undefined };
		const issues = fieldIssues(fromZodError(designInputSchema.safeParse(circular).error!, circular).issues);
		expect(issues.map((i) => i.field)).toContain('overrides.lengthMm');
	});
});

describe('the editor live limit', () => {
	it('counts the elements the form makes: 1 without the array switch, columns × rows with it, junk as 1', () => {
		expect(elementCountOfFormValues({ array: '', 'array.columns': '64', 'array.rows': '64' })).toBe(1);
		expect(elementCountOfFormValues({ array: 'on', 'array.columns': '64', 'array.rows': '64' })).toBe(4096);
		expect(elementCountOfFormValues({ array: 'on', 'array.columns': '16', 'array.rows': '' })).toBe(16);
		expect(elementCountOfFormValues({ array: 'on', 'array.columns': 'x', 'array.rows': '-3' })).toBe(1);
		// 16 × 16 is still drawn live; 32 × 16 is not
		expect(elementCountOfFormValues({ array: 'on', 'array.columns': '16', 'array.rows': '16' })).toBeLessThanOrEqual(LIVE_PREVIEW_ELEMENT_LIMIT);
		expect(elementCountOfFormValues({ array: 'on', 'array.columns': '32', 'array.rows': '16' })).toBeGreaterThan(LIVE_PREVIEW_ELEMENT_LIMIT);
	});
});
