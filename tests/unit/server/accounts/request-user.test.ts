// Where sign-in and the team switch send people afterwards: only same-origin absolute paths (abuse review item 4).
import { describe, expect, it } from 'vitest';
import { DEFAULT_NEXT_PATH, safeNextPath } from '../../../../src/lib/server/accounts/request-user';

// Each hostile value either leaves the site in some browser (WHATWG URL Standard §4.4 "URL parsing":
// tabs and newlines are stripped, "\" counts as "/" in special schemes, so "/\t/host" and "/\host"
// become "//host"), or cannot be put in a Location header at all (CR/LF, non-ASCII → 500 before the fix).
const hostile: [string, string][] = [
	['//evil.example/x', 'protocol-relative URL'],
	['/\\evil.example/x', 'backslash read as a slash'],
	['\\/evil.example', 'leading backslash'],
	['/\t/evil.example/x', 'tab stripped by the URL parser, leaving //'],
	['/\n/evil.example', 'line feed stripped by the URL parser'],
	['/\r\nSet-Cookie: ff_session=x', 'CR/LF header injection'],
	['/ /evil.example', 'space'],
	['%2F%2Fevil.example', 'encoded slashes, not starting with /'],
	['/%2F%2Fevil.example', 'encoded slashes that decode to //'],
	['/%5Cevil.example', 'encoded backslash'],
	['/%0d%0aSet-Cookie:x', 'encoded CR/LF'],
	['/evil\u3002example', 'ideographic full stop (U+3002)'],
	['//evil\u3002example', 'ideographic full stop in a protocol-relative host'],
	['https://evil.example/', 'absolute URL'],
	['javascript:alert(1)', 'script URL'],
	['designs', 'relative path'],
	['/#//evil.example', 'fragment'],
	['', 'empty'],
	['/%E0%A4%A', 'broken percent-escape']
];

describe('safeNextPath', () => {
	it.each(hostile)('sends %j (%s) to the default page', (value) => {
		expect(safeNextPath(value)).toBe(DEFAULT_NEXT_PATH);
		expect(DEFAULT_NEXT_PATH).toBe('/designs');
	});

	it('keeps ordinary paths on this site, with their query', () => {
		expect(safeNextPath('/teams/abc-123')).toBe('/teams/abc-123');
		expect(safeNextPath('/designs/d1/r/B?tab=files')).toBe('/designs/d1/r/B?tab=files');
		expect(safeNextPath('/invites/AbC_-9')).toBe('/invites/AbC_-9');
		expect(safeNextPath('/designs/%C3%A9t%C3%A9')).toBe('/designs/%C3%A9t%C3%A9');
	});

	it('gives the fallback asked for when there is no next path', () => {
		expect(safeNextPath(null, '/teams')).toBe('/teams');
		expect(safeNextPath(undefined)).toBe('/designs');
	});
});
