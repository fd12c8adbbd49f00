// Guards for signed-in pages and actions (actions do not run the layout's load, so each one asks here).
import { redirect } from '@sveltejs/kit';
import type { RequestUser } from '../auth/request-identity';

/** Where a refused or missing `next` goes. */
export const DEFAULT_NEXT_PATH = '/designs';

// RFC 3986 §3.3–3.4: unreserved characters, sub-delims, ":", "@", "/", "?" and percent-escapes. No
// backslash, space, control character, "#" or anything outside ASCII (an ideographic full stop among them).
const SAFE_PATH_CHARACTERS = /^[A-Za-z0-9\-._~!$&'()*+,;=:@%/?]+$/;
const CONTROL_OR_BACKSLASH = /[\p{Cc}\\]/u;
const PARSE_BASE = 'http://fringefield.invalid';

/**
 * Where to go after signing in (or switching teams): only an absolute path on this site. The value must
 * start with a single "/", be made of safe characters, resolve to our own origin, and stay so after one
 * round of percent-decoding; anything else gives `fallback`.
 */
export function safeNextPath(next: string | null | undefined, fallback = DEFAULT_NEXT_PATH): string {
	if (!next || next.length > 2048 || !SAFE_PATH_CHARACTERS.test(next) || !next.startsWith('/') || next.startsWith('//')) return fallback;
	let url: URL;
	let decoded: string;
	try {
		url = new URL(next, PARSE_BASE);
		decoded = decodeURIComponent(url.pathname);
	} catch {
		return fallback;
	}
	if (url.origin !== PARSE_BASE || decoded.startsWith('//') || CONTROL_OR_BACKSLASH.test(decoded)) return fallback;
	return url.pathname + url.search;
}

/** The signed-in person, or a redirect to sign-in that comes back to `url` afterwards (pages, actions and design access all ask here). */
export function requireUser(locals: { user: RequestUser | null }, url: URL): RequestUser {
	if (!locals.user) redirect(303, `/signin?next=${encodeURIComponent(url.pathname + url.search)}`);
	return locals.user;
}

/** Session-only pages: account management is not something an API token may do. */
export function requireSessionUser(locals: App.Locals, url: URL): RequestUser {
	if (locals.apiToken) redirect(303, `/signin?next=${encodeURIComponent(url.pathname)}`);
	return requireUser(locals, url);
}
