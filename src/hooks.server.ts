// Every request: who is asking (session or API token) on locals, security headers on the answer;
// a database that cannot be reached: 503 "try again shortly" (JSON under /api/v1), never a 500;
// every unexpected error: logged with an id support can find. At start: the app's mode (demo or production),
// decided once; a production server without what it needs stops with one line naming the setting.
import { isHttpError, json, type Handle, type HandleServerError, type ServerInit } from '@sveltejs/kit';
import { building, dev } from '$app/environment';
import { SettingError, startAppMode } from '$lib/server/app-mode';
import { identify } from '$lib/server/auth/request-identity';
import { DATABASE_BUSY_MESSAGE, DATABASE_UNAVAILABLE_MESSAGE, isDatabaseBusy, isDatabaseUnavailable } from '$lib/server/db';
import { refuseUnreadableForm, refuseUnstorableAddress, refuseUnstorableJson } from '$lib/server/http/form-body-guard';
import { refuseCrossSiteForm } from '$lib/server/http/cross-site-form';
import { afterUnreadBody } from '$lib/server/http/unread-body';

const RETRY_AFTER_SECONDS = '5';

/** The 503's own sentence: unreachable, or did not answer in time. */
function unavailableMessage(err: unknown): string {
	if (isHttpError(err) && err.status === 503) return err.body.message;
	return isDatabaseBusy(err) ? DATABASE_BUSY_MESSAGE : DATABASE_UNAVAILABLE_MESSAGE;
}

function unavailable(pathname: string, err: unknown): Response | null {
	if (!pathname.startsWith('/api/')) return null;
	return json({ error: unavailableMessage(err), issues: [] }, { status: 503, headers: { 'retry-after': RETRY_AFTER_SECONDS } });
}

/**
 * Under /api/ every answer is JSON: SvelteKit's own HTML or plain-text refusals (an address that is not valid
 * percent-encoded UTF-8, a method the route does not have) become { error, issues } with the same status.
 */
function apiJson(pathname: string, response: Response, method: string): Response {
	const type = response.headers.get('content-type') ?? '';
	if (!pathname.startsWith('/api/') || response.status < 400 || type.startsWith('application/json') || !(type.startsWith('text/html') || response.status === 405)) return response;
	const allow = response.headers.get('allow');
	const message =
		response.status === 400
			? 'the address could not be read: it must be valid percent-encoded UTF-8'
			: response.status === 404
				? 'Not found'
				: response.status === 405
					? `${method} is not accepted at this address${allow ? `; it answers ${allow}` : ''}`
					: `The request was refused (${response.status})`;
	return json({ error: message, issues: response.status === 400 ? [{ path: 'url', message }] : [] }, { status: response.status, headers: allow ? { allow } : undefined });
}

function secure(response: Response): Response {
	response.headers.set('x-content-type-options', 'nosniff');
	response.headers.set('referrer-policy', 'same-origin');
	response.headers.set('x-frame-options', 'DENY');
	if (response.status === 503 && !response.headers.has('retry-after')) response.headers.set('retry-after', RETRY_AFTER_SECONDS);
	return response;
}

export const init: ServerInit = () => {
	if (building) return;
	try {
		startAppMode(process.env);
	} catch (err) {
		if (!(err instanceof SettingError)) throw err;
		console.error(err.message);
		process.exit(1);
	}
};

async function answer({ event, resolve }: Parameters<Handle>[0]): Promise<Response> {
	// before anything else, as SvelteKit did (off in `vite dev`, as SvelteKit's own)
	const crossSite = dev ? null : refuseCrossSiteForm(event.request, event.url);
	if (crossSite) return secure(crossSite);
	try {
		const identity = event.url.pathname === '/healthz' ? { user: null, sessionId: null, apiToken: null } : await identify(event.request, event.cookies);
		event.locals.user = identity.user;
		event.locals.sessionId = identity.sessionId;
		event.locals.apiToken = identity.apiToken;
		event.locals.identity = identity;
		const unreadable = refuseUnstorableAddress(event) ?? (await refuseUnreadableForm(event)) ?? (await refuseUnstorableJson(event));
		if (unreadable) return secure(unreadable);
		return secure(apiJson(event.url.pathname, await resolve(event), event.request.method));
	} catch (err) {
		// identify() could not reach PostgreSQL: a JSON 503 for the API; pages get kit's 503 error page.
		if (isDatabaseUnavailable(err)) {
			const api = unavailable(event.url.pathname, err);
			if (api) return secure(api);
		}
		throw err;
	}
}

// Whatever the answer, a body it did not read is read first (http/unread-body.ts): left half read, it would stall
// the next request on the same kept-alive connection.
export const handle: Handle = async (input) => {
	let response: Response;
	try {
		response = await answer(input);
	} catch (err) {
		await afterUnreadBody(input.event.request, new Response(null));
		throw err;
	}
	return afterUnreadBody(input.event.request, response);
};

export const handleError: HandleServerError = ({ error, event, status }) => {
	const errorId = crypto.randomUUID();
	if (isDatabaseUnavailable(error) || (isHttpError(error) && error.status === 503)) return { message: unavailableMessage(error), errorId };
	// SvelteKit's own refusals (404 no such route or action, 415 not form data, 413 body too large) say what was wrong.
	if (status < 500) return { message: status === 404 ? 'Not found' : error instanceof Error && error.message ? error.message : 'The request was refused', errorId };
	console.error(`[${errorId}] ${event.request.method} ${event.url.pathname}:`, error);
	return { message: 'Something went wrong on our side.', errorId };
};
