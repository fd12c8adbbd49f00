import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { displayUnitsOfFormData, issuesInUnits, documentFromFormValues, fieldUnitLabel, formValuesFromInput, formValuesInStoredUnits, formValuesInUnits, designFormFields } from '../../../src/lib/design';
import { parseDesignInput } from '../../../src/lib/schemas';
import { layeredCases } from '../../fixtures/designs/layered-cases';

const everyUnits = [
	{ length: 'mm', copper: 'um' },
	{ length: 'mil', copper: 'oz' },
	{ length: 'mil', copper: 'um' },
	{ length: 'mm', copper: 'oz' }
] as const;

describe('the editor form in the person’s units', () => {
	// The form shown in mil and oz must save the very input it started from: an untouched field never drifts.
	it.each(layeredCases.flatMap((c) => everyUnits.map((u) => ({ ...c, units: u }))))('$name in $units.length/$units.copper: input → form text → document is the same input', ({ doc, units }) => {
		const input = parseDesignInput(doc);
		const shown = formValuesInUnits(formValuesFromInput(input), units);
		const back = formValuesInStoredUnits(shown, units);
		expect(back.issues).toEqual([]);
		expect(parseDesignInput(documentFromFormValues(back.values))).toEqual(input);
	});

	// 1.6 mm / 0.0254 = 62.992… mil; 35 µm = 1 oz (NIST SP 811 B.9; 35 µm/oz common practice, no source).
	it('shows lengths in mil and foil in oz, leaving εr, GHz and plating alone', () => {
		const input = parseDesignInput({ ...layeredCases[0].doc, substrate: { relativePermittivity: 4.4, heightMm: 1.6, copperThicknessUm: 35 } });
		const shown = formValuesInUnits(formValuesFromInput(input), { length: 'mil', copper: 'oz' });
		expect(shown['substrate.heightMm']).toBe('62.9921');
		expect(shown['substrate.copperThicknessUm']).toBe('1');
		expect(shown['substrate.relativePermittivity']).toBe('4.4');
		expect(shown.frequencyGHz).toBe(formValuesFromInput(input).frequencyGHz);
	});

	it('reads "8 mil" in a form shown in mm, and a bare number in the person’s unit', () => {
		const out = formValuesInStoredUnits({ 'substrate.heightMm': '8 mil', 'probe.drillDiameterMm': '50', 'stack.1.heightMm': '0.5 mm', 'stack.0.thicknessUm': '0.5', 'substrate.relativePermittivity': '4.4' }, { length: 'mil', copper: 'oz' });
		expect(out.issues).toEqual([]);
		expect(out.values).toEqual({ 'substrate.heightMm': '0.2032', 'probe.drillDiameterMm': '1.27', 'stack.1.heightMm': '0.5', 'stack.0.thicknessUm': '17.5', 'substrate.relativePermittivity': '4.4' });
	});

	it('lists text it cannot read, per field, and leaves it as typed for the schema', () => {
		const out = formValuesInStoredUnits({ 'substrate.heightMm': '8 furlongs', 'substrate.copperThicknessUm': '1 mil', groundMarginMm: '' }, { length: 'mm', copper: 'um' });
		expect(out.issues).toEqual([
			{ field: 'substrate.heightMm', message: 'unknown unit "furlongs"; use mm or mil' },
			{ field: 'substrate.copperThicknessUm', message: 'unknown unit "mil"; use µm or oz' }
		]);
		expect(out.values['substrate.heightMm']).toBe('8 furlongs');
		expect(Number.isNaN((documentFromFormValues(out.values).substrate as { heightMm: number }).heightMm)).toBe(true);
	});

	it('keeps any length on a 10 nm grid through its mil text', () => {
		fc.assert(
			fc.property(fc.integer({ min: 1, max: 5_000_000 }), (steps) => {
				const mm = String(Number((steps * 1e-5).toPrecision(12)));
				const shown = formValuesInUnits({ groundMarginMm: mm }, { length: 'mil', copper: 'um' });
				expect(formValuesInStoredUnits(shown, { length: 'mil', copper: 'um' }).values.groundMarginMm).toBe(mm);
			}),
			{ numRuns: 200 }
		);
	});

	it('labels length fields with the person’s symbol and leaves the rest', () => {
		const units = { length: 'mil', copper: 'oz' } as const;
		const label = (name: string) => fieldUnitLabel(designFormFields.find((f) => f.name === name)!, units);
		expect(label('substrate.heightMm')).toBe('mil');
		expect(label('substrate.copperThicknessUm')).toBe('oz');
		expect(label('probe.platingThicknessUm')).toBe('µm');
		expect(label('frequencyGHz')).toBe('GHz');
		expect(fieldUnitLabel({ name: 'stack.2.heightMm', unit: 'mm' }, units)).toBe('mil');
	});

	it('reads the units a posted form names, mm and µm when it names none or junk', () => {
		const data = new FormData();
		expect(displayUnitsOfFormData(data)).toEqual({ length: 'mm', copper: 'um' });
		data.set('lengthUnit', 'mil');
		data.set('copperUnit', 'oz');
		expect(displayUnitsOfFormData(data)).toEqual({ length: 'mil', copper: 'oz' });
		data.set('lengthUnit', 'furlong');
		expect(displayUnitsOfFormData(data).length).toBe('mm');
	});

	// 1000 mm / 0.0254 = 39 370 mil, 30.591 mm = 1204 mil, 100 mm = 3937 mil; 210 µm / 35 = 6 oz (NIST SP 811 B.9; 35 µm/oz common practice, no source)
	it('restates a length field’s range in mil and a foil field’s in oz, and nothing for a person in mm', () => {
		const issues = [
			{ field: 'groundMarginMm', message: 'allowed range [0, 1000]' },
			{ field: 'substrate.heightMm', message: 'must be less than λ0/4 = 30.591 mm at this frequency; allowed range (0, 30.591)' },
			{ field: 'stack.1.heightMm', message: 'allowed range (0, 100] mm' },
			{ field: 'substrate.copperThicknessUm', message: 'allowed range [1, 210]' },
			{ field: 'targetImpedanceOhm', message: 'allowed range (0, 500]' }
		];
		expect(issuesInUnits(issues, { length: 'mil', copper: 'oz' }).map((i) => i.message)).toEqual([
			'allowed range [0, 39370] mil',
			'must be less than λ0/4 = 30.591 mm at this frequency; allowed range (0, 1204) mil',
			'allowed range (0, 3937] mil',
			'allowed range [0.0286, 6] oz',
			'allowed range (0, 500]'
		]);
		expect(issuesInUnits(issues, { length: 'mm', copper: 'um' })).toEqual(issues);
	});
});
