// `measure FILE.s1p [--design design.json]`: analyse a measured Touchstone S11 sweep and, given the design, propose a retune.
import { readFileSync } from 'node:fs';
import { describeNetwork, portCountFromFileName, readTouchstone, s11FromNetwork } from '../../lib/formats/touchstone';
import { analyzeMeasuredResponse, DEFAULT_MATCH_THRESHOLD_DB } from '../../lib/rf/measured-response';
import { proposeRetune } from '../../lib/rf/retune';
import { InputError, formatIssue } from '../../lib/schemas/input-error';
import { UsageError } from '../usage-error';

export const summary = 'analyse a measured S11 file (.s1p/.s2p): resonance, −10 dB band, VSWR, retune';

export const help = `Usage: npm run cli -- measure FILE [--design design.json] [--threshold-db N] [--hold-width]

Reads a Touchstone file (version 1.x or 2.0/2.1; .s1p, or .s2p taking S11) and prints JSON:
the resonance (|S11| minimum, parabolically refined), the matched band edges where |S11| ≤ N dB
(default ${DEFAULT_MATCH_THRESHOLD_DB}), the minimum VSWR and the fractional bandwidth.

  --design FILE     a design-input JSON document: adds "retune", the apparent laminate εr the board
                    shows and the new dimensions that move its resonance to the design's target
  --threshold-db N  band threshold in dB, below 0 (default ${DEFAULT_MATCH_THRESHOLD_DB})
  --hold-width      keep the designed patch width in the retune (rectangular patches)

Exit codes: 0 ok; 2 bad input (a malformed file gives its line number and what was expected).`;

interface MeasureArgs {
	file: string;
	designFile?: string;
	thresholdDb?: number;
	holdWidth: boolean;
}


function parseArgs(argv: string[]): MeasureArgs {
	let file: string | undefined;
	let designFile: string | undefined;
	let thresholdDb: number | undefined;
	let holdWidth = false;
	for (let i = 0; i < argv.length; i++) {
		const arg = argv[i];
		const value = () => {
			const v = argv[++i];
			if (v === undefined) throw new UsageError(`${arg} needs a value`);
			return v;
		};
		if (arg === '--design') designFile = value();
		else if (arg === '--threshold-db') {
			const raw = value();
			thresholdDb = Number(raw);
			if (raw.trim() === '' || !Number.isFinite(thresholdDb)) throw new UsageError(`--threshold-db: "${raw}" must be a number of dB below 0`);
		} else if (arg === '--hold-width') holdWidth = true;
		else if (arg.startsWith('--')) throw new UsageError(`unknown option "${arg}"; one of --design, --threshold-db, --hold-width`);
		else if (file === undefined) file = arg;
		else throw new UsageError(`one Touchstone file only; also got "${arg}"`);
	}
	if (file === undefined) throw new UsageError('a Touchstone file is required: npm run cli -- measure FILE.s1p [--design design.json]');
	return { file, designFile, thresholdDb, holdWidth };
}

function readText(path: string, what: string): string {
	try {
		return readFileSync(path, 'utf8');
	} catch (err) {
		const code = (err as NodeJS.ErrnoException).code;
		throw new UsageError(`${what} "${path}" cannot be read${code ? ` (${code})` : ''}`);
	}
}

/** Bad input of one source, reported as one line prefixed with the file it came from. */
class SourcedInputError extends Error {
	constructor(
		readonly source: string,
		readonly inner: InputError
	) {
		super(`${source}: ${formatIssue(inner.first)}`);
	}
}

function withSource<T>(source: string, fn: () => T): T {
	try {
		return fn();
	} catch (err) {
		if (err instanceof InputError) throw new SourcedInputError(source, err);
		throw err;
	}
}

export async function run(argv: string[]): Promise<number> {
	try {
		const args = parseArgs(argv);
		const text = readText(args.file, 'Touchstone file');
		const network = withSource(args.file, () => readTouchstone(text, { portCount: portCountFromFileName(args.file) }));
		const response = withSource(args.file, () => analyzeMeasuredResponse(s11FromNetwork(network), { thresholdDb: args.thresholdDb }));

		let retune: ReturnType<typeof proposeRetune> | undefined;
		if (args.designFile !== undefined) {
			const designFile = args.designFile;
			const raw = readText(designFile, 'design file');
			let document: unknown;
			try {
				document = JSON.parse(raw);
			} catch (err) {
				throw new UsageError(`${designFile}: not valid JSON (${err instanceof Error ? err.message : String(err)})`);
			}
			retune = withSource(designFile, () => proposeRetune(document, response.resonance.frequencyHz, { holdWidth: args.holdWidth }));
		}

		const output = {
			file: args.file,
			touchstone: describeNetwork(network),
			resonance: response.resonance,
			band: response.band,
			minimumVswr: response.minimumVswr,
			minimumVswrFrequencyHz: response.minimumVswrFrequencyHz,
			fractionalBandwidth: response.band.reached ? response.band.fractionalBandwidth : null,
			...(retune ? { retune } : {})
		};
		// JSON has no Infinity: a VSWR of Infinity (total reflection) prints as null.
		console.log(JSON.stringify(output, null, 2));
		return 0;
	} catch (err) {
		if (err instanceof UsageError || err instanceof SourcedInputError) {
			console.error(err.message);
			return 2;
		}
		if (err instanceof InputError) {
			console.error(formatIssue(err.first));
			return 2;
		}
		throw err;
	}
}
