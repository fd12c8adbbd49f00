// Strict Touchstone reader: text in, a 1- or 2-port S-parameter network out, or a TouchstoneError naming the line.
//
// Rules follow the Touchstone File Format Specification, IBIS Open Forum, version 2.0 (2009) and 2.1
// (with TSIRD 4.1: [End] required; TSIRD 5.1: per-port R on the option line = "version 1.1").
// Section names below are that document's; where a rule is recalled rather than read it says "from memory".
import { complexFromPair } from './complex-pair';
import { TouchstoneError } from './touchstone-error';
import {
	HZ_PER_FREQUENCY_UNIT,
	type Complex,
	type DataFormat,
	type FrequencyUnit,
	type NetworkPoint,
	type NoisePoint,
	type PortCount,
	type TouchstoneNetwork,
	type TouchstoneVersion
} from './touchstone-network';

export interface ReadTouchstoneOptions {
	/** Port count the file name promises (.s1p → 1, .s2p → 2); the file must agree. Inferred when absent. */
	portCount?: PortCount;
}

/** One line with its comment removed. */
interface SourceLine {
	/** 1-based line number. */
	lineNo: number;
	/** Content before any '!', trimmed of spaces and tabs. */
	text: string;
}

interface OptionLine {
	frequencyUnit: FrequencyUnit;
	format: DataFormat;
	referenceImpedanceOhm: number[];
	lineNo: number;
}

/**
 * Decimal number as the specification's data lines use it: optional sign, digits with an optional point,
 * optional exponent. Words such as NaN or Infinity are not numbers here.
 */
const NUMBER_PATTERN = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;
const POSITIVE_INTEGER_PATTERN = /^\+?\d+$/;
/** Spaces and tabs separate entries ("General syntax rules": whitespace; tabs discouraged but allowed). */
const SEPARATOR = /[ \t]+/;

const FREQUENCY_UNIT_WORDS: Readonly<Record<string, FrequencyUnit>> = { HZ: 'Hz', KHZ: 'kHz', MHZ: 'MHz', GHZ: 'GHz' };
const PARAMETER_WORDS = new Set(['S', 'Y', 'Z', 'H', 'G']);
const FORMAT_WORDS = new Set<string>(['RI', 'MA', 'DB']);
const OPTION_EXPECTED = 'one of HZ, KHZ, MHZ, GHZ, S, DB, MA, RI or "R <ohms>" on the option line';

const KEYWORDS = {
	version: 'Version',
	ports: 'Number of Ports',
	twoPortOrder: 'Two-Port Data Order',
	frequencies: 'Number of Frequencies',
	noiseFrequencies: 'Number of Noise Frequencies',
	reference: 'Reference',
	matrixFormat: 'Matrix Format',
	mixedMode: 'Mixed-Mode Order',
	beginInformation: 'Begin Information',
	endInformation: 'End Information',
	networkData: 'Network Data',
	noiseData: 'Noise Data',
	end: 'End'
} as const;
const KEYWORD_LIST = Object.values(KEYWORDS)
	.map((k) => `[${k}]`)
	.join(', ');

/** Reads a Touchstone file. Never throws anything but TouchstoneError for bad text. */
export function readTouchstone(text: string, options: ReadTouchstoneOptions = {}): TouchstoneNetwork {
	const rawLines = text.split(/\r\n|\r|\n/);
	const lines: SourceLine[] = [];
	rawLines.forEach((raw, i) => {
		// "Comment lines": everything from '!' to the end of the line is a comment.
		const bang = raw.indexOf('!');
		const content = (bang === -1 ? raw : raw.slice(0, bang)).replace(/^[ \t]+|[ \t]+$/g, '');
		if (content !== '') lines.push({ lineNo: i + 1, text: content });
	});
	const endLineNo = rawLines.length;
	if (lines.length === 0) throw new TouchstoneError(endLineNo, 'an option line and network data (the file holds only comments)', '');
	return isKeywordLine(lines[0].text) ? readVersion2(lines, endLineNo, options) : readVersion1(lines, endLineNo, options);
}

function isKeywordLine(text: string): boolean {
	return text.startsWith('[');
}

function tokens(text: string): string[] {
	return text.split(SEPARATOR);
}

function parseNumber(token: string, lineNo: number, what: string): number {
	if (!NUMBER_PATTERN.test(token)) throw new TouchstoneError(lineNo, `${what} (decimal, like 2.45 or -1.5e-3)`, token);
	const value = Number(token);
	if (!Number.isFinite(value)) throw new TouchstoneError(lineNo, `${what} (finite; this one overflows)`, token);
	return value;
}

function parsePositiveInteger(token: string | undefined, lineNo: number, what: string): number {
	if (token === undefined) throw new TouchstoneError(lineNo, `${what} (a whole number ≥ 1)`, '');
	const value = POSITIVE_INTEGER_PATTERN.test(token) ? Number(token) : NaN;
	if (!Number.isSafeInteger(value) || value < 1) throw new TouchstoneError(lineNo, `${what} (a whole number ≥ 1)`, token);
	return value;
}

function parseResistance(token: string, lineNo: number): number {
	const value = parseNumber(token, lineNo, 'a reference resistance in ohms');
	if (value <= 0) throw new TouchstoneError(lineNo, 'a reference resistance greater than 0 Ω', token);
	return value;
}

/**
 * "Option line": `# [HZ|KHZ|MHZ|GHZ] [S|Y|Z|H|G] [DB|MA|RI] [R n]`, case-insensitive, in any order,
 * each field optional with defaults GHz, S, MA, R 50. Version 1.1 / 2.1 may list one R value per port.
 */
function parseOptionLine(line: SourceLine, allowPerPortResistance: boolean): OptionLine {
	const words = tokens(line.text.slice(1)).filter((w) => w !== '');
	let frequencyUnit: FrequencyUnit | undefined;
	let format: DataFormat | undefined;
	let parameterSeen = false;
	let resistances: number[] | undefined;
	for (let i = 0; i < words.length; i++) {
		const word = words[i];
		const upper = word.toUpperCase();
		const duplicate = (field: string) => new TouchstoneError(line.lineNo, `at most one ${field} on the option line`, word);
		if (upper in FREQUENCY_UNIT_WORDS) {
			if (frequencyUnit) throw duplicate('frequency unit');
			frequencyUnit = FREQUENCY_UNIT_WORDS[upper];
		} else if (PARAMETER_WORDS.has(upper)) {
			if (parameterSeen) throw duplicate('parameter type');
			if (upper !== 'S') throw new TouchstoneError(line.lineNo, 'parameter type S (this reader takes S-parameter data only)', word);
			parameterSeen = true;
		} else if (FORMAT_WORDS.has(upper)) {
			if (format) throw duplicate('data format');
			format = upper as DataFormat;
		} else if (upper === 'R') {
			if (resistances) throw duplicate('R');
			resistances = [];
			while (i + 1 < words.length && NUMBER_PATTERN.test(words[i + 1])) resistances.push(parseResistance(words[++i], line.lineNo));
			if (resistances.length === 0) throw new TouchstoneError(line.lineNo, 'a reference resistance in ohms after R', words[i + 1] ?? '');
			if (resistances.length > 1 && !allowPerPortResistance) {
				throw new TouchstoneError(line.lineNo, 'one R value on a version 2.0 option line (per-port values go in [Reference])', words.slice(i - resistances.length, i + 1).join(' '));
			}
		} else {
			throw new TouchstoneError(line.lineNo, OPTION_EXPECTED, word);
		}
	}
	return { frequencyUnit: frequencyUnit ?? 'GHz', format: format ?? 'MA', referenceImpedanceOhm: resistances ?? [50], lineNo: line.lineNo };
}

/** Pair count written per frequency, and how to turn it into [S11, S21, S12, S22] (or [S11]). */
interface DataLayout {
	pairCount: number;
	toStandardOrder(values: Complex[]): Complex[];
}

const ONE_PORT: DataLayout = { pairCount: 1, toStandardOrder: (v) => v };
/** Version 1 and `[Two-Port Data Order] 21_12`: N11 N21 N12 N22. */
const TWO_PORT_21_12: DataLayout = { pairCount: 4, toStandardOrder: (v) => v };
/** `[Two-Port Data Order] 12_21`: N11 N12 N21 N22. */
const TWO_PORT_12_21: DataLayout = { pairCount: 4, toStandardOrder: ([s11, s12, s21, s22]) => [s11, s21, s12, s22] };
/** `[Matrix Format] Lower`: N11, N21 N22 (reciprocal: N12 = N21). */
const TWO_PORT_LOWER: DataLayout = { pairCount: 3, toStandardOrder: ([s11, s21, s22]) => [s11, s21, s21, s22] };
/** `[Matrix Format] Upper`: N11 N12, N22 (reciprocal: N21 = N12). */
const TWO_PORT_UPPER: DataLayout = { pairCount: 3, toStandardOrder: ([s11, s12, s22]) => [s11, s12, s12, s22] };

/** Turns the numbers of one frequency set into a point, checking frequency order and magnitudes. */
function buildPoint(
	values: number[],
	lineNo: number,
	option: OptionLine,
	layout: DataLayout,
	previousHz: number | undefined
): NetworkPoint {
	const frequencyHz = checkedFrequencyHz(values[0], lineNo, option, previousHz);
	const pairs: Complex[] = [];
	for (let p = 0; p < layout.pairCount; p++) {
		const first = values[1 + 2 * p];
		if (option.format === 'MA' && first < 0) throw new TouchstoneError(lineNo, 'a magnitude ≥ 0 in MA data', String(first));
		const value = complexFromPair(option.format, first, values[2 + 2 * p]);
		if (!Number.isFinite(value.re) || !Number.isFinite(value.im)) {
			throw new TouchstoneError(lineNo, `a pair with a finite value (${option.format} ${first} overflows)`, `${first} ${values[2 + 2 * p]}`);
		}
		pairs.push(value);
	}
	return { frequencyHz, s: layout.toStandardOrder(pairs) };
}

/** "Data lines": frequencies are ≥ 0 and data sets are in strictly increasing frequency. */
function checkedFrequencyHz(value: number, lineNo: number, option: OptionLine, previousHz: number | undefined): number {
	if (value < 0) throw new TouchstoneError(lineNo, 'a frequency ≥ 0', String(value));
	const frequencyHz = value * HZ_PER_FREQUENCY_UNIT[option.frequencyUnit];
	if (!Number.isFinite(frequencyHz)) throw new TouchstoneError(lineNo, 'a finite frequency', String(value));
	if (previousHz !== undefined && !(frequencyHz > previousHz)) {
		throw new TouchstoneError(lineNo, `a frequency greater than the previous one (${previousHz / HZ_PER_FREQUENCY_UNIT[option.frequencyUnit]} ${option.frequencyUnit})`, String(value));
	}
	return frequencyHz;
}

/** Noise parameter line: frequency, NFmin (dB), |Γopt|, ∠Γopt (degrees), Rn. */
function buildNoisePoint(line: SourceLine, option: OptionLine, previousHz: number | undefined): NoisePoint {
	const words = tokens(line.text);
	if (words.length !== 5) {
		throw new TouchstoneError(line.lineNo, '5 values on a noise data line (frequency, NFmin dB, |Γopt|, ∠Γopt, Rn)', line.text);
	}
	const values = words.map((w) => parseNumber(w, line.lineNo, 'a number'));
	const frequencyHz = checkedFrequencyHz(values[0], line.lineNo, option, previousHz);
	if (values[2] < 0) throw new TouchstoneError(line.lineNo, 'a magnitude |Γopt| ≥ 0', words[2]);
	return {
		frequencyHz,
		minimumNoiseFigureDb: values[1],
		optimumSourceReflection: complexFromPair('MA', values[2], values[3]),
		noiseResistance: values[4]
	};
}

function checkResistanceCount(option: OptionLine, portCount: PortCount): void {
	const n = option.referenceImpedanceOhm.length;
	if (n !== 1 && n !== portCount) {
		throw new TouchstoneError(option.lineNo, `1 or ${portCount} R values for a ${portCount}-port file`, `${n} values`);
	}
}

function perPort(option: OptionLine, portCount: PortCount): number[] {
	const r = option.referenceImpedanceOhm;
	return r.length === portCount ? [...r] : Array.from({ length: portCount }, () => r[0]);
}

/** Version 1.x: comments, one option line, then one data line per frequency (1- and 2-port). */
function readVersion1(lines: SourceLine[], endLineNo: number, options: ReadTouchstoneOptions): TouchstoneNetwork {
	let option: OptionLine | undefined;
	let portCount: PortCount | undefined = options.portCount;
	const points: NetworkPoint[] = [];
	const noise: NoisePoint[] = [];
	for (const line of lines) {
		if (line.text.startsWith('#')) {
			// "Option line": only the first option line counts; later ones are ignored (version 1 rule).
			if (!option) option = parseOptionLine(line, true);
			continue;
		}
		if (isKeywordLine(line.text)) {
			throw new TouchstoneError(line.lineNo, 'a data line (keywords need "[Version] 2.0" as the first keyword of the file)', line.text);
		}
		if (!option) throw new TouchstoneError(line.lineNo, 'the option line ("# <unit> S <format> R <ohms>") before any data', line.text);
		const words = tokens(line.text);
		if (portCount === undefined) {
			if (words.length === 3) portCount = 1;
			else if (words.length === 9) portCount = 2;
			else throw new TouchstoneError(line.lineNo, '3 values (1-port: frequency and one pair) or 9 values (2-port: frequency and four pairs)', line.text);
		}
		const previousHz = points.length > 0 ? points[points.length - 1].frequencyHz : undefined;
		// Two-port noise data follows the network data; its first frequency is ≤ the last network frequency.
		if (portCount === 2 && (noise.length > 0 || (words.length === 5 && previousHz !== undefined && startsNoise(words[0], option, previousHz)))) {
			noise.push(buildNoisePoint(line, option, noise.length > 0 ? noise[noise.length - 1].frequencyHz : undefined));
			continue;
		}
		const expectedCount = portCount === 1 ? 3 : 9;
		if (words.length !== expectedCount) {
			const what = portCount === 1 ? '3 values on a 1-port data line (frequency and one pair)' : '9 values on a 2-port data line (frequency and four pairs)';
			throw new TouchstoneError(line.lineNo, what, line.text);
		}
		const values = words.map((w) => parseNumber(w, line.lineNo, 'a number'));
		points.push(buildPoint(values, line.lineNo, option, portCount === 1 ? ONE_PORT : TWO_PORT_21_12, previousHz));
	}
	if (!option) throw new TouchstoneError(endLineNo, 'an option line ("# <unit> S <format> R <ohms>")', '');
	if (points.length === 0 || portCount === undefined) throw new TouchstoneError(endLineNo, 'at least one line of network data', '');
	checkResistanceCount(option, portCount);
	return {
		version: '1',
		portCount,
		frequencyUnit: option.frequencyUnit,
		format: option.format,
		referenceImpedanceOhm: perPort(option, portCount),
		points,
		noise
	};
}

function startsNoise(frequencyToken: string, option: OptionLine, lastNetworkHz: number): boolean {
	if (!NUMBER_PATTERN.test(frequencyToken)) return false;
	return Number(frequencyToken) * HZ_PER_FREQUENCY_UNIT[option.frequencyUnit] <= lastNetworkHz;
}

interface Keyword {
	/** Canonical name, e.g. "Number of Ports". */
	name: string;
	/** Arguments after the closing bracket. */
	args: string[];
}

function parseKeyword(line: SourceLine): Keyword {
	const match = /^\[([^\]]*)\](.*)$/.exec(line.text);
	if (!match) throw new TouchstoneError(line.lineNo, 'a keyword in square brackets, e.g. [Number of Ports]', line.text);
	const inner = match[1].trim().toLowerCase();
	const name = Object.values(KEYWORDS).find((k) => k.toLowerCase() === inner);
	if (!name) throw new TouchstoneError(line.lineNo, `one of the keywords ${KEYWORD_LIST}`, `[${match[1]}]`);
	const rest = match[2].trim();
	return { name, args: rest === '' ? [] : tokens(rest) };
}

function noArguments(keyword: Keyword, line: SourceLine): void {
	if (keyword.args.length > 0) throw new TouchstoneError(line.lineNo, `nothing after [${keyword.name}]`, keyword.args.join(' '));
}

function oneArgument(keyword: Keyword, line: SourceLine, what: string): string {
	if (keyword.args.length !== 1) throw new TouchstoneError(line.lineNo, `${what} after [${keyword.name}]`, keyword.args.join(' '));
	return keyword.args[0];
}

type Phase = 'version' | 'option' | 'ports' | 'header' | 'information' | 'network' | 'noise' | 'end';

/** Version 2.0 / 2.1 keyword files. */
function readVersion2(lines: SourceLine[], endLineNo: number, options: ReadTouchstoneOptions): TouchstoneNetwork {
	let phase: Phase = 'version';
	let version: TouchstoneVersion = '2.0';
	let option: OptionLine | undefined;
	let portCount: PortCount = 1;
	let twoPortOrder: '12_21' | '21_12' | undefined;
	let matrixFormat: 'full' | 'lower' | 'upper' = 'full';
	let frequencyCount: { value: number; lineNo: number } | undefined;
	let noiseFrequencyCount: { value: number; lineNo: number } | undefined;
	let reference: { values: number[]; lineNo: number } | undefined;
	const seen = new Set<string>();
	let layout: DataLayout = ONE_PORT;
	const points: NetworkPoint[] = [];
	const noise: NoisePoint[] = [];
	/** Numbers of the frequency set being read (version 2.0 lets a set continue on following lines). */
	let openSet: { values: number[]; lineNo: number } | undefined;
	let setSize = 3;

	const closeNetwork = (line: SourceLine, what: string) => {
		if (openSet) {
			throw new TouchstoneError(line.lineNo, `the remaining ${setSize - openSet.values.length} values of the frequency set begun on line ${openSet.lineNo} before ${what}`, line.text);
		}
		if (frequencyCount && points.length !== frequencyCount.value) {
			throw new TouchstoneError(line.lineNo, `${frequencyCount.value} frequencies of network data, as [Number of Frequencies] on line ${frequencyCount.lineNo} says, before ${what}`, `${points.length} frequencies`);
		}
	};

	for (const line of lines) {
		if (phase === 'information') {
			// [Begin Information] … [End Information]: descriptive keywords we neither need nor check.
			if (/^\[[ \t]*end information[ \t]*\]/i.test(line.text)) {
				noArguments(parseKeyword(line), line);
				phase = 'header';
			}
			continue;
		}
		const keyword = isKeywordLine(line.text) ? parseKeyword(line) : undefined;
		if (phase === 'end') throw new TouchstoneError(line.lineNo, 'nothing but comments after [End]', line.text);

		if (phase === 'version') {
			// "[Version]": the first non-comment line of a version 2 file.
			if (keyword?.name !== KEYWORDS.version) throw new TouchstoneError(line.lineNo, '[Version] 2.0 as the first keyword', line.text);
			const value = oneArgument(keyword, line, 'the version number 2.0 or 2.1');
			if (value !== '2.0' && value !== '2.1') throw new TouchstoneError(line.lineNo, 'version 2.0 or 2.1 after [Version]', value);
			version = value;
			seen.add(keyword.name);
			phase = 'option';
			continue;
		}
		if (phase === 'option') {
			// The option line follows [Version] and comes before [Number of Ports] (from memory).
			if (!line.text.startsWith('#')) throw new TouchstoneError(line.lineNo, 'the option line ("# <unit> S <format> R <ohms>") after [Version]', line.text);
			option = parseOptionLine(line, version === '2.1');
			phase = 'ports';
			continue;
		}
		if (line.text.startsWith('#')) throw new TouchstoneError(line.lineNo, 'one option line only (a version 2 file has exactly one)', line.text);
		if (!option) throw new TouchstoneError(line.lineNo, 'the option line', line.text);

		if (phase === 'ports') {
			if (keyword?.name !== KEYWORDS.ports) throw new TouchstoneError(line.lineNo, '[Number of Ports] after the option line', line.text);
			const n = parsePositiveInteger(oneArgument(keyword, line, 'the number of ports'), line.lineNo, 'the number of ports');
			if (n !== 1 && n !== 2) throw new TouchstoneError(line.lineNo, '1 or 2 ports (this reader takes 1-port and 2-port data)', String(n));
			if (options.portCount !== undefined && n !== options.portCount) {
				throw new TouchstoneError(line.lineNo, `${options.portCount} port${options.portCount === 1 ? '' : 's'}, as the file name (.s${options.portCount}p) says`, String(n));
			}
			portCount = n;
			seen.add(keyword.name);
			phase = 'header';
			continue;
		}

		if (phase === 'header') {
			if (reference && reference.values.length < portCount && !keyword) {
				// "[Reference]": its values may continue on the following lines.
				for (const w of tokens(line.text)) {
					if (reference.values.length === portCount) throw new TouchstoneError(line.lineNo, `${portCount} reference values in all for [Reference] on line ${reference.lineNo}`, w);
					reference.values.push(parseResistance(w, line.lineNo));
				}
				continue;
			}
			if (reference && reference.values.length < portCount) {
				throw new TouchstoneError(line.lineNo, `${portCount - reference.values.length} more reference value(s) for [Reference] on line ${reference.lineNo}`, line.text);
			}
			if (!keyword) throw new TouchstoneError(line.lineNo, '[Network Data] before the network data', line.text);
			if (seen.has(keyword.name)) throw new TouchstoneError(line.lineNo, `at most one [${keyword.name}]`, line.text);
			seen.add(keyword.name);
			switch (keyword.name) {
				case KEYWORDS.twoPortOrder: {
					// Required for 2-port files and not allowed otherwise (TSIRD 4.1; from memory for the ban).
					const value = oneArgument(keyword, line, '12_21 or 21_12');
					if (portCount !== 2) throw new TouchstoneError(line.lineNo, 'no [Two-Port Data Order] in a 1-port file', line.text);
					if (value !== '12_21' && value !== '21_12') throw new TouchstoneError(line.lineNo, '12_21 or 21_12 after [Two-Port Data Order]', value);
					twoPortOrder = value;
					break;
				}
				case KEYWORDS.frequencies:
					frequencyCount = { value: parsePositiveInteger(oneArgument(keyword, line, 'the number of frequencies'), line.lineNo, 'the number of frequencies'), lineNo: line.lineNo };
					break;
				case KEYWORDS.noiseFrequencies:
					if (portCount !== 2) throw new TouchstoneError(line.lineNo, 'noise data only in a 2-port file', line.text);
					noiseFrequencyCount = { value: parsePositiveInteger(oneArgument(keyword, line, 'the number of noise frequencies'), line.lineNo, 'the number of noise frequencies'), lineNo: line.lineNo };
					break;
				case KEYWORDS.reference:
					reference = { values: [], lineNo: line.lineNo };
					for (const w of keyword.args) {
						if (reference.values.length === portCount) throw new TouchstoneError(line.lineNo, `${portCount} reference value(s) after [Reference]`, w);
						reference.values.push(parseResistance(w, line.lineNo));
					}
					break;
				case KEYWORDS.matrixFormat: {
					const value = oneArgument(keyword, line, 'Full, Lower or Upper').toLowerCase();
					if (value !== 'full' && value !== 'lower' && value !== 'upper') throw new TouchstoneError(line.lineNo, 'Full, Lower or Upper after [Matrix Format]', keyword.args[0]);
					matrixFormat = value;
					break;
				}
				case KEYWORDS.mixedMode:
					throw new TouchstoneError(line.lineNo, 'single-ended network data (this reader does not take [Mixed-Mode Order] files)', line.text);
				case KEYWORDS.beginInformation:
					noArguments(keyword, line);
					phase = 'information';
					break;
				case KEYWORDS.networkData:
					noArguments(keyword, line);
					if (!frequencyCount) throw new TouchstoneError(line.lineNo, '[Number of Frequencies] before [Network Data]', line.text);
					if (portCount === 2 && !twoPortOrder) throw new TouchstoneError(line.lineNo, '[Two-Port Data Order] before [Network Data] in a 2-port file', line.text);
					layout =
						portCount === 1
							? ONE_PORT
							: matrixFormat === 'lower'
								? TWO_PORT_LOWER
								: matrixFormat === 'upper'
									? TWO_PORT_UPPER
									: twoPortOrder === '12_21'
										? TWO_PORT_12_21
										: TWO_PORT_21_12;
					setSize = 1 + 2 * layout.pairCount;
					phase = 'network';
					break;
				default:
					throw new TouchstoneError(line.lineNo, `[Network Data] before [${keyword.name}]`, line.text);
			}
			continue;
		}

		if (phase === 'network') {
			if (keyword) {
				if (keyword.name === KEYWORDS.noiseData) {
					noArguments(keyword, line);
					closeNetwork(line, '[Noise Data]');
					if (!noiseFrequencyCount) throw new TouchstoneError(line.lineNo, '[Number of Noise Frequencies] before [Network Data] when the file has [Noise Data]', line.text);
					phase = 'noise';
					continue;
				}
				if (keyword.name === KEYWORDS.end) {
					noArguments(keyword, line);
					closeNetwork(line, '[End]');
					if (noiseFrequencyCount) throw new TouchstoneError(line.lineNo, `[Noise Data] before [End], as [Number of Noise Frequencies] on line ${noiseFrequencyCount.lineNo} promises`, line.text);
					phase = 'end';
					continue;
				}
				throw new TouchstoneError(line.lineNo, 'network data, [Noise Data] or [End]', line.text);
			}
			const words = tokens(line.text);
			const values = words.map((w) => parseNumber(w, line.lineNo, 'a number'));
			if (!openSet) {
				// A complex pair is never split across lines, so a set begins on a line with an odd count of values.
				if (frequencyCount && points.length === frequencyCount.value) {
					throw new TouchstoneError(line.lineNo, `[Noise Data] or [End] after the ${frequencyCount.value} frequencies [Number of Frequencies] on line ${frequencyCount.lineNo} announces`, line.text);
				}
				if (values.length % 2 === 0 || values.length > setSize) {
					throw new TouchstoneError(line.lineNo, `${setSize} values for one frequency (frequency and ${layout.pairCount} pair${layout.pairCount === 1 ? '' : 's'}), or its first part ending on a whole pair`, line.text);
				}
				openSet = { values, lineNo: line.lineNo };
			} else {
				const remaining = setSize - openSet.values.length;
				if (values.length % 2 !== 0 || values.length > remaining) {
					throw new TouchstoneError(line.lineNo, `the remaining ${remaining} values (whole pairs) of the frequency set begun on line ${openSet.lineNo}`, line.text);
				}
				for (const v of values) openSet.values.push(v);
			}
			if (openSet.values.length === setSize) {
				const previousHz = points.length > 0 ? points[points.length - 1].frequencyHz : undefined;
				points.push(buildPoint(openSet.values, openSet.lineNo, option, layout, previousHz));
				openSet = undefined;
			}
			continue;
		}

		// phase === 'noise'
		if (keyword) {
			if (keyword.name !== KEYWORDS.end) throw new TouchstoneError(line.lineNo, 'noise data or [End]', line.text);
			noArguments(keyword, line);
			if (noiseFrequencyCount && noise.length !== noiseFrequencyCount.value) {
				throw new TouchstoneError(line.lineNo, `${noiseFrequencyCount.value} noise frequencies, as [Number of Noise Frequencies] on line ${noiseFrequencyCount.lineNo} says, before [End]`, `${noise.length} frequencies`);
			}
			phase = 'end';
			continue;
		}
		if (noiseFrequencyCount && noise.length === noiseFrequencyCount.value) {
			throw new TouchstoneError(line.lineNo, `[End] after the ${noiseFrequencyCount.value} noise frequencies announced on line ${noiseFrequencyCount.lineNo}`, line.text);
		}
		noise.push(buildNoisePoint(line, option, noise.length > 0 ? noise[noise.length - 1].frequencyHz : undefined));
	}

	if (phase !== 'end') {
		const expected: Record<Exclude<Phase, 'end'>, string> = {
			version: '[Version]',
			option: 'the option line after [Version]',
			ports: '[Number of Ports]',
			header: '[Network Data] and the network data',
			information: '[End Information]',
			network: '[End] after the network data',
			noise: '[End] after the noise data'
		};
		throw new TouchstoneError(endLineNo, expected[phase], '');
	}
	if (!option) throw new TouchstoneError(endLineNo, 'the option line', '');
	checkResistanceCount(option, portCount);
	return {
		version,
		portCount,
		frequencyUnit: option.frequencyUnit,
		format: option.format,
		// "[Reference]" overrides the option line's R for every port.
		referenceImpedanceOhm: reference ? reference.values : perPort(option, portCount),
		points,
		noise
	};
}
