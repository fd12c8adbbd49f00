// Every request: who is asking (session or API token) on locals, security headers on the answer;
// every unexpected error: logged with an id support can find.
import type { Handle, HandleServerError } from '@sveltejs/kit';
import { identify } from '$lib/server/auth/request-identity';

export const handle: Handle = async ({ event, resolve }) => {
	const identity = event.url.pathname === '/healthz' ? { user: null, sessionId: null, apiToken: null } : await identify(event.request, event.cookies);
	event.locals.user = identity.user;
	event.locals.sessionId = identity.sessionId;
	event.locals.apiToken = identity.apiToken;
	event.locals.identity = identity;
	const response = await resolve(event);
	response.headers.set('x-content-type-options', 'nosniff');
	response.headers.set('referrer-policy', 'same-origin');
	response.headers.set('x-frame-options', 'DENY');
	return response;
};

export const handleError: HandleServerError = ({ error, event, status }) => {
	const errorId = crypto.randomUUID();
	if (status !== 404) console.error(`[${errorId}] ${event.request.method} ${event.url.pathname}:`, error);
	return { message: status === 404 ? 'Not found' : 'Something went wrong on our side.', errorId };
};
