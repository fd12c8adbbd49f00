// Every request: security headers; every unexpected error: logged with an id support can find.
import type { Handle, HandleServerError } from '@sveltejs/kit';

export const handle: Handle = async ({ event, resolve }) => {
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
