// Text PostgreSQL cannot store: the NUL character (refused in text and jsonb) and unpaired UTF-16
// surrogates (refused by jsonb). Found in a request's address, form fields or JSON body, they are
// refused up front with 400 naming the field, instead of failing in the database as a 500.
export const UNSTORABLE_TEXT_MESSAGE = 'must not contain the NUL character (U+0000) or an unpaired UTF-16 surrogate';

export function isStorableText(text: string): boolean {
	return !text.includes('\u0000') && text.isWellFormed();
}

/** The path ("input.name", "tags.2", "" for the document) of the first unstorable key or string in a JSON value. */
export function findUnstorableText(value: unknown, path = '', depth = 0): string | null {
	if (typeof value === 'string') return isStorableText(value) ? null : path;
	if (!value || typeof value !== 'object' || depth > 64) return null;
	const entries = Array.isArray(value) ? value.map((v, i) => [String(i), v] as const) : Object.entries(value);
	for (const [key, v] of entries) {
		const at = path ? `${path}.${key}` : key;
		if (!isStorableText(key)) return at;
		const found = findUnstorableText(v, at, depth + 1);
		if (found !== null) return found;
	}
	return null;
}
