// `size`: sizes one design from a design-input JSON file, stdin or flags, and prints one JSON object.
import { readFileSync } from 'node:fs';
import { defaultFeedFor, formatIssue, InputError, parseDesignInput, patchShapes, type PatchShape } from '../../lib/schemas';
import { size, sizingReport } from '../../lib/rf';
import { hzFromGhz } from '../../lib/units';
import { UsageError } from '../usage-error';

export const summary = 'size a patch antenna (design-input JSON file, - for stdin, or flags); prints one JSON object';

/** Flag → where its value goes in the design-input document, and how it is converted. */
const FLAGS: Record<string, { path: string[]; kind: 'number' | 'string'; convert?: (n: number) => number; text: string }> = {
	'--shape': { path: ['shape'], kind: 'string', text: 'rectangular | circular | truncated-corner | nearly-square (default rectangular)' },
	'--feed': { path: ['feed'], kind: 'string', text: 'inset | probe | edge | quarter-wave | aperture-coupled | proximity-coupled (default inset; probe for circular and nearly-square; the coupled feeds need a stack in the file)' },
	'--frequency-ghz': { path: ['frequencyHz'], kind: 'number', convert: hzFromGhz, text: 'design frequency f0 in GHz, 0.1–100' },
	'--er': { path: ['substrate', 'relativePermittivity'], kind: 'number', text: 'substrate relative permittivity εr, (1, 30]' },
	'--height-mm': { path: ['substrate', 'heightMm'], kind: 'number', text: 'substrate thickness h in mm, (0, λ0/4)' },
	'--loss-tangent': { path: ['substrate', 'lossTangent'], kind: 'number', text: 'dielectric loss tangent tanδ, [0, 1) (default: the typical value of the εr class, with a warning)' },
	'--copper-um': { path: ['substrate', 'copperThicknessUm'], kind: 'number', text: 'copper thickness in µm, [1, 210] (default 35 = 1 oz)' },
	'--er-tolerance': { path: ['substrate', 'relativePermittivityTolerance'], kind: 'number', text: '± tolerance on εr, [0, 5] (default 0)' },
	'--height-tolerance-mm': { path: ['substrate', 'heightToleranceMm'], kind: 'number', text: '± tolerance on h in mm, [0, 10] (default 0)' },
	'--target-ohm': { path: ['targetImpedanceOhm'], kind: 'number', text: 'input resistance the feed point should present, [10, 200] Ω (default 50)' },
	'--line-ohm': { path: ['feedLineImpedanceOhm'], kind: 'number', text: 'feed line impedance, [10, 200] Ω (default 50)' },
	'--width-mm': { path: ['patchWidthMm'], kind: 'number', text: 'fix the patch width in mm (rectangular only); only the length is solved' },
	'--ground-margin-mm': { path: ['groundMarginMm'], kind: 'number', text: 'ground/substrate margin beyond the patch on every side, mm (default 3h)' },
	'--notch-gap-mm': { path: ['inset', 'notchGapMm'], kind: 'number', text: 'gap each side of the line in the inset notch, mm (default: the feed-line width)' },
	'--drill-mm': { path: ['probe', 'drillDiameterMm'], kind: 'number', text: 'probe drill diameter, mm (default 1.3)' },
	'--clearance-mm': { path: ['probe', 'clearanceDiameterMm'], kind: 'number', text: 'probe anti-pad diameter in the ground, mm (default 4.1)' },
	'--handedness': { path: ['handedness'], kind: 'string', text: 'rhcp | lhcp for circularly polarised shapes (default rhcp)' },
	'--name': { path: ['name'], kind: 'string', text: 'design name (default "Untitled patch")' },
	'--columns': { path: ['array', 'columns'], kind: 'number', text: 'array: elements along x, a power of two 1–64 (makes the design an array)' },
	'--rows': { path: ['array', 'rows'], kind: 'number', text: 'array: elements along y, a power of two 1–64 (default 1)' },
	'--spacing-x-wl': { path: ['array', 'spacingXWavelengths'], kind: 'number', text: 'array: pitch along x in λ0, [0.3, 2] (default 0.7)' },
	'--spacing-y-wl': { path: ['array', 'spacingYWavelengths'], kind: 'number', text: 'array: pitch along y in λ0, [0.3, 2] (default 0.7)' },
	'--scan-deg': { path: ['array', 'scanAngleDeg'], kind: 'number', text: 'array: largest scan angle from broadside, [0, 80]° (default 0)' },
	'--parasitic-ratio': { path: ['parasitic', 'sizeRatio'], kind: 'number', text: 'stacked parasitic patch size over the driven one, [0.8, 1.3] (default 1.07; needs a three-copper stack)' },
	'--slot-length-mm': { path: ['slot', 'lengthMm'], kind: 'number', text: 'aperture-coupled slot length, mm (default half the patch length)' },
	'--slot-width-mm': { path: ['slot', 'widthMm'], kind: 'number', text: 'aperture-coupled slot width, mm (default a tenth of its length)' },
	'--stub-length-mm': { path: ['slot', 'stubLengthMm'], kind: 'number', text: 'aperture-coupled open stub past the slot, mm (default λg/4)' },
	'--overlap-mm': { path: ['proximity', 'overlapMm'], kind: 'number', text: 'proximity-coupled line overlap under the patch, mm (default half the patch length)' }
};

export const help = [
	'Usage: npm run cli -- size [design.json | -] [flags]',
	'',
	'Sizes one microstrip patch antenna and prints ONE JSON object: `input` (the complete design-input',
	'document as understood, accepted by export and the API), every derived quantity with its unit in',
	'its key (patchWidthMm, patchLengthMm or patchRadiusMm, effectivePermittivity, fringeExtensionMm,',
	'effectiveLengthMm, slotConductanceS, mutualConductanceS (rectangular family) or effectiveRadiusMm,',
	'radiationConductanceS (circular), edgeResistanceOhm, radiationEdgeResistanceOhm, resonanceAccuracy,',
	'textbook (the textbook model\'s figures for comparison), insetDepthMm or',
	'probeOffsetMm, feedLineWidthMm, transformerImpedanceOhm/WidthMm/LengthMm, groundWidthMm,',
	'groundLengthMm, …), `estimates` (labelled estimates: bandwidth, Q, directivity, efficiency, gain)',
	'and `warnings`.',
	'',
	'Input: a design-input JSON file, `-` to read it from stdin, or flags alone (they override the',
	'file). `npm run cli -- schema design-input` prints the document\'s JSON Schema. A stack of several',
	'substrates (`stack`: copper, dielectric…, copper, top to bottom) is given in the file; arrays add',
	'`array` (spacing, grating-lobe limit, corporate feed with its routed path length and line loss per mm,',
	'array-factor directivity, gain with its breakdown `factor.gainBreakdown`: element gain, 10·log N,',
	'feed-line loss, mismatch loss; beamwidths, pattern); a stacked parasitic patch adds `parasitic.cover`',
	'(covered-microstrip εeff of the driven patch) and `parasitic.bandwidth` (the pair\'s bandwidth, an estimate).',
	'',
	'Flags (--flag value or --flag=value):',
	...Object.entries(FLAGS).map(([flag, f]) => `  ${flag.padEnd(22)} ${f.text}`),
	'  --help                 this text',
	'',
	'Exit codes: 0 ok; 2 bad input, with one line on stderr naming the field, the value and the allowed range.',
	'Example: npm run cli -- size --frequency-ghz 2.45 --er 4.4 --height-mm 1.6 --loss-tangent 0.02'
].join('\n');


function setAt(doc: Record<string, unknown>, path: string[], value: unknown): void {
	let node = doc;
	for (const key of path.slice(0, -1)) {
		const next = node[key];
		if (next === null || typeof next !== 'object' || Array.isArray(next)) node[key] = {};
		node = node[key] as Record<string, unknown>;
	}
	node[path[path.length - 1]] = value;
}

/** A number when the text is one; otherwise the text itself, so validation names the field and the value. */
function numberOrText(text: string, convert?: (n: number) => number): unknown {
	const n = Number(text);
	if (text.trim() === '' || !Number.isFinite(n)) return text;
	return convert ? convert(n) : n;
}

function readDocument(source: string): Record<string, unknown> {
	let text: string;
	try {
		text = readFileSync(source === '-' ? 0 : source, 'utf8');
	} catch (err) {
		throw new UsageError(`${source === '-' ? 'stdin' : source}: cannot read (${err instanceof Error ? err.message : String(err)})`);
	}
	let doc: unknown;
	try {
		doc = JSON.parse(text);
	} catch (err) {
		throw new UsageError(`${source === '-' ? 'stdin' : source}: not valid JSON (${err instanceof Error ? err.message : String(err)})`);
	}
	if (doc === null || typeof doc !== 'object' || Array.isArray(doc)) throw new UsageError(`${source}: (document): must be a JSON object`);
	return doc as Record<string, unknown>;
}

/** Builds the raw design-input document from the arguments. */
export function documentFromArgs(argv: string[]): Record<string, unknown> {
	const flags: [string, string][] = [];
	const positional: string[] = [];
	for (let i = 0; i < argv.length; i++) {
		const arg = argv[i];
		if (arg === '-' || !arg.startsWith('--')) {
			positional.push(arg);
			continue;
		}
		const eq = arg.indexOf('=');
		const flag = eq >= 0 ? arg.slice(0, eq) : arg;
		if (!(flag in FLAGS)) throw new UsageError(`${flag}: unknown flag; one of ${Object.keys(FLAGS).join(', ')}`);
		const value = eq >= 0 ? arg.slice(eq + 1) : argv[++i];
		if (value === undefined) throw new UsageError(`${flag}: missing value; ${FLAGS[flag].text}`);
		flags.push([flag, value]);
	}
	if (positional.length > 1) throw new UsageError(`${positional[1]}: only one design file (or -) may be given`);
	const doc: Record<string, unknown> = positional.length === 1 ? readDocument(positional[0]) : {};
	for (const [flag, value] of flags) {
		const f = FLAGS[flag];
		setAt(doc, f.path, f.kind === 'number' ? numberOrText(value, f.convert) : value);
	}
	if (doc.feed === undefined && typeof doc.shape === 'string' && (patchShapes as readonly string[]).includes(doc.shape)) {
		doc.feed = defaultFeedFor(doc.shape as PatchShape);
	}
	return doc;
}

export async function run(argv: string[]): Promise<number> {
	try {
		const sized = size(parseDesignInput(documentFromArgs(argv)));
		process.stdout.write(`${JSON.stringify(sizingReport(sized), null, 2)}\n`);
		return 0;
	} catch (err) {
		if (err instanceof InputError) {
			console.error(formatIssue(err.first));
			return 2;
		}
		if (err instanceof UsageError) {
			console.error(err.message);
			return 2;
		}
		throw err;
	}
}
