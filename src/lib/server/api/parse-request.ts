// Reads path parameters, the query string and a JSON body through zod schemas; anything wrong is an InputError naming the field.
import type { z } from 'zod';
import { InputError, parseWith } from '$lib/schemas';

export function parseParams<S extends z.ZodType>(schema: S, params: Record<string, string>): z.output<S> {
	return parseWith(schema, params);
}

/** Repeated keys keep the last value; an empty value counts as absent. */
export function parseQuery<S extends z.ZodType>(schema: S, url: URL): z.output<S> {
	const raw: Record<string, string> = {};
	for (const [key, value] of url.searchParams) if (value !== '') raw[key] = value;
	return parseWith(schema, raw);
}

/** At most this many bytes of JSON in a request body. */
export const MAX_JSON_BODY_BYTES = 256 * 1024;

export async function parseJsonBody<S extends z.ZodType>(schema: S, request: Request): Promise<z.output<S>> {
	const type = request.headers.get('content-type') ?? '';
	if (!/^application\/(.+\+)?json\b/i.test(type)) {
		throw new InputError([{ path: '', value: type || undefined, message: 'the body must be JSON (content-type: application/json)' }]);
	}
	const text = await request.text();
	if (text.length > MAX_JSON_BODY_BYTES) {
		throw new InputError([{ path: '', value: `${text.length} characters`, message: `the body is at most ${MAX_JSON_BODY_BYTES} bytes` }]);
	}
	let raw: unknown;
	try {
		raw = JSON.parse(text);
	} catch (err) {
		throw new InputError([{ path: '', value: undefined, message: `the body is not valid JSON (${(err as Error).message})` }]);
	}
	return parseWith(schema, raw);
}
