// Guards for signed-in pages and actions (actions do not run the layout's load, so each one asks here).
import { redirect } from '@sveltejs/kit';
import type { RequestUser } from '../auth/request-identity';

/** Where to go after signing in: only a path on this site, never another origin. */
export function safeNextPath(next: string | null | undefined, fallback = '/teams'): string {
	if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return fallback;
	return next;
}

/** The signed-in person, or a redirect to sign-in that comes back to `url` afterwards. */
export function requireUser(locals: App.Locals, url: URL): RequestUser {
	if (!locals.user) redirect(303, `/signin?next=${encodeURIComponent(url.pathname + url.search)}`);
	return locals.user;
}

/** Session-only pages: account management is not something an API token may do. */
export function requireSessionUser(locals: App.Locals, url: URL): RequestUser {
	if (locals.apiToken) redirect(303, `/signin?next=${encodeURIComponent(url.pathname)}`);
	return requireUser(locals, url);
}
