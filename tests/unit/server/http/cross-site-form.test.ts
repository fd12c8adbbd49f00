// The cross-site form rule moved from SvelteKit into the request hook: SvelteKit 2's respond.js (csrf.checkOrigin)
// refuses a POST/PUT/PATCH/DELETE of a form content type (MDN HTMLFormElement.enctype) from another Origin with 403.
import { describe, expect, it } from 'vitest';
import { refuseCrossSiteForm } from '../../../../src/lib/server/http/cross-site-form';

const URL_OF_US = new URL('http://127.0.0.1:3000/teams?/create');

function req(method: string, type: string | null, origin: string | null, accept?: string): Request {
	const headers: Record<string, string> = {};
	if (type !== null) headers['content-type'] = type;
	if (origin !== null) headers.origin = origin;
	if (accept) headers.accept = accept;
	return new Request(URL_OF_US, { method, headers, body: method === 'GET' ? undefined : new TextEncoder().encode('name=x') }); // bytes: no content type of their own
}

describe('refuseCrossSiteForm', () => {
	it.each([
		// [method, content type, origin, refused]
		['POST', 'application/x-www-form-urlencoded', 'http://evil.example', true],
		['POST', 'multipart/form-data; boundary=zz', null, true], // no Origin at all: refused, as SvelteKit does
		['PUT', 'TEXT/PLAIN;charset=utf-8', 'http://evil.example', true], // type compared without parameters, case-insensitively
		['DELETE', 'application/x-sveltekit-formdata', 'http://evil.example', true],
		['POST', 'application/x-www-form-urlencoded', 'http://127.0.0.1:3000', false], // our own origin
		['POST', 'application/json', 'http://evil.example', false], // not a type a plain form can send
		['POST', null, 'http://evil.example', false],
		['GET', 'text/plain', 'http://evil.example', false]
	] as const)('%s %s from %s: refused %s', async (method, type, origin, refused) => {
		const res = refuseCrossSiteForm(req(method, type, origin), URL_OF_US);
		if (!refused) return expect(res).toBeNull();
		expect(res?.status).toBe(403);
		expect(await res!.text()).toBe(`Cross-site ${method} form submissions are forbidden`);
	});

	it('answers JSON { message } to a caller that accepts JSON, as SvelteKit did', async () => {
		const res = refuseCrossSiteForm(req('POST', 'text/plain', 'http://evil.example', 'application/json'), URL_OF_US);
		expect(res?.headers.get('content-type')).toMatch(/^application\/json/);
		expect(await res!.json()).toEqual({ message: 'Cross-site POST form submissions are forbidden' });
	});
});
