// Calling a route's load or action the way SvelteKit does, with locals from the real identify(), and
// reducing what it did to one outcome: a status, 'ok', or 'signin' (sent to sign in).
import { isActionFailure, isHttpError, isRedirect, type Cookies, type RequestEvent } from '@sveltejs/kit';
import { getLucia } from '../../../../src/lib/server/auth/lucia';
import { identify, type RequestIdentity } from '../../../../src/lib/server/auth/request-identity';

export interface CookieJar extends Cookies {
	values: Record<string, string>;
}

export function cookieJar(initial: Record<string, string> = {}): CookieJar {
	const values = { ...initial };
	return {
		values,
		get: (name: string) => values[name],
		getAll: () => Object.entries(values).map(([name, value]) => ({ name, value })),
		set: (name: string, value: string, opts: { maxAge?: number }) => {
			if (value === '' || opts?.maxAge === 0) delete values[name];
			else values[name] = value;
		},
		delete: (name: string) => {
			delete values[name];
		},
		serialize: () => ''
	} as unknown as CookieJar;
}

export async function sessionFor(userId: string): Promise<string> {
	return (await getLucia().createSession(userId, {})).id;
}

export async function identityFor(sessionId: string | null, bearer?: string): Promise<RequestIdentity> {
	const headers: Record<string, string> = bearer ? { authorization: `Bearer ${bearer}` } : {};
	const jar = cookieJar(sessionId ? { [getLucia().sessionCookieName]: sessionId } : {});
	return identify(new Request('http://127.0.0.1/', { headers }), jar);
}

export interface CallOptions {
	identity: RequestIdentity;
	path: string;
	params?: Record<string, string>;
	form?: Record<string, string>;
	cookies?: CookieJar;
	parent?: () => Promise<Record<string, unknown>>;
	/** What getClientAddress() answers (127.0.0.1 unless given: tests of the address limiter use their own). */
	clientAddress?: string;
}

export function eventFor(opts: CallOptions): RequestEvent {
	const url = new URL(opts.path, 'http://127.0.0.1');
	const request = opts.form
		? new Request(url, { method: 'POST', headers: { 'content-type': 'application/x-www-form-urlencoded' }, body: new URLSearchParams(opts.form).toString() })
		: new Request(url);
	const id = opts.identity;
	return {
		request,
		url,
		params: opts.params ?? {},
		locals: { identity: id, user: id.user, sessionId: id.sessionId, apiToken: id.apiToken },
		cookies: opts.cookies ?? cookieJar(),
		parent: opts.parent ?? (async () => ({})),
		route: { id: null },
		setHeaders: () => undefined,
		getClientAddress: () => opts.clientAddress ?? '127.0.0.1',
		isDataRequest: false,
		isSubRequest: false,
		platform: undefined,
		depends: () => undefined,
		untrack: <T>(fn: () => T) => fn(),
		fetch
	} as unknown as RequestEvent;
}

export type Outcome = 'ok' | 'signin' | number;

export interface Called {
	outcome: Outcome;
	/** The returned data, or the failure's data. */
	data: unknown;
	location?: string;
}

/** Runs a load or action; a redirect to /signin is 'signin', any other redirect or returned data is 'ok'. */
export async function call(fn: (event: RequestEvent) => unknown, opts: CallOptions): Promise<Called> {
	try {
		const result = await fn(eventFor(opts));
		if (isActionFailure(result)) return { outcome: result.status, data: result.data };
		return { outcome: 'ok', data: result };
	} catch (err) {
		if (isRedirect(err)) return { outcome: err.location.startsWith('/signin') ? 'signin' : 'ok', data: undefined, location: err.location };
		if (isHttpError(err)) return { outcome: err.status, data: err.body };
		throw err;
	}
}
