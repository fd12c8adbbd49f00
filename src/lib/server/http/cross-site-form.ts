// The cross-site form refusal (CSRF), in the request hook rather than in SvelteKit: SvelteKit's own check answers
// before any hook runs, so the body of a refused form was left half read, and the next request on that kept-alive
// connection went unanswered (http/unread-body.ts). The rule is SvelteKit's own, unchanged (kit 2 `respond.js`,
// csrf.checkOrigin; svelte.config.js turns the built-in one off with trustedOrigins ['*']): a POST, PUT, PATCH or
// DELETE whose content type a plain HTML form can send, from an Origin other than ours, is refused with 403.
import { json, text } from '@sveltejs/kit';

/** The content types a cross-site HTML form can send (MDN HTMLFormElement.enctype), and SvelteKit's binary form type. */
const FORM_CONTENT_TYPES = ['application/x-www-form-urlencoded', 'multipart/form-data', 'text/plain', 'application/x-sveltekit-formdata'];
const CHANGING_METHODS = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

export function isFormContentType(request: Request): boolean {
	const type = request.headers.get('content-type')?.split(';', 1)[0].trim() ?? '';
	return FORM_CONTENT_TYPES.includes(type.toLowerCase());
}

/** The 403 for a form posted from another site, in SvelteKit's words and shape; null for every other request. */
export function refuseCrossSiteForm(request: Request, url: URL): Response | null {
	if (!CHANGING_METHODS.has(request.method) || !isFormContentType(request)) return null;
	if (request.headers.get('origin') === url.origin) return null;
	const message = `Cross-site ${request.method} form submissions are forbidden`;
	return request.headers.get('accept') === 'application/json' ? json({ message }, { status: 403 }) : text(message, { status: 403 });
}
