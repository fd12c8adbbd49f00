// The editor's fields for mask coverage, legend and mounting holes: form text ↔ document, and issues beside their field.
import { describe, expect, it } from 'vitest';
import { documentFromFormValues, fieldIssues, formValuesFromInput, mountingHolesCodec } from '../../../src/lib/design';
import { InputError, parseDesignInput } from '../../../src/lib/schemas';

const base = { name: 'Form test', frequencyGHz: '2.45', shape: 'rectangular', feed: 'inset', 'substrate.relativePermittivity': '4.4', 'substrate.heightMm': '1.6' };

describe('mounting holes as one line of text', () => {
	it.each([
		// two holes, spaces or commas between the numbers
		{ text: '4 4 3.2; 49.5, 4, 2.2', holes: [{ xMm: 4, yMm: 4, diameterMm: 3.2 }, { xMm: 49.5, yMm: 4, diameterMm: 2.2 }] },
		// blank: none
		{ text: '  ', holes: undefined },
		// a trailing separator is not a hole
		{ text: '4 4 3.2;', holes: [{ xMm: 4, yMm: 4, diameterMm: 3.2 }] }
	])('reads "$text"', ({ text, holes }) => {
		expect(mountingHolesCodec.toDocument(text)).toEqual(holes);
	});

	it('turns a hole that is not three numbers into NaN, which the schema refuses beside the field', () => {
		const doc = documentFromFormValues({ ...base, mountingHoles: '4 4' });
		expect(doc.mountingHoles?.[0].xMm).toBeNaN();
		try {
			parseDesignInput(doc);
			throw new Error('accepted');
		} catch (e) {
			expect(e).toBeInstanceOf(InputError);
			const issues = fieldIssues((e as InputError).issues);
			expect(issues.every((i) => i.field === 'mountingHoles')).toBe(true);
			expect(issues[0].message).toMatch(/^0\.(xMm|yMm|diameterMm): /);
		}
	});

	it('round-trips a stored input through the form', () => {
		const input = parseDesignInput({ frequencyHz: 2.45e9, substrate: { relativePermittivity: 4.4, heightMm: 1.6 }, solderMask: true, maskCoverage: 'covered', maskCover: { thicknessUm: 25 }, legend: { orderText: 'FR4' }, mountingHoles: [{ xMm: 4, yMm: 5, diameterMm: 3.2 }] });
		const values = formValuesFromInput(input);
		expect(values).toMatchObject({ solderMask: 'on', maskCoverage: 'covered', 'maskCover.thicknessUm': '25', 'maskCover.relativePermittivity': '', legend: 'on', 'legend.orderText': 'FR4', mountingHoles: '4 5 3.2' });
		const again = parseDesignInput(documentFromFormValues(values));
		expect(again.maskCover).toEqual({ thicknessUm: 25 });
		expect(again.legend).toEqual({ orderText: 'FR4' });
		expect(again.mountingHoles).toEqual(input.mountingHoles);
	});

	it('writes no legend, coverage or holes when the form leaves them off', () => {
		const doc = documentFromFormValues({ ...base, legend: '', maskCoverage: '', mountingHoles: '' });
		expect(doc).not.toHaveProperty('legend');
		expect(doc).not.toHaveProperty('maskCoverage');
		expect(doc).not.toHaveProperty('mountingHoles');
	});
});
