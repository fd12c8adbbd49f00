// An uploaded Touchstone file, checked before anything is stored: size, name, text content, then the strict reader.
import { findControlCharacter, InputError } from '../../schemas';
import { describeNetwork, portCountFromFileName, readTouchstone, s11FromNetwork, type TracePoint } from '../../formats/touchstone';
import type { ReflectionSample } from '../../schemas/reflection-sample';
import { analyzeMeasuredResponse } from '../../rf/measured-response';
import type { MeasurementSummary } from './measurement-model';
import { traceOf } from './measurement-trace';

/** Largest file accepted: 5 MB (5 × 1024 × 1024 bytes). A 2-port sweep of 10 000 points in RI is about 1 MB. */
export const MAX_TOUCHSTONE_BYTES = 5 * 1024 * 1024;
/** Names we take: version 1 files say their port count (.s1p, .s2p); version 2 keyword files may be .ts. */
export const TOUCHSTONE_EXTENSIONS = ['.s1p', '.s2p', '.ts'] as const;
const MAX_FILE_NAME_CHARS = 200;

export interface ReadUpload {
	text: string;
	samples: ReflectionSample[];
	summary: MeasurementSummary;
	/** What the plot draws: at most 2 points per pixel column (see measurement-trace.ts). */
	trace: TracePoint[];
}

function refuse(path: string, value: unknown, message: string): never {
	throw new InputError([{ path, value, message }]);
}

/** Throws InputError (a TouchstoneError, naming the line, for a malformed file); reads nothing from anywhere else. */
export function readTouchstoneUpload(fileName: string, bytes: Uint8Array): ReadUpload {
	const name = fileName.trim();
	if (name === '' || name.length > MAX_FILE_NAME_CHARS) refuse('file', fileName, `choose a Touchstone file (.s1p, .s2p or .ts; a name of 1–${MAX_FILE_NAME_CHARS} characters)`);
	const control = findControlCharacter(name);
	if (control) refuse('file', name, `the file name must not contain control characters (found ${control})`);
	const extension = (/\.[^.]+$/.exec(name)?.[0] ?? '').toLowerCase();
	if (!(TOUCHSTONE_EXTENSIONS as readonly string[]).includes(extension)) {
		refuse('file', name, `must be a Touchstone file named *.s1p, *.s2p or *.ts (got "${extension || 'no extension'}")`);
	}
	if (bytes.byteLength === 0) refuse('file', name, 'the file is empty');
	if (bytes.byteLength > MAX_TOUCHSTONE_BYTES) refuse('file', `${bytes.byteLength} bytes`, `the file is larger than 5 MB; allowed range [1, ${MAX_TOUCHSTONE_BYTES}] bytes`);
	// Touchstone is plain text: a NUL byte or invalid UTF-8 means a binary file with a Touchstone name.
	if (bytes.includes(0)) refuse('file', name, 'is not a text file (it holds NUL bytes); a Touchstone file is plain ASCII text');
	let text: string;
	try {
		text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
	} catch {
		refuse('file', name, 'is not a text file (invalid UTF-8); a Touchstone file is plain ASCII text');
	}
	const network = readTouchstone(text, { portCount: portCountFromFileName(name) });
	const samples = s11FromNetwork(network);
	const response = analyzeMeasuredResponse(samples);
	const summary: MeasurementSummary = {
		file: describeNetwork(network),
		resonance: response.resonance,
		band: response.band,
		minimumVswr: Number.isFinite(response.minimumVswr) ? response.minimumVswr : null,
		minimumVswrFrequencyHz: response.minimumVswrFrequencyHz
	};
	return { text, samples, summary, trace: traceOf(response.points) };
}
