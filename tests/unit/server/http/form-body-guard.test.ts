// Abuse review item 10: a form's fields and bytes are counted before anything parses it; too many → 413 with a message.
import type { RequestEvent } from '@sveltejs/kit';
import { describe, expect, it } from 'vitest';
import { countFormFields, refuseUnreadableForm } from '../../../../src/lib/server/http/form-body-guard';
import { LIMITS } from '../../../../src/lib/server/http/limits';

const URLENCODED = 'application/x-www-form-urlencoded';

function formPost(body: BodyInit, contentType: string, headers: Record<string, string> = {}): RequestEvent {
	const init = { method: 'POST', body, headers: { 'content-type': contentType, ...headers }, duplex: 'half' };
	const request = new Request('http://127.0.0.1/designs/new', init as RequestInit);
	return { request, url: new URL(request.url) } as unknown as RequestEvent;
}

/** `count` url-encoded fields `f=1`. */
const fields = (count: number) => Array.from({ length: count }, (_, i) => `f${i}=1`).join('&');

function multipart(count: number): { body: string; type: string } {
	const boundary = 'ffBoundary7MA4YWxkTrZu0gW';
	const parts = Array.from({ length: count }, (_, i) => `--${boundary}\r\nContent-Disposition: form-data; name="f${i}"\r\n\r\n1\r\n`).join('');
	return { body: `${parts}--${boundary}--\r\n`, type: `multipart/form-data; boundary=${boundary}` };
}

describe('the form size guard', () => {
	it('refuses a 5.6 MB body of 1.4 million fields with 413 before parsing it', async () => {
		const body = 'a=&'.repeat(1_400_000).slice(0, -1) + '0'; // ≈ 4.2 MB of empty fields, then padded past 5.6 MB below
		const padded = `${body}&pad=${'x'.repeat(5_600_000 - body.length)}`;
		expect(padded.length).toBeGreaterThanOrEqual(5_600_000);
		const event = formPost(new TextEncoder().encode(padded), URLENCODED);
		const started = performance.now();
		const res = await refuseUnreadableForm(event);
		const elapsedMs = performance.now() - started;
		expect(res?.status).toBe(413);
		expect(await res!.text()).toMatch(/larger than 1 MB/);
		// Not a timing assertion: recorded for BENCHMARKS.md (≈ 2 s of the event loop before the guard).
		console.log(`1.4 M fields, 5.6 MB: refused in ${elapsedMs.toFixed(1)} ms`);
	});

	it('refuses more than LIMITS.formFields url-encoded fields within the byte limit, naming the limit', async () => {
		const res = await refuseUnreadableForm(formPost(fields(LIMITS.formFields + 1), URLENCODED));
		expect(res?.status).toBe(413);
		expect(await res!.text()).toBe(`The form has more than ${LIMITS.formFields} fields, the most a form may have`);
	});

	it('lets exactly LIMITS.formFields fields through', async () => {
		expect(await refuseUnreadableForm(formPost(fields(LIMITS.formFields), URLENCODED))).toBeNull();
	});

	it('refuses a multipart form of too many parts, and lets one at the limit through', async () => {
		const over = multipart(LIMITS.formFields + 1);
		expect((await refuseUnreadableForm(formPost(over.body, over.type)))?.status).toBe(413);
		const at = multipart(LIMITS.formFields);
		expect(await refuseUnreadableForm(formPost(at.body, at.type))).toBeNull();
	});

	it('answers use:enhance posts in SvelteKit action JSON', async () => {
		const res = await refuseUnreadableForm(formPost(fields(LIMITS.formFields + 1), URLENCODED, { 'x-sveltekit-action': 'true' }));
		expect(res?.status).toBe(413);
		expect(await res!.json()).toEqual({ type: 'error', status: 413, error: { message: `The form has more than ${LIMITS.formFields} fields, the most a form may have` } });
	});

	it('refuses a declared content-length over the limit without reading the body', async () => {
		let pulled = 0;
		const stream = new ReadableStream<Uint8Array>({
			pull(controller) {
				pulled++;
				controller.enqueue(new TextEncoder().encode('a=1&'));
				if (pulled > 10) controller.close();
			}
		});
		const event = formPost(stream, URLENCODED, { 'content-length': String(LIMITS.formBytes + 1) });
		expect((await refuseUnreadableForm(event))?.status).toBe(413);
		expect(pulled).toBeLessThanOrEqual(2); // what the stream queued up front, nothing read on demand
	});
});

describe('countFormFields', () => {
	// Each case: body, content type, fields counted.
	it.each([
		['', URLENCODED, 0],
		['a=1', URLENCODED, 1],
		['a=1&b=2&c=', URLENCODED, 3],
		['a=1\r\nb=2', 'text/plain', 2],
		[multipart(3).body, multipart(3).type, 3]
	])('%j (%s) has %i fields', (body, type, count) => {
		expect(countFormFields(new TextEncoder().encode(body), type)).toBe(count);
	});
});
