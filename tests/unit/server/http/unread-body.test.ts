// A body the answer did not read is read to its end before the answer goes out; one that does not end in time gets
// the answer with `connection: close` (RFC 9112 §9.6: the server closes instead of reading the next request).
import { describe, expect, it } from 'vitest';
import { afterUnreadBody } from '../../../../src/lib/server/http/unread-body';

/** A body of `chunks` pieces that counts how many were pulled; `endless` never closes (a client that stopped sending). */
function countedBody(chunks: number, endless = false): { stream: ReadableStream<Uint8Array>; pulled: () => number } {
	let pulled = 0;
	const stream = new ReadableStream<Uint8Array>({
		pull(controller) {
			if (pulled < chunks) {
				pulled++;
				controller.enqueue(new Uint8Array(16_384));
			} else if (!endless) controller.close();
			else return new Promise(() => undefined);
		}
	});
	return { stream, pulled: () => pulled };
}

function postOf(body: ReadableStream<Uint8Array> | string | null, method = 'POST'): Request {
	return new Request('http://127.0.0.1/api/v1/simulations/x/cancel', { method, body, duplex: 'half' } as RequestInit);
}

describe('afterUnreadBody', () => {
	it('reads a body nobody read to its end and returns the answer as it was', async () => {
		const { stream, pulled } = countedBody(20);
		const answer = new Response('{}', { status: 404 });
		const out = await afterUnreadBody(postOf(stream), answer, 1000);
		expect(pulled()).toBe(20);
		expect(out).toBe(answer);
		expect(out.headers.get('connection')).toBeNull();
	});

	it('reads what is left of a body a guard read from a copy (clone) of the request', async () => {
		const { stream, pulled } = countedBody(5);
		const request = postOf(stream);
		await request.clone().text();
		const out = await afterUnreadBody(request, new Response(null, { status: 400 }), 1000);
		expect(pulled()).toBe(5);
		expect(out.headers.get('connection')).toBeNull();
		expect(request.bodyUsed).toBe(true);
	});

	it('leaves a body that was read in full (formData, json: the stream stays locked), and a request without one, alone', async () => {
		const form = new Request('http://127.0.0.1/teams?/create', { method: 'POST', body: new URLSearchParams({ name: 'x' }) });
		await form.formData();
		expect(form.body!.locked).toBe(true);
		expect((await afterUnreadBody(form, new Response(null), 1000)).headers.get('connection')).toBeNull();
		const read = postOf('{"a":1}');
		await read.json();
		expect((await afterUnreadBody(read, new Response(null), 1000)).headers.get('connection')).toBeNull();
		expect((await afterUnreadBody(postOf(null, 'GET'), new Response(null), 1000)).headers.get('connection')).toBeNull();
	});

	it('ends a body that errors (past the size limit) without waiting and keeps the answer', async () => {
		const stream = new ReadableStream<Uint8Array>({
			start(controller) {
				controller.error(new Error('request body size exceeded BODY_SIZE_LIMIT'));
			}
		});
		const out = await afterUnreadBody(postOf(stream), new Response(null, { status: 413 }), 1000);
		expect(out.status).toBe(413);
		expect(out.headers.get('connection')).toBeNull();
	});

	it('answers with connection: close after the wait when the body does not end', async () => {
		const { stream } = countedBody(2, true);
		const t0 = performance.now();
		const out = await afterUnreadBody(postOf(stream), new Response('{}', { status: 404 }), 200);
		expect(performance.now() - t0).toBeGreaterThanOrEqual(190);
		expect(out.status).toBe(404);
		expect(out.headers.get('connection')).toBe('close');
	});

	it('answers with connection: close when someone took a reader and never read', async () => {
		const { stream, pulled } = countedBody(3);
		const request = postOf(stream);
		request.body!.getReader();
		expect((await afterUnreadBody(request, new Response(null), 1000)).headers.get('connection')).toBe('close');
		expect(pulled()).toBeLessThanOrEqual(1); // nothing read past the stream's own first pull
	});

	it('copies an answer whose headers cannot be changed (a redirect) to add connection: close', async () => {
		const { stream } = countedBody(1, true);
		const out = await afterUnreadBody(postOf(stream), Response.redirect('http://127.0.0.1/signin', 303), 50);
		expect(out.status).toBe(303);
		expect(out.headers.get('location')).toBe('http://127.0.0.1/signin');
		expect(out.headers.get('connection')).toBe('close');
	});
});
