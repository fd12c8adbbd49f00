// A form POST whose body cannot be read as form data (text/plain, a multipart body without a proper
// boundary, a cut-off upload) would make request.formData() throw inside an action: a 500. This reads a
// copy first and answers 400 naming the problem (413 for a body over the size limit) in the shape the
// caller expects: SvelteKit's action JSON for use:enhance, plain text for a plain form post.
import { json, type RequestEvent } from '@sveltejs/kit';
import { findUnstorableText, isStorableText, UNSTORABLE_TEXT_MESSAGE } from './text-guard';

const FORM_TYPES = /^(application\/x-www-form-urlencoded|multipart\/form-data|text\/plain)\b/i;

export const UNREADABLE_FORM_MESSAGE = 'The form could not be read: send it as application/x-www-form-urlencoded or multipart/form-data';

function refusal(event: RequestEvent, status: number, message: string): Response {
	if (event.request.headers.get('x-sveltekit-action') === 'true') return json({ type: 'error', status, error: { message } }, { status });
	return new Response(message, { status, headers: { 'content-type': 'text/plain; charset=utf-8' } });
}

/** null when the request is not a page form POST or its body reads as form data; otherwise the refusal. */
export async function refuseUnreadableForm(event: RequestEvent): Promise<Response | null> {
	if (event.request.method !== 'POST' || event.url.pathname.startsWith('/api/')) return null;
	const type = event.request.headers.get('content-type') ?? '';
	if (!FORM_TYPES.test(type)) return null; // SvelteKit itself answers 415 for other types
	let data: FormData;
	try {
		data = await event.request.clone().formData();
	} catch (err) {
		const status = (err as { status?: unknown })?.status === 413 || /exceeds limit/i.test(String((err as Error)?.message)) ? 413 : 400;
		return refusal(event, status, status === 413 ? 'The request body is larger than the limit (6 MB)' : UNREADABLE_FORM_MESSAGE);
	}
	for (const [key, value] of data) {
		if (!isStorableText(key) || (typeof value === 'string' && !isStorableText(value))) return refusal(event, 400, `${JSON.stringify(key.replace(/\u0000/g, '\\0'))}: ${UNSTORABLE_TEXT_MESSAGE}`);
	}
	return null;
}

/** The address (path and query): a NUL (%00) or undecodable text in it is refused, naming the part. */
export function refuseUnstorableAddress(event: RequestEvent): Response | null {
	let path: string;
	try {
		path = decodeURIComponent(event.url.pathname);
	} catch {
		return null; // SvelteKit answers an undecodable path itself (400)
	}
	const bad = !isStorableText(path) ? 'the address' : [...event.url.searchParams].find(([k, v]) => !isStorableText(k) || !isStorableText(v))?.[0];
	if (bad === undefined) return null;
	const field = bad === 'the address' ? 'url' : `query.${bad.replace(/\u0000/g, '\\0')}`;
	const message = `${bad === 'the address' ? 'the address' : `query parameter ${JSON.stringify(bad.replace(/\u0000/g, '\\0'))}`} ${UNSTORABLE_TEXT_MESSAGE}`;
	if (event.url.pathname.startsWith('/api/')) return json({ error: message, issues: [{ path: field, message: UNSTORABLE_TEXT_MESSAGE }] }, { status: 400 });
	return refusal(event, 400, message);
}

/** A JSON body to /api/ whose strings or keys cannot be stored: 400 naming the first such field. */
export async function refuseUnstorableJson(event: RequestEvent): Promise<Response | null> {
	if (!event.url.pathname.startsWith('/api/') || event.request.method === 'GET' || !/json/i.test(event.request.headers.get('content-type') ?? '')) return null;
	let raw: unknown;
	try {
		const text = await event.request.clone().text();
		// Only worth parsing when an escape or a NUL could be there.
		if (!text.includes('\\u') && !text.includes('\u0000') && text.isWellFormed()) return null;
		raw = JSON.parse(text);
	} catch {
		return null; // unreadable JSON: the route's own parser names the problem
	}
	const path = findUnstorableText(raw);
	if (path === null) return null;
	return json({ error: `${path || '(document)'}: ${UNSTORABLE_TEXT_MESSAGE}`, issues: [{ path, message: UNSTORABLE_TEXT_MESSAGE }] }, { status: 400 });
}
