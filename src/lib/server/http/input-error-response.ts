// The one mapping of bad input to HTTP: InputError → 400 (shape) or 422 (understood but unbuildable), JSON body.
import { json } from '@sveltejs/kit';
import { InputError } from '$lib/schemas';

export interface ProblemBody {
	error: string;
	issues: { path: string; message: string }[];
}

export function inputErrorResponse(err: InputError, status: 400 | 422 = 400): Response {
	const body: ProblemBody = { error: err.message, issues: err.issues.map((i) => ({ path: i.path, message: i.message })) };
	return json(body, { status });
}

/** Runs `fn`; an InputError becomes a 400/422 response, anything else propagates (→ handleError, 500). */
export async function withInputErrors(fn: () => Promise<Response> | Response, status: 400 | 422 = 400): Promise<Response> {
	try {
		return await fn();
	} catch (err) {
		if (err instanceof InputError) return inputErrorResponse(err, status);
		throw err;
	}
}
