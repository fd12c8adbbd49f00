// Reader checks against the Touchstone File Format Specification (IBIS Open Forum, v2.0 2009 / v2.1);
// the example files are written from memory of that document's layouts, with demo numbers.
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../../../src/lib/schemas/input-error';
import {
	readTouchstone,
	TouchstoneError,
	portCountFromFileName,
	type TouchstoneNetwork
} from '../../../../src/lib/formats/touchstone/index';

const FIXTURES = join(__dirname, '../../../fixtures/touchstone');
const TOLERANCE = 1e-12;

interface ExpectedNetwork {
	version: string;
	portCount: number;
	frequencyUnit: string;
	format: string;
	referenceImpedanceOhm: number[];
	points: { frequencyHz: number; s: [number, number][] }[];
	noise: { frequencyHz: number; minimumNoiseFigureDb: number; optimumSourceReflection: [number, number]; noiseResistance: number }[];
}

function expectClose(actual: number, expected: number, what: string): void {
	expect(Math.abs(actual - expected), `${what}: ${actual} vs ${expected}`).toBeLessThanOrEqual(TOLERANCE * Math.max(1, Math.abs(expected)));
}

function expectNetwork(actual: TouchstoneNetwork, expected: ExpectedNetwork): void {
	expect(actual.version).toBe(expected.version);
	expect(actual.portCount).toBe(expected.portCount);
	expect(actual.frequencyUnit).toBe(expected.frequencyUnit);
	expect(actual.format).toBe(expected.format);
	expect(actual.referenceImpedanceOhm).toEqual(expected.referenceImpedanceOhm);
	expect(actual.points).toHaveLength(expected.points.length);
	actual.points.forEach((p, i) => {
		expectClose(p.frequencyHz, expected.points[i].frequencyHz, `point ${i} frequency`);
		expect(p.s).toHaveLength(expected.points[i].s.length);
		p.s.forEach((v, j) => {
			expectClose(v.re, expected.points[i].s[j][0], `point ${i} s${j} re`);
			expectClose(v.im, expected.points[i].s[j][1], `point ${i} s${j} im`);
		});
	});
	expect(actual.noise).toHaveLength(expected.noise.length);
	actual.noise.forEach((n, i) => {
		const e = expected.noise[i];
		expectClose(n.frequencyHz, e.frequencyHz, `noise ${i} frequency`);
		expectClose(n.minimumNoiseFigureDb, e.minimumNoiseFigureDb, `noise ${i} NFmin`);
		expectClose(n.optimumSourceReflection.re, e.optimumSourceReflection[0], `noise ${i} Γopt re`);
		expectClose(n.optimumSourceReflection.im, e.optimumSourceReflection[1], `noise ${i} Γopt im`);
		expectClose(n.noiseResistance, e.noiseResistance, `noise ${i} Rn`);
	});
}

describe('readTouchstone on the golden files', () => {
	const cases = readdirSync(FIXTURES, { withFileTypes: true }).filter((d) => d.isDirectory() && !d.name.startsWith('broken-'));
	it('finds the golden cases', () => {
		expect(cases.length).toBeGreaterThanOrEqual(7);
	});
	for (const dir of cases) {
		it(`reads ${dir.name} as expected.json says`, () => {
			const files = readdirSync(join(FIXTURES, dir.name));
			const input = files.find((f) => f.startsWith('input.'));
			expect(input, 'an input.* file').toBeDefined();
			const text = readFileSync(join(FIXTURES, dir.name, input!), 'utf8');
			const expected = JSON.parse(readFileSync(join(FIXTURES, dir.name, 'expected.json'), 'utf8')) as ExpectedNetwork;
			expectNetwork(readTouchstone(text, { portCount: portCountFromFileName(input!) }), expected);
		});
	}
});

describe('readTouchstone option line', () => {
	// Spec "Option Line": fields in any order, case-insensitive, defaults GHz S MA R 50.
	const table: { line: string; unit: string; format: string; r: number; hzPerUnit: number; note: string }[] = [
		{ line: '#', unit: 'GHz', format: 'MA', r: 50, hzPerUnit: 1e9, note: 'all defaults' },
		{ line: '# Hz S RI R 50', unit: 'Hz', format: 'RI', r: 50, hzPerUnit: 1, note: 'every field given' },
		{ line: '# khz', unit: 'kHz', format: 'MA', r: 50, hzPerUnit: 1e3, note: 'lower case kHz' },
		{ line: '# R 75 DB MHZ', unit: 'MHz', format: 'DB', r: 75, hzPerUnit: 1e6, note: 'any order' },
		{ line: '#GHz ri r 25.5', unit: 'GHz', format: 'RI', r: 25.5, hzPerUnit: 1e9, note: 'no space after # and a fractional R' },
		{ line: '#\tMHz\tS\tMA', unit: 'MHz', format: 'MA', r: 50, hzPerUnit: 1e6, note: 'tabs separate entries' }
	];
	for (const c of table) {
		it(`reads "${c.line.replace(/\t/g, '\\t')}" (${c.note})`, () => {
			const net = readTouchstone(`${c.line}\n2 0.5 0\n`);
			expect(net.frequencyUnit).toBe(c.unit);
			expect(net.format).toBe(c.format);
			expect(net.referenceImpedanceOhm).toEqual([c.r]);
			expect(net.points[0].frequencyHz).toBe(2 * c.hzPerUnit);
		});
	}

	it('reads DB pairs as 20·log10 of the magnitude (−20 dB ∠ 90° is 0.1j)', () => {
		const [point] = readTouchstone('# GHz S DB R 50\n1 -20 90\n').points;
		expectClose(point.s[0].re, 0, 're');
		expectClose(point.s[0].im, 0.1, 'im');
	});

	it('ignores everything after "!" on any line', () => {
		const net = readTouchstone('! header\n# GHz S RI R 50 ! option\n1 0.1 0.2 ! note 3 4 5\n!2 0 0\n');
		expect(net.points).toHaveLength(1);
		expect(net.points[0].s[0]).toEqual({ re: 0.1, im: 0.2 });
	});

	it('accepts CR LF and lone CR line ends', () => {
		expect(readTouchstone('# GHz S RI\r\n1 0 0\r\n2 0 0\r\n').points).toHaveLength(2);
		expect(readTouchstone('# GHz S RI\r1 0 0\r2 0 0').points).toHaveLength(2);
	});

	it('infers the port count from the first data line when no file name is given', () => {
		expect(readTouchstone('#\n1 0 0\n').portCount).toBe(1);
		expect(readTouchstone('#\n1 0 0 0 0 0 0 0 0\n').portCount).toBe(2);
	});
});

/** One malformation per row: the text, the line the error must name, and words the "expected" part must contain. */
interface Malformation {
	name: string;
	text: string;
	line: number;
	expected: RegExp;
	portCount?: 1 | 2;
}

const V2_1PORT_HEAD = '[Version] 2.0\n# GHz S RI R 50\n[Number of Ports] 1\n[Number of Frequencies] 2\n[Network Data]\n';
const V2_2PORT_HEAD = '[Version] 2.0\n# GHz S RI R 50\n[Number of Ports] 2\n[Two-Port Data Order] 12_21\n[Number of Frequencies] 1\n';

const malformations: Malformation[] = [
	// Numbers
	{ name: 'a word where a number belongs', text: '# GHz S RI\n1 0.5 abc\n', line: 2, expected: /decimal/ },
	{ name: 'NaN', text: '# GHz S RI\n1 NaN 0\n', line: 2, expected: /decimal/ },
	{ name: 'Infinity', text: '# GHz S RI\n1 0 Infinity\n', line: 2, expected: /decimal/ },
	{ name: 'a number that overflows to infinity', text: '# GHz S RI\n1 1e999 0\n', line: 2, expected: /finite/ },
	{ name: 'a hexadecimal number', text: '# GHz S RI\n1 0x10 0\n', line: 2, expected: /decimal/ },
	{ name: 'a comma decimal separator', text: '# GHz S RI\n1 0,5 0\n', line: 2, expected: /decimal/ },
	{ name: 'a DB value whose magnitude overflows', text: '# GHz S DB\n1 1e5 0\n', line: 2, expected: /finite value/ },
	{ name: 'a negative MA magnitude', text: '# GHz S MA\n1 -0.5 0\n', line: 2, expected: /magnitude ≥ 0/ },
	{ name: 'a frequency that overflows after the unit', text: '# GHz S RI\n1e300 0 0\n', line: 2, expected: /finite frequency/ },
	// Frequencies (spec "Data lines": strictly increasing)
	{ name: 'a repeated frequency', text: '# GHz S RI\n1 0 0\n1 0 0\n', line: 3, expected: /greater than the previous one \(1 GHz\)/ },
	{ name: 'a decreasing frequency in a 1-port file', text: '# GHz S RI\n2 0 0\n3 0 0\n2.5 0 0\n', line: 4, expected: /greater than the previous/ },
	{ name: 'a negative frequency', text: '# GHz S RI\n-1 0 0\n', line: 2, expected: /frequency ≥ 0/ },
	{ name: 'a decreasing frequency in a 2-port file with 9 values', text: '#\n2 0 0 0 0 0 0 0 0\n1 0 0 0 0 0 0 0 0\n', line: 3, expected: /greater than the previous/ },
	{ name: 'decreasing noise frequencies', text: '#\n2 0 0 0 0 0 0 0 0\n1 1 0.5 0 0.2\n0.5 1 0.5 0 0.2\n', line: 4, expected: /greater than the previous/ },
	// Values per line
	{ name: 'four values on a 1-port line', text: '# GHz S RI\n1 0 0 0\n', line: 2, expected: /3 values .* or 9 values/ },
	{ name: 'a short 1-port line after good ones', text: '# GHz S RI\n1 0 0\n2 0\n', line: 3, expected: /3 values on a 1-port data line/ },
	{ name: 'a short 2-port line', text: '# GHz S RI\n1 0 0 0 0 0 0 0 0\n2 0 0 0 0 0 0\n', line: 3, expected: /9 values on a 2-port data line/ },
	{ name: 'a 2-port line in a file named .s1p', text: '# GHz S RI\n1 0 0 0 0 0 0 0 0\n', line: 2, expected: /3 values on a 1-port/, portCount: 1 },
	{ name: 'a noise line with four values', text: '#\n2 0 0 0 0 0 0 0 0\n1 1 0.5 0 0.2\n1.5 1 0.5 0\n', line: 4, expected: /5 values on a noise data line/ },
	// Option line
	{ name: 'data before the option line', text: '! c\n1 0 0\n# GHz S RI\n', line: 2, expected: /option line .* before any data/ },
	{ name: 'no option line at all', text: '! just a comment\n', line: 2, expected: /only comments/ },
	{ name: 'an empty file', text: '', line: 1, expected: /only comments/ },
	{ name: 'an option line and no data', text: '# GHz S RI R 50\n', line: 2, expected: /at least one line of network data/ },
	{ name: 'an unknown option word', text: '# GHz S XX R 50\n1 0 0\n', line: 1, expected: /one of HZ, KHZ, MHZ, GHZ/ },
	{ name: 'two frequency units', text: '# GHz MHz\n1 0 0\n', line: 1, expected: /at most one frequency unit/ },
	{ name: 'two formats', text: '# RI MA\n1 0 0\n', line: 1, expected: /at most one data format/ },
	{ name: 'Z parameters', text: '# GHz Z RI R 50\n1 0 0\n', line: 1, expected: /parameter type S/ },
	{ name: 'R without a value', text: '# GHz S RI R\n1 0 0\n', line: 1, expected: /reference resistance in ohms after R/ },
	{ name: 'R of zero ohms', text: '# GHz S RI R 0\n1 0 0\n', line: 1, expected: /greater than 0 Ω/ },
	{ name: 'three R values for a 2-port file', text: '# GHz S RI R 50 50 50\n1 0 0 0 0 0 0 0 0\n', line: 1, expected: /1 or 2 R values/ },
	{ name: 'a keyword in a version 1 file', text: '# GHz S RI\n[Number of Ports] 1\n1 0 0\n', line: 2, expected: /\[Version\] 2\.0/ },
	// Version 2 keywords and their order
	{ name: 'an unsupported [Version]', text: '[Version] 3.0\n# GHz S RI\n', line: 1, expected: /version 2\.0 or 2\.1/ },
	{ name: 'a first keyword other than [Version]', text: '[Number of Ports] 1\n', line: 1, expected: /\[Version\] 2\.0 as the first keyword/ },
	{ name: 'no option line after [Version]', text: '[Version] 2.0\n[Number of Ports] 1\n', line: 2, expected: /option line .* after \[Version\]/ },
	{ name: 'per-port R on a 2.0 option line', text: '[Version] 2.0\n# GHz S RI R 50 75\n', line: 2, expected: /one R value on a version 2\.0 option line/ },
	{ name: 'a keyword before [Number of Ports]', text: '[Version] 2.0\n# GHz S RI\n[Number of Frequencies] 1\n', line: 3, expected: /\[Number of Ports\] after the option line/ },
	{ name: 'three ports', text: '[Version] 2.0\n# GHz S RI\n[Number of Ports] 3\n', line: 3, expected: /1 or 2 ports/ },
	{ name: 'a port count that is not a whole number', text: '[Version] 2.0\n# GHz S RI\n[Number of Ports] 1.5\n', line: 3, expected: /whole number/ },
	{ name: 'a port count the file name contradicts', text: '[Version] 2.0\n# GHz S RI\n[Number of Ports] 2\n', line: 3, expected: /as the file name \(\.s1p\) says/, portCount: 1 },
	{ name: 'an unknown keyword', text: '[Version] 2.0\n# GHz S RI\n[Number of Ports] 1\n[Number of Fish] 2\n', line: 4, expected: /one of the keywords/ },
	{ name: 'a repeated keyword', text: '[Version] 2.0\n# GHz S RI\n[Number of Ports] 1\n[Number of Frequencies] 1\n[Number of Frequencies] 1\n', line: 5, expected: /at most one \[Number of Frequencies\]/ },
	{ name: 'a second [Version]', text: '[Version] 2.0\n# GHz S RI\n[Number of Ports] 1\n[Version] 2.0\n', line: 4, expected: /at most one \[Version\]/ },
	{ name: 'a second option line', text: '[Version] 2.0\n# GHz S RI\n[Number of Ports] 1\n# MHz S RI\n', line: 4, expected: /one option line only/ },
	{ name: 'data before [Network Data]', text: '[Version] 2.0\n# GHz S RI\n[Number of Ports] 1\n[Number of Frequencies] 1\n1 0 0\n', line: 5, expected: /\[Network Data\] before the network data/ },
	{ name: '[Network Data] without [Number of Frequencies]', text: '[Version] 2.0\n# GHz S RI\n[Number of Ports] 1\n[Network Data]\n', line: 4, expected: /\[Number of Frequencies\] before \[Network Data\]/ },
	{ name: 'a 2-port file without [Two-Port Data Order]', text: '[Version] 2.0\n# GHz S RI\n[Number of Ports] 2\n[Number of Frequencies] 1\n[Network Data]\n', line: 5, expected: /\[Two-Port Data Order\] before \[Network Data\]/ },
	{ name: '[Two-Port Data Order] in a 1-port file', text: '[Version] 2.0\n# GHz S RI\n[Number of Ports] 1\n[Two-Port Data Order] 12_21\n', line: 4, expected: /no \[Two-Port Data Order\] in a 1-port file/ },
	{ name: 'a bad [Two-Port Data Order] value', text: '[Version] 2.0\n# GHz S RI\n[Number of Ports] 2\n[Two-Port Data Order] 11_22\n', line: 4, expected: /12_21 or 21_12/ },
	{ name: 'a bad [Matrix Format] value', text: '[Version] 2.0\n# GHz S RI\n[Number of Ports] 1\n[Matrix Format] Diagonal\n', line: 4, expected: /Full, Lower or Upper/ },
	{ name: 'mixed-mode data', text: '[Version] 2.0\n# GHz S RI\n[Number of Ports] 2\n[Mixed-Mode Order] D2,1\n', line: 4, expected: /single-ended/ },
	{ name: 'too few [Reference] values', text: `${V2_2PORT_HEAD}[Reference] 50\n[Network Data]\n`, line: 7, expected: /1 more reference value/ },
	{ name: 'too many [Reference] values', text: '[Version] 2.0\n# GHz S RI\n[Number of Ports] 1\n[Reference] 50 75\n', line: 4, expected: /1 reference value\(s\) after \[Reference\]/ },
	{ name: 'a [Reference] value that is not a number', text: '[Version] 2.0\n# GHz S RI\n[Number of Ports] 1\n[Reference] fifty\n', line: 4, expected: /reference resistance/ },
	{ name: 'arguments after [Network Data]', text: '[Version] 2.0\n# GHz S RI\n[Number of Ports] 1\n[Number of Frequencies] 1\n[Network Data] now\n', line: 5, expected: /nothing after \[Network Data\]/ },
	{ name: 'an unclosed [Begin Information]', text: '[Version] 2.0\n# GHz S RI\n[Number of Ports] 1\n[Begin Information]\n[Manufacturer] x\n', line: 6, expected: /\[End Information\]/ },
	// Version 2 network data
	{ name: 'fewer frequencies than announced', text: `${V2_1PORT_HEAD}1 0 0\n[End]\n`, line: 7, expected: /2 frequencies of network data/ },
	{ name: 'more frequencies than announced', text: `${V2_1PORT_HEAD}1 0 0\n2 0 0\n3 0 0\n[End]\n`, line: 8, expected: /\[Noise Data\] or \[End\] after the 2 frequencies/ },
	{ name: 'no [End]', text: `${V2_1PORT_HEAD}1 0 0\n2 0 0\n`, line: 8, expected: /\[End\] after the network data/ },
	{ name: 'data after [End]', text: `${V2_1PORT_HEAD}1 0 0\n2 0 0\n[End]\n3 0 0\n`, line: 9, expected: /nothing but comments after \[End\]/ },
	{ name: 'a header keyword inside the network data', text: `${V2_1PORT_HEAD}1 0 0\n[Reference] 50\n`, line: 7, expected: /network data, \[Noise Data\] or \[End\]/ },
	{ name: 'a pair split across lines', text: `${V2_2PORT_HEAD}[Network Data]\n1 0 0 0\n0 0 0 0 0\n[End]\n`, line: 7, expected: /9 values for one frequency/ },
	{ name: 'a continuation line with an odd count', text: `${V2_2PORT_HEAD}[Network Data]\n1 0 0 0 0\n0 0 0\n[End]\n`, line: 8, expected: /remaining 4 values .* begun on line 7/ },
	{ name: 'a frequency set left unfinished at [End]', text: `${V2_2PORT_HEAD}[Network Data]\n1 0 0 0 0\n[End]\n`, line: 8, expected: /remaining 4 values .* before \[End\]/ },
	{ name: 'a version 2 frequency that does not increase', text: `${V2_1PORT_HEAD}1 0 0\n1 0 0\n[End]\n`, line: 7, expected: /greater than the previous/ },
	{ name: '[Noise Data] without [Number of Noise Frequencies]', text: `${V2_2PORT_HEAD}[Network Data]\n1 0 0 0 0 0 0 0 0\n[Noise Data]\n`, line: 8, expected: /\[Number of Noise Frequencies\] before/ },
	{
		name: 'announced noise data that never comes',
		text: `${V2_2PORT_HEAD}[Number of Noise Frequencies] 1\n[Network Data]\n1 0 0 0 0 0 0 0 0\n[End]\n`,
		line: 9,
		expected: /\[Noise Data\] before \[End\]/
	},
	{
		name: 'a noise frequency count that does not match',
		text: `${V2_2PORT_HEAD}[Number of Noise Frequencies] 2\n[Network Data]\n1 0 0 0 0 0 0 0 0\n[Noise Data]\n1 1 0.5 0 20\n[End]\n`,
		line: 11,
		expected: /2 noise frequencies/
	},
	{ name: 'noise frequencies in a 1-port file', text: '[Version] 2.0\n# GHz S RI\n[Number of Ports] 1\n[Number of Noise Frequencies] 1\n', line: 4, expected: /only in a 2-port file/ }
];

describe('readTouchstone rejects malformed files with the line and what was expected', () => {
	for (const m of malformations) {
		it(`rejects ${m.name}`, () => {
			let caught: unknown;
			try {
				readTouchstone(m.text, { portCount: m.portCount });
			} catch (err) {
				caught = err;
			}
			expect(caught).toBeInstanceOf(TouchstoneError);
			expect(caught).toBeInstanceOf(InputError);
			const err = caught as TouchstoneError;
			expect(err.line).toBe(m.line);
			expect(err.expected).toMatch(m.expected);
			expect(err.issues[0].path).toBe(`line ${m.line}`);
			expect(err.message).toContain(`line ${m.line}:`);
		});
	}
});

// Fragments that reach deep states of the reader when shuffled: keywords, option lines, numbers, junk.
const fragments = [
	'[Version] 2.0', '[Version] 2.1', '# GHz S RI R 50', '# MHz S DB', '# Hz S MA R 50 75', '#', '[Number of Ports] 1', '[Number of Ports] 2',
	'[Two-Port Data Order] 12_21', '[Two-Port Data Order] 21_12', '[Number of Frequencies] 1', '[Number of Frequencies] 2',
	'[Number of Noise Frequencies] 1', '[Reference] 50', '[Reference] 50 75', '75', '[Matrix Format] Lower', '[Matrix Format] Full',
	'[Begin Information]', '[End Information]', '[Network Data]', '[Noise Data]', '[End]', '[Mixed-Mode Order] D2,1',
	'1 0.1 0.2', '2 0.3 -0.4', '1 0 0 0 0 0 0 0 0', '2 1 2 3 4 5 6 7 8', '0.5 1 0.5 0 20', '1 0', '3', 'NaN', '1e999 0 0',
	'! comment', '', '  \t ', '[', ']', '[]', '#####', '1 2 3 ! x', '\u00a0', '1 -0.5 0', '5 0 0'
];
const lineArb = fc.oneof(fc.constantFrom(...fragments), fc.string({ maxLength: 20 }));
const textArb = fc.oneof(
	fc.string({ maxLength: 400 }),
	fc.string({ unit: 'binary', maxLength: 200 }),
	fc.array(lineArb, { maxLength: 16 }).map((ls) => ls.join('\n')),
	fc.tuple(fc.array(lineArb, { maxLength: 16 }), fc.constantFrom('\n', '\r\n', '\r')).map(([ls, eol]) => ls.join(eol))
);

/** Valid files that mutations start from, so that fuzzing reaches the keyword and data states. */
const seedFiles = [
	'# GHz S RI R 50\n1 0.1 0.2\n2 0.3 -0.4\n',
	'#\n1 0 0 0 0 0 0 0 0\n2 0 0 0 0 0 0 0 0\n1 1 0.5 0 0.2\n',
	'[Version] 2.0\n# GHz S RI R 50\n[Number of Ports] 1\n[Number of Frequencies] 2\n[Network Data]\n1 0.1 0.2\n2 0.3 -0.4\n[End]\n',
	readFileSync(join(FIXTURES, 'v2-two-port-12-21-split/input.ts'), 'utf8')
];
const mutatedArb = fc
	.tuple(
		fc.constantFrom(...seedFiles),
		fc.array(fc.tuple(fc.constantFrom('delete', 'duplicate', 'replace', 'swap', 'truncate'), fc.nat(), fc.nat(), lineArb), { minLength: 1, maxLength: 4 })
	)
	.map(([file, edits]) => {
		const ls = file.split('\n');
		for (const [op, a, b, text] of edits) {
			const i = a % ls.length;
			const j = b % ls.length;
			if (op === 'delete') ls.splice(i, 1);
			else if (op === 'duplicate') ls.splice(i, 0, ls[i]);
			else if (op === 'replace') ls[i] = text;
			else if (op === 'swap') [ls[i], ls[j]] = [ls[j], ls[i]];
			else ls[i] = ls[i].slice(0, b % (ls[i].length + 1));
			if (ls.length === 0) ls.push('');
		}
		return ls.join('\n');
	});

describe('readTouchstone under fuzzing', () => {
	it('never throws anything but TouchstoneError, and what it returns is well formed', () => {
		fc.assert(
			fc.property(fc.oneof(textArb, mutatedArb), fc.constantFrom(undefined, 1 as const, 2 as const), (text, portCount) => {
				const lineCount = text.split(/\r\n|\r|\n/).length;
				let net: TouchstoneNetwork;
				try {
					net = readTouchstone(text, { portCount });
				} catch (err) {
					if (!(err instanceof TouchstoneError)) throw err;
					return err.line >= 1 && err.line <= lineCount && err.expected.length > 0;
				}
				const freqs = net.points.map((p) => p.frequencyHz);
				return (
					net.points.length > 0 &&
					freqs.every((f, i) => Number.isFinite(f) && f >= 0 && (i === 0 || f > freqs[i - 1])) &&
					net.points.every((p) => p.s.length === (net.portCount === 1 ? 1 : 4) && p.s.every((v) => Number.isFinite(v.re) && Number.isFinite(v.im))) &&
					net.referenceImpedanceOhm.length === net.portCount
				);
			}),
			{ numRuns: 5000, seed: 20261207 }
		);
	});
});
