// Talking to the built server like a browser (form actions with use:enhance, session cookie, Origin)
// and like a script (JSON with a bearer token). Results reduced to status + parsed body.
import * as devalue from 'devalue';

export interface Caller {
	cookie?: string;
	token?: string;
}

export interface Answer {
	status: number;
	headers: Headers;
	/** JSON body (API), or for an action: { type, status, data | error }. */
	body: any;
	text: string;
}

function authHeaders(caller: Caller): Record<string, string> {
	const h: Record<string, string> = {};
	if (caller.cookie) h.cookie = `ff_session=${caller.cookie}`;
	if (caller.token) h.authorization = `Bearer ${caller.token}`;
	return h;
}

async function answer(res: Response): Promise<Answer> {
	const text = await res.text();
	let body: any = undefined;
	try {
		body = JSON.parse(text);
	} catch {
		/* not JSON: kept as text */
	}
	return { status: res.status, headers: res.headers, body, text };
}

export interface ApiRequest {
	method?: string;
	body?: unknown;
	rawBody?: string | Uint8Array;
	contentType?: string;
}

export async function api(origin: string, path: string, caller: Caller, req: ApiRequest = {}): Promise<Answer> {
	const headers: Record<string, string> = { accept: 'application/json', ...authHeaders(caller) };
	let body: string | Uint8Array | undefined;
	if (req.rawBody !== undefined) {
		body = req.rawBody;
		headers['content-type'] = req.contentType ?? 'application/json';
	} else if (req.body !== undefined) {
		body = JSON.stringify(req.body);
		headers['content-type'] = req.contentType ?? 'application/json';
	}
	return answer(await fetch(origin + path, { method: req.method ?? (body === undefined ? 'GET' : 'POST'), headers, body: body as BodyInit, redirect: 'manual' }));
}

export interface ActionAnswer extends Answer {
	/** 'success' | 'failure' | 'redirect' | 'error' (SvelteKit's enhance protocol). */
	type: string;
	/** The status the action meant (failure/error status; 303 for a redirect; 200 for success). */
	actionStatus: number;
	data: any;
	message: string;
}

/** POSTs a form the way use:enhance does: same-origin, x-sveltekit-action, JSON answer. */
export async function action(
	origin: string,
	path: string,
	caller: Caller,
	form: FormData | Record<string, string> | string,
	opts: { contentType?: string; origin?: string; headers?: Record<string, string> } = {}
): Promise<ActionAnswer> {
	const headers: Record<string, string> = { accept: 'application/json', 'x-sveltekit-action': 'true', origin: opts.origin ?? origin, ...authHeaders(caller), ...opts.headers };
	let body: BodyInit;
	if (typeof form === 'string') {
		body = form;
		headers['content-type'] = opts.contentType ?? 'application/x-www-form-urlencoded';
	} else if (form instanceof FormData) {
		body = form;
	} else {
		body = new URLSearchParams(form).toString();
		headers['content-type'] = 'application/x-www-form-urlencoded';
	}
	const a = await answer(await fetch(origin + path, { method: 'POST', headers, body, redirect: 'manual' }));
	const b = a.body ?? {};
	let data: any = undefined;
	if (typeof b.data === 'string') {
		try {
			data = devalue.parse(b.data);
		} catch {
			data = b.data;
		}
	}
	const type = typeof b.type === 'string' ? b.type : a.status >= 400 ? 'error' : 'unknown';
	const actionStatus = typeof b.status === 'number' ? b.status : type === 'success' ? 200 : a.status;
	const message = String(data?.message ?? data?.upload?.message ?? data?.retune?.message ?? data?.remove?.message ?? data?.fieldCheck?.message ?? b.error?.message ?? b.message ?? (a.status >= 400 ? a.text.slice(0, 200) : ''));
	return { ...a, type, actionStatus, data, message };
}

/** Field names a failed action reported (its fieldErrors, or issues keyed by field). */
export function failureFields(data: any): string[] {
	if (!data || typeof data !== 'object') return [];
	const issues = data.fieldErrors ?? data.issues ?? data.errors;
	// the one form-failure shape lists { field, message }; keyed objects are read by their keys
	if (Array.isArray(issues)) return issues.map((i) => String(i?.field ?? i?.path ?? '')).filter((f) => f !== '');
	if (issues && typeof issues === 'object') return Object.keys(issues);
	return [];
}
