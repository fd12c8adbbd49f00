// A form POST whose body cannot be read as form data (text/plain, a multipart body without a proper
// boundary, a cut-off upload) would make request.formData() throw inside an action: a 500. This reads a
// copy first and answers 400 naming the problem (413 for a body over the size limit) in the shape the
// caller expects: SvelteKit's action JSON for use:enhance, plain text for a plain form post.
import { json, type RequestEvent } from '@sveltejs/kit';

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
	try {
		await event.request.clone().formData();
		return null;
	} catch (err) {
		const status = (err as { status?: unknown })?.status === 413 || /exceeds limit/i.test(String((err as Error)?.message)) ? 413 : 400;
		return refusal(event, status, status === 413 ? 'The request body is larger than the limit (6 MB)' : UNREADABLE_FORM_MESSAGE);
	}
}
