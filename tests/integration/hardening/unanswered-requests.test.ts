// Requests that used to get no answer at all (the 10 000-case fuzz's one unanswered POST to a field check's cancel
// per run), and the bound on how long a request may wait on the database.
//
// A body the answer did not read, left half read, made Node stop reading the kept-alive connection (Node.js
// `_http_server` resOnFinish dumps only a request nobody started to consume; adapter-node's body stream starts at
// once), so the next request on it was never parsed. RFC 9112 §9.3: a server keeping a connection open must read
// the whole message before the next one on it can be read.
import { connect, type Socket } from 'node:net';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, DATABASE_BUSY_MESSAGE, getDb } from '../../../src/lib/server/db';
import { cancelOpenFieldChecks } from '../jobs/helpers/open-checks';
import { api } from './helpers/client';
import { startBuiltServer, type BuiltServer } from './helpers/built-server';
import { exchange } from './helpers/raw-exchange';
import { createHardeningWorkspace, type HardeningWorkspace } from './helpers/workspace';

/** A short lock timeout for this file's server, so the lock test takes about a second. */
const LOCK_TIMEOUT_MS = 1000;
/** Longer than any answer here takes on a loaded machine, far shorter than the keep-alive timeout (65 s). */
const ANSWER_WAIT_MS = 8000;

let server: BuiltServer;
let ws: HardeningWorkspace;

beforeAll(async () => {
	[server, ws] = await Promise.all([startBuiltServer({ databaseUrl: process.env.DATABASE_URL!, env: { DATABASE_LOCK_TIMEOUT_MS: String(LOCK_TIMEOUT_MS) } }), createHardeningWorkspace('unanswered')]);
}, 120_000);
afterAll(async () => {
	await server?.stop();
	if (ws) await cancelOpenFieldChecks(getDb(), ws.a.teamId);
	await closeDb();
});

function post(path: string, contentType: string, body: string | Uint8Array, extra = ''): string {
	const { host } = new URL(server.origin);
	return `POST ${path} HTTP/1.1\r\nHost: ${host}\r\nContent-Type: ${contentType}\r\nContent-Length: ${Buffer.byteLength(body)}\r\nConnection: keep-alive\r\n${extra}\r\n`;
}

async function openSocket(): Promise<Socket> {
	const { port, hostname } = new URL(server.origin);
	const socket = connect(Number(port), hostname);
	await new Promise((r) => socket.once('connect', r));
	return socket;
}

// The first request of each row is answered without its body being read; the second, on the same connection, must be answered.
const unreadBodies = [
	// the fuzz's case: the NUL-address guard answers 400 before the JSON guard reads the 270 kB body
	{ name: 'the NUL-address 400 on a 270 kB JSON body', path: '/api/v1/simulations/%00/cancel', type: 'application/json', body: JSON.stringify({ reason: 'x'.repeat(270_000) }), status: 400, token: true },
	// a route that takes no body (the cancel) answers 404 for an unknown check and never reads the 300 kB it was sent
	{ name: 'a route that takes no body, with 300 kB of bytes', path: '/api/v1/simulations/00000000-0000-4000-8000-000000000000/cancel', type: 'application/octet-stream', body: new Uint8Array(300_000).fill(7), status: 404, token: true },
	// the cross-site form refusal (no Origin), which SvelteKit itself answered before the request hook ran
	{ name: 'the cross-site form 403 on a 300 kB text/plain body', path: '/api/v1/size', type: 'text/plain', body: 'x'.repeat(300_000), status: 403, token: true },
	// no token: the API's 401 comes before anything reads the body
	{ name: 'the API 401 before the body is read', path: '/api/v1/size', type: 'application/octet-stream', body: new Uint8Array(300_000).fill(1), status: 401, token: false }
];

describe('a request whose body the answer did not read', () => {
	it.each(unreadBodies)('$name: the next request on the same kept-alive connection is answered', async ({ path, type, body, status, token }) => {
		const socket = await openSocket();
		try {
			const auth = token ? `Authorization: Bearer ${ws.editor.token}\r\n` : '';
			const first = await exchange(socket, post(path, type, body, auth), body);
			expect(first.head).toMatch(new RegExp(`^HTTP/1\\.1 ${status} `));
			expect(first.head).not.toMatch(/connection: close/i);
			const second = await exchange(socket, post('/api/v1/size', 'application/json', '{}'), '{}');
			// any answer is the point: 401 without a token
			expect(second.head).toMatch(/^HTTP\/1\.1 401 /);
			expect(JSON.parse(second.body).error).toMatch(/Sign in/);
		} finally {
			socket.destroy();
		}
	}, 30_000);

	it('is not waited for past BODY_SIZE_LIMIT: a 7 MB body ends its connection at once, never leaves it waiting', async () => {
		const socket = await openSocket();
		socket.on('error', () => undefined); // the server may close while the 7 MB are still being written (EPIPE)
		try {
			// over adapter-node's limit (6M, scripts/lib/server-env.ts): refused on its declared length, never read.
			// Closing such a connection is allowed (RFC 9112 §9.6); leaving it open and silent is the defect.
			const body = new Uint8Array(7_000_000).fill(32);
			const outcome = await exchange(socket, post('/api/v1/size', 'application/json', body, `Authorization: Bearer ${ws.editor.token}\r\n`), body).then(
				(answer) => answer.head.split('\r\n')[0],
				(err: Error) => err.message
			);
			expect(outcome).toMatch(/^(HTTP\/1\.1 413 |the server closed the connection)/);
		} finally {
			socket.destroy();
		}
		// and the server answers the next connection
		expect((await api(server.origin, '/api/v1/size', {}, { body: {} })).status).toBe(401);
	}, 40_000);
});

describe('a request waiting on the database', () => {
	it('answers JSON 503 "did not answer in time" when a field check stays locked past the lock timeout (PostgreSQL docs §20.11.1, lock_timeout)', async () => {
		const rev = `/api/v1/designs/${ws.a.designId}/revisions/${ws.a.label}`;
		const started = await api(server.origin, `${rev}/simulations`, { token: ws.editor.token }, { body: { mode: 'quick', homing: false } });
		expect(started.status).toBe(202);
		const id: string = started.body.id;

		// another session holds the check's row, as a worker's transaction would
		const blocker = new pg.Client({ connectionString: process.env.DATABASE_URL });
		await blocker.connect();
		try {
			await blocker.query('begin');
			await blocker.query('select id from field_check where id = $1 for update', [id]);
			const t0 = performance.now();
			const cancel = await api(server.origin, `/api/v1/simulations/${id}/cancel`, { token: ws.editor.token }, { body: {} });
			const waitedMs = performance.now() - t0;
			expect(cancel.status).toBe(503);
			expect(cancel.body).toEqual({ error: DATABASE_BUSY_MESSAGE, issues: [] });
			expect(cancel.headers.get('retry-after')).toBe('5');
			expect(waitedMs).toBeGreaterThanOrEqual(LOCK_TIMEOUT_MS * 0.9);
			expect(waitedMs).toBeLessThan(LOCK_TIMEOUT_MS + ANSWER_WAIT_MS);
		} finally {
			await blocker.query('rollback');
			await blocker.end();
		}

		// the lock gone, the same request succeeds: a queued check ends at once (200)
		const again = await api(server.origin, `/api/v1/simulations/${id}/cancel`, { token: ws.editor.token }, { body: {} });
		expect(again.status).toBe(200);
		expect(again.body.state).toBe('cancelled');
	}, 60_000);
});
