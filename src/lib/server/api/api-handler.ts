// Every /api/v1 handler runs inside this: anonymous → 401, bad input → 400 with field issues, access errors → JSON 403/404.
import { isHttpError, json, type RequestEvent, type RequestHandler } from '@sveltejs/kit';
import { InputError } from '$lib/schemas';
import { inputErrorResponse, type ProblemBody } from '../http/input-error-response';
import type { RequestIdentity, RequestUser } from '../auth/request-identity';

export interface ApiContext<E extends RequestEvent> {
	event: E;
	identity: RequestIdentity & { user: RequestUser };
}

export function problem(status: number, message: string, headers?: HeadersInit): Response {
	const body: ProblemBody = { error: message, issues: [] };
	return json(body, { status, headers });
}

/** A handler that needs a caller (session or API token). */
export function apiHandler<E extends RequestEvent>(fn: (ctx: ApiContext<E>) => Promise<Response> | Response): (event: E) => Promise<Response> {
	return publicApiHandler<E>((event) => {
		const identity = event.locals.identity;
		if (!identity?.user) return problem(401, 'Sign in or send "Authorization: Bearer ff_…" with a personal API token', { 'www-authenticate': 'Bearer realm="fringefield"' });
		return fn({ event, identity: identity as ApiContext<E>['identity'] });
	});
}

/** A handler anyone may call (still maps bad input and access errors to JSON). */
export function publicApiHandler<E extends RequestEvent>(fn: (event: E) => Promise<Response> | Response): (event: E) => Promise<Response> {
	return async (event) => {
		try {
			return await fn(event);
		} catch (err) {
			if (err instanceof InputError) return inputErrorResponse(err, 400);
			if (isHttpError(err)) return problem(err.status, err.body.message);
			throw err;
		}
	};
}

export type { RequestHandler };
