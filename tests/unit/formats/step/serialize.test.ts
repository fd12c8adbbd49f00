// STEP clear-text encoding: reals, strings and whole documents, checked against ISO 10303-21:2016 (from memory).
import { describe, expect, it } from 'vitest';
import { encodeStepString, formatStepReal, list, real, ref, serializeStep, str, typed, unset, derived, enumValue, type StepDocument } from '../../../../src/lib/formats/step';

const header: StepDocument['header'] = {
	description: ['test'],
	fileName: 'a.step',
	timeStamp: '2026-11-20T00:00:00',
	author: 'Fringefield',
	organization: '',
	preprocessorVersion: 'Fringefield 0.1.0',
	originatingSystem: 'Fringefield 0.1.0',
	schema: 'AUTOMOTIVE_DESIGN { 1 0 10303 214 1 1 1 1 }',
	comments: ['one */ line']
};

describe('STEP serializer', () => {
	it.each([
		// ISO 10303-21:2016 §6.4.2: a REAL has a decimal point, so a whole number keeps a trailing "."
		{ value: 1, text: '1.' },
		{ value: 0, text: '0.' },
		// a negative zero would make the same geometry two byte strings
		{ value: -0, text: '0.' },
		{ value: -1e-12, text: '0.' },
		{ value: 1.524, text: '1.524' },
		{ value: -12.3456789, text: '-12.3456789' },
		// rounded at 7 places (0.1 nm), trailing zeros trimmed
		{ value: 0.123456789, text: '0.1234568' },
		{ value: 1e-7, text: '0.0000001' }
	])('writes the real $value as $text', ({ value, text }) => {
		expect(formatStepReal(value)).toBe(text);
	});

	it.each([
		// ISO 10303-21:2016 §6.4.3: an apostrophe inside a string is doubled
		{ text: "Pat's board", encoded: "'Pat''s board'" },
		// §6.4.3: a backslash is doubled (it starts control directives)
		{ text: 'a\\b', encoded: "'a\\\\b'" },
		// §6.4.3.3: \X2\ … \X0\ carries UCS-2 code units, four hex digits each (ε is U+03B5)
		{ text: 'core 1 (εr 3.38)', encoded: "'core 1 (\\X2\\03B5\\X0\\r 3.38)'" },
		// µ (U+00B5) is outside printable ASCII, so it is escaped too
		{ text: '25 µm', encoded: "'25 \\X2\\00B5\\X0\\m'" },
		// §6.4.3.3: \X4\ for characters beyond the basic plane
		{ text: '\u{1F4E1}', encoded: "'\\X4\\0001F4E1\\X0\\'" }
	])('encodes "$text" as $encoded', ({ text, encoded }) => {
		expect(encodeStepString(text)).toBe(encoded);
	});

	it('writes the exchange structure: header, data, simple and complex instances', () => {
		const text = serializeStep({
			header,
			entities: [
				{ type: 'simple', id: 1, record: { name: 'CARTESIAN_POINT', values: [str(''), list([real(0), real(1.5), real(-2)])] } },
				{ type: 'complex', id: 2, records: [{ name: 'LENGTH_UNIT', values: [] }, { name: 'NAMED_UNIT', values: [derived] }, { name: 'SI_UNIT', values: [enumValue('MILLI'), enumValue('METRE')] }] },
				{ type: 'simple', id: 3, record: { name: 'UNCERTAINTY_MEASURE_WITH_UNIT', values: [typed('LENGTH_MEASURE', real(1e-7)), ref(2), str('distance_accuracy_value'), unset] } }
			]
		});
		const lines = text.split('\n');
		// ISO 10303-21:2016 §5: the file opens with ISO-10303-21; and closes with END-ISO-10303-21;
		expect(lines[0]).toBe('ISO-10303-21;');
		expect(lines.at(-2)).toBe('END-ISO-10303-21;');
		expect(text.endsWith('\n')).toBe(true);
		// §8.2: the three header entities, in this order
		expect(text).toContain("FILE_DESCRIPTION(('test'),'2;1');");
		expect(text).toContain("FILE_NAME('a.step','2026-11-20T00:00:00',('Fringefield'),(''),'Fringefield 0.1.0','Fringefield 0.1.0','');");
		expect(text).toContain("FILE_SCHEMA(('AUTOMOTIVE_DESIGN { 1 0 10303 214 1 1 1 1 }'));");
		expect(text.indexOf('FILE_DESCRIPTION')).toBeLessThan(text.indexOf('FILE_NAME'));
		expect(text.indexOf('FILE_NAME')).toBeLessThan(text.indexOf('FILE_SCHEMA'));
		expect(lines).toContain("#1=CARTESIAN_POINT('',(0.,1.5,-2.));");
		// §12.2.5: a complex instance lists its partial records in brackets, without separators
		expect(lines).toContain('#2=(LENGTH_UNIT()NAMED_UNIT(*)SI_UNIT(.MILLI.,.METRE.));');
		expect(lines).toContain("#3=UNCERTAINTY_MEASURE_WITH_UNIT(LENGTH_MEASURE(0.0000001),#2,'distance_accuracy_value',$);");
		// a comment may not end early: "*/" inside its text is broken up
		expect(text).toContain(' * one * / line');
	});
});
