// A form POST whose body cannot be read as form data (text/plain, a multipart body without a proper
// boundary, a cut-off upload) would make request.formData() throw inside an action: a 500. This reads a
// copy first and answers 400 naming the problem (413 for a body over the size limit) in the shape the
// caller expects: SvelteKit's action JSON for use:enhance, plain text for a plain form post. Before any parsing it
// counts the bytes and fields (413 past LIMITS.formBytes or LIMITS.formFields), so a body of a million tiny fields
// costs a byte scan, not two full parses.
import { json, type RequestEvent } from '@sveltejs/kit';
import { bodyBytesMessage, formBytesMessage, formFieldsMessage, LIMITS } from './limits';
import { findUnstorableText, isStorableText, UNSTORABLE_TEXT_MESSAGE } from './text-guard';

const FORM_TYPES = /^(application\/x-www-form-urlencoded|multipart\/form-data|text\/plain)\b/i;

export const UNREADABLE_FORM_MESSAGE = 'The form could not be read: send it as application/x-www-form-urlencoded or multipart/form-data';

function refusal(event: RequestEvent, status: number, message: string): Response {
	if (event.request.headers.get('x-sveltekit-action') === 'true') return json({ type: 'error', status, error: { message } }, { status });
	return new Response(message, { status, headers: { 'content-type': 'text/plain; charset=utf-8' } });
}

/** The body's bytes, or null once more than `maxBytes` arrived (the rest is not read). */
async function readAtMost(request: Request, maxBytes: number): Promise<Uint8Array<ArrayBuffer> | null> {
	const declared = Number(request.headers.get('content-length'));
	if (Number.isFinite(declared) && declared > maxBytes) return null;
	if (!request.body) return new Uint8Array(0);
	const reader = request.body.getReader();
	const chunks: Uint8Array[] = [];
	let total = 0;
	for (;;) {
		const { done, value } = await reader.read();
		if (done) break;
		total += value.byteLength;
		if (total > maxBytes) {
			// Not awaited: cancelling one branch of a cloned (teed) body settles only when the other is cancelled too.
			reader.cancel().catch(() => undefined);
			return null;
		}
		chunks.push(value);
	}
	const bytes = new Uint8Array(total);
	let at = 0;
	for (const chunk of chunks) {
		bytes.set(chunk, at);
		at += chunk.byteLength;
	}
	return bytes;
}

/** How many times `needle` occurs in `bytes`, counting no further than `stopAfter`. */
function countOccurrences(bytes: Uint8Array, needle: Uint8Array, stopAfter: number): number {
	const buffer = Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
	let found = 0;
	for (let at = buffer.indexOf(needle); at !== -1 && found <= stopAfter; at = buffer.indexOf(needle, at + needle.byteLength)) found++;
	return found;
}

/** Fields in a form body, counted without parsing it: separators for url-encoded and text/plain, part delimiters for multipart. */
export function countFormFields(bytes: Uint8Array, contentType: string, stopAfter: number = LIMITS.formFields): number {
	if (bytes.byteLength === 0) return 0;
	const boundary = /^multipart\/form-data\b.*?;\s*boundary=(?:"([^"]+)"|([^;\s]+))/i.exec(contentType);
	if (boundary) return Math.max(0, countOccurrences(bytes, Buffer.from(`--${boundary[1] ?? boundary[2]}`), stopAfter + 1) - 1);
	const separator = /^text\/plain\b/i.test(contentType) ? Buffer.from('\n') : Buffer.from('&');
	return countOccurrences(bytes, separator, stopAfter) + 1;
}

/** null when the request is not a page form POST or its body reads as form data; otherwise the refusal. */
export async function refuseUnreadableForm(event: RequestEvent): Promise<Response | null> {
	if (event.request.method !== 'POST' || event.url.pathname.startsWith('/api/')) return null;
	const type = event.request.headers.get('content-type') ?? '';
	if (!FORM_TYPES.test(type)) return null; // SvelteKit itself answers 415 for other types
	const multipart = /^multipart\//i.test(type);
	let data: FormData;
	try {
		const bytes = await readAtMost(event.request.clone(), multipart ? LIMITS.bodyBytes : LIMITS.formBytes);
		if (bytes === null) return refusal(event, 413, multipart ? bodyBytesMessage : formBytesMessage);
		if (countFormFields(bytes, type) > LIMITS.formFields) return refusal(event, 413, formFieldsMessage);
		data = await new Response(bytes, { headers: { 'content-type': type } }).formData();
	} catch (err) {
		const status = (err as { status?: unknown })?.status === 413 || /exceeds limit/i.test(String((err as Error)?.message)) ? 413 : 400;
		return refusal(event, status, status === 413 ? bodyBytesMessage : UNREADABLE_FORM_MESSAGE);
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
