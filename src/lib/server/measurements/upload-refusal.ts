// The words a refused Touchstone upload is answered with: the file, the line and what the reader expected.
import { TouchstoneError } from '../../formats/touchstone';
import { InputError } from '../../schemas';

export interface UploadRefusal {
	message: string;
	/** The 1-based line the reader stopped at, when it was the file's text that was refused. */
	line: number | null;
}

/** The refusal for an upload that failed with `err`; undefined for an error that is not the file's fault (rethrow it). */
export function uploadRefusal(fileName: string, err: unknown): UploadRefusal | undefined {
	if (err instanceof TouchstoneError) {
		const found = err.found ? ` (found "${err.found.slice(0, 40)}")` : '';
		return { message: `${fileName}, line ${err.line}: expected ${err.expected}${found}. Nothing was stored.`, line: err.line };
	}
	if (err instanceof InputError) return { message: `${fileName}: ${err.first.message}. Nothing was stored.`, line: null };
	return undefined;
}
