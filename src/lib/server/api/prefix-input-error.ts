// Issues raised about a design-input document, re-pathed to where that document sits in an API body ("input.frequencyHz").
import { InputError } from '$lib/schemas';

export async function withInputPrefix<T>(renames: Record<string, string>, fn: () => Promise<T>): Promise<T> {
	try {
		return await fn();
	} catch (err) {
		if (!(err instanceof InputError)) throw err;
		throw new InputError(err.issues.map((i) => ({ ...i, path: renames[i.path] ?? (i.path ? `input.${i.path}` : 'input') })));
	}
}
