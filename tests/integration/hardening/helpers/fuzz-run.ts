// Runs hostile requests at the built server and judges each answer: never 5xx; a refusal is 4xx with a
// message (a field named where there is one); a route that accepted nothing wrote nothing (row counts
// of the workspace before and after).
import fc from 'fast-check';
import { action, api, failureFields, type Answer } from './client';
import type { FuzzRequest, FuzzTarget } from './fuzz-targets';
import { workspaceRowCounts, type RowCounts } from './row-counts';
import type { HardeningWorkspace } from './workspace';

export interface TargetReport {
	name: string;
	kind: 'api' | 'action';
	cases: number;
	/** Answers by status (the action's own status for form actions). */
	statuses: Record<string, number>;
	serverErrors: number;
	/** 4xx answers without a message. */
	unexplained: number;
	/** Cases the route accepted (valid input that happened to be generated). */
	accepted: number;
	/** Tables whose row count changed although nothing was accepted. */
	writtenTables: string[];
	samples: { request: string; status: number; message: string }[];
	elapsedMs: number;
}

interface Judged {
	status: number;
	accepted: boolean;
	explained: boolean;
	message: string;
}

function describe(req: FuzzRequest): string {
	const body = req.json !== undefined ? JSON.stringify(req.json) : req.raw ? `${req.raw.contentType}: ${String(req.raw.body)}` : req.form ? new URLSearchParams(req.form).toString() : req.multipart ? `multipart ${JSON.stringify(req.multipart.fields)} file=${req.multipart.file?.name}` : '';
	return `${req.method} ${req.path.slice(0, 300)} ${body.slice(0, 300)}`;
}

function judgeApi(a: Answer): Judged {
	const accepted = a.status < 400;
	// Our API answers { error, issues }; SvelteKit's own refusals (the CSRF origin check) answer { message }.
	const message: string = a.body?.error ?? a.body?.message ?? a.text.slice(0, 200);
	const issues: { path?: string; message?: string }[] = Array.isArray(a.body?.issues) ? a.body.issues : [];
	let explained = typeof message === 'string' && message.length > 0 && (a.body !== undefined || a.status === 413);
	// A 400 names what was wrong: an issue with a path, or one about the body/query as a whole.
	if (a.status === 400) explained &&= issues.length > 0 && issues.every((i) => typeof i.message === 'string' && i.message.length > 0) && issues.some((i) => (i.path ?? '') !== '' || /body|query|field|JSON|document/i.test(`${i.message} ${message}`));
	// adapter-node answers an oversize body in plain text before the app runs.
	if (a.status === 413) explained = /limit|large/i.test(a.text);
	return { status: a.status, accepted, explained, message };
}

async function send(origin: string, req: FuzzRequest, kind: 'api' | 'action'): Promise<Judged> {
	if (kind === 'api') {
		const a = await api(origin, req.path, req.caller, req.json !== undefined ? { method: req.method, body: req.json } : req.raw ? { method: req.method, rawBody: req.raw.body, contentType: req.raw.contentType } : { method: req.method });
		return judgeApi(a);
	}
	let body: FormData | Record<string, string> | string;
	let contentType: string | undefined;
	if (req.multipart) {
		const fd = new FormData();
		for (const [k, v] of Object.entries(req.multipart.fields)) fd.append(k, v);
		if (req.multipart.file) fd.append('file', new File([req.multipart.file.bytes as BlobPart], req.multipart.file.name, { type: req.multipart.file.type }));
		body = fd;
	} else if (req.raw) {
		body = typeof req.raw.body === 'string' ? req.raw.body : new TextDecoder().decode(req.raw.body);
		contentType = req.raw.contentType;
	} else body = req.form ?? {};
	const a = await action(origin, req.path, req.caller, body, { contentType });
	if (a.status >= 500) return { status: a.status, accepted: false, explained: false, message: a.message };
	// A redirect before the action ran (a path normalised by the URL parser, e.g. "/reset/." → "/reset") is a clear answer.
	if (a.status >= 300 && a.status < 400) return { status: a.status, accepted: false, explained: true, message: `redirect to ${a.headers.get('location')}` };
	const status = a.actionStatus;
	const accepted = a.type === 'success' || a.type === 'redirect';
	const fields = failureFields(a.data);
	let explained = a.message.trim().length > 0 || fields.length > 0;
	if (a.status === 413) explained = /limit|large/i.test(a.text);
	return { status, accepted, explained, message: a.message || fields.join(', ') };
}

function diff(before: RowCounts, after: RowCounts): string[] {
	return Object.keys(before).filter((k) => before[k] !== after[k]);
}

export interface RunOptions {
	runs: number;
	seed: number;
	concurrency: number;
	onProgress?: (line: string) => void;
}

export async function fuzzTarget(origin: string, ws: HardeningWorkspace, target: FuzzTarget, opts: RunOptions): Promise<TargetReport> {
	const requests = fc.sample(target.requests, { numRuns: opts.runs, seed: opts.seed });
	const report: TargetReport = { name: target.name, kind: target.kind, cases: 0, statuses: {}, serverErrors: 0, unexplained: 0, accepted: 0, writtenTables: [], samples: [], elapsedMs: 0 };
	const before = await workspaceRowCounts(ws.teamIds, ws.userIds, ws.domain);
	const started = performance.now();
	let next = 0;
	const worker = async () => {
		while (next < requests.length) {
			const req = requests[next++];
			let judged: Judged;
			try {
				judged = await send(origin, req, target.kind);
			} catch (err) {
				// The connection itself failed: count it as a server error.
				// Its cause (a reset, a refused connection, a timeout) says which.
				const cause = (err as { cause?: { code?: string; message?: string } }).cause;
				judged = { status: 599, accepted: false, explained: false, message: `request failed: ${(err as Error).message}${cause ? ` (${[cause.code, cause.message].filter(Boolean).join(': ')})` : ''}` };
			}
			report.cases++;
			report.statuses[judged.status] = (report.statuses[judged.status] ?? 0) + 1;
			if (judged.accepted) report.accepted++;
			const bad = judged.status >= 500 || (!judged.accepted && !judged.explained);
			if (judged.status >= 500) report.serverErrors++;
			else if (!judged.accepted && !judged.explained) report.unexplained++;
			if (bad && report.samples.length < 5) report.samples.push({ request: describe(req), status: judged.status, message: judged.message.slice(0, 300) });
		}
	};
	await Promise.all(Array.from({ length: opts.concurrency }, worker));
	report.elapsedMs = performance.now() - started;
	const after = await workspaceRowCounts(ws.teamIds, ws.userIds, ws.domain);
	if (report.accepted === 0) report.writtenTables = diff(before, after);
	opts.onProgress?.(`${target.name}: ${report.cases} cases, ${report.serverErrors} 5xx, ${report.accepted} accepted, ${(report.elapsedMs / 1000).toFixed(1)} s`);
	return report;
}
