// One typed error for bad input: a field path, the offending value and a message that states the allowed range.
import type { z } from 'zod';

export interface InputIssue {
	/** Dotted path of the field, e.g. "substrate.heightMm"; "" for the document itself. */
	path: string;
	/** The value that was given (undefined when missing). */
	value: unknown;
	/** Human sentence, including the allowed range where there is one. */
	message: string;
}

export class InputError extends Error {
	readonly name = 'InputError';
	constructor(readonly issues: InputIssue[]) {
		super(issues.map(formatIssue).join('; '));
	}
	/** The first issue: the one a one-line CLI error reports. */
	get first(): InputIssue {
		return this.issues[0];
	}
}

export function formatIssue(issue: InputIssue): string {
	const shown = showValue(issue.value);
	return `${issue.path || '(document)'}: ${shown} — ${issue.message}`;
}

function showValue(value: unknown): string {
	if (value === undefined) return 'missing';
	if (typeof value === 'number' || typeof value === 'bigint') return String(value);
	if (value !== null && typeof value === 'object') return Array.isArray(value) ? 'an array' : 'an object';
	return JSON.stringify(value) ?? String(value);
}

function valueAt(root: unknown, path: PropertyKey[]): unknown {
	let node: unknown = root;
	for (const key of path) {
		if (node === null || typeof node !== 'object') return undefined;
		node = (node as Record<PropertyKey, unknown>)[key as string];
	}
	return node;
}

/** Turns zod's issues into ours, reading the offending values from the raw input. */
export function fromZodError(error: z.ZodError, raw: unknown): InputError {
	return new InputError(
		error.issues.map((iss) => ({
			path: iss.path.map(String).join('.'),
			value: iss.code === 'unrecognized_keys' ? iss.keys : valueAt(raw, iss.path),
			message: iss.code === 'unrecognized_keys' ? `unknown field(s): ${iss.keys.join(', ')}` : iss.message
		}))
	);
}

/** Parses with a schema or throws InputError; never throws anything else. */
export function parseWith<S extends z.ZodType>(schema: S, raw: unknown): z.output<S> {
	const result = schema.safeParse(raw);
	if (!result.success) throw fromZodError(result.error, raw);
	return result.data;
}
