// The one error a malformed Touchstone file produces: an InputError that names the line and what was expected.
import { InputError } from '../../schemas/input-error';

/** Longest excerpt of the offending text quoted in a message. */
const MAX_FOUND_CHARS = 40;

export class TouchstoneError extends InputError {
	/**
	 * @param line 1-based line number in the file (the line after the last one for "ended too early").
	 * @param expected What the reader expected at that place, as a phrase ("a number", "[End]").
	 * @param found The offending token or line text ("" when the file ended).
	 */
	constructor(
		readonly line: number,
		readonly expected: string,
		readonly found: string
	) {
		const shown = found.length > MAX_FOUND_CHARS ? `${found.slice(0, MAX_FOUND_CHARS)}…` : found;
		super([{ path: `line ${line}`, value: found === '' ? undefined : shown, message: `expected ${expected}` }]);
	}
}

export function isTouchstoneError(err: unknown): err is TouchstoneError {
	return err instanceof TouchstoneError;
}
