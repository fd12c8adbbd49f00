// A kept-alive connection outlives the clients' idle timers, so a request sent on it is never met by the server
// closing it (the soak's "other side closed" / ECONNRESET on a starved machine: a lost sign-in or upload POST).
// Node's HTTP server closes an idle connection after 5 s unless told otherwise (Node.js docs, server.keepAliveTimeout);
// undici, the fetch of Node, keeps one for the server's stated timeout less 1 s (undici docs, keepAliveTimeoutThreshold).
import { readFileSync } from 'node:fs';
import { connect } from 'node:net';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { SERVER_ENV_DEFAULTS, serverEnv } from '../../../scripts/lib/server-env';
import { closeDb } from '../../../src/lib/server/db';
import { rootDir, startBuiltServer, type BuiltServer } from './helpers/built-server';
import { exchange } from './helpers/raw-exchange';

let server: BuiltServer;
beforeAll(async () => {
	server = await startBuiltServer({ databaseUrl: process.env.DATABASE_URL! });
}, 120_000);
afterAll(async () => {
	await server?.stop();
	await closeDb();
});

describe('kept-alive connections', () => {
	it('are held longer than Node’s 5 s default: a POST sent after 6 s idle on the same connection is answered', async () => {
		const { port, hostname } = new URL(server.origin);
		const socket = connect(Number(port), hostname);
		await new Promise((r) => socket.once('connect', r));
		try {
			const first = (await exchange(socket, `GET /healthz HTTP/1.1\r\nHost: ${hostname}:${port}\r\nConnection: keep-alive\r\n\r\n`)).head;
			expect(first).toMatch(/^HTTP\/1\.1 200/);
			// the server says how long it keeps the connection, so clients can close first
			expect(first).toMatch(new RegExp(`keep-alive: timeout=${SERVER_ENV_DEFAULTS.KEEP_ALIVE_TIMEOUT}`, 'i'));
			await new Promise((r) => setTimeout(r, 6_000));
			const body = '{}';
			const second = (await exchange(socket, `POST /api/v1/size HTTP/1.1\r\nHost: ${hostname}:${port}\r\nContent-Type: application/json\r\nContent-Length: ${body.length}\r\nConnection: keep-alive\r\n\r\n`, body)).head;
			// an answer at all is the point: 401 without a token
			expect(second).toMatch(/^HTTP\/1\.1 401/);
		} finally {
			socket.destroy();
		}
	}, 30_000);

	it('`npm run serve` starts the server with the same defaults as `npm start`, the benchmarks and the tests', () => {
		const serve: string = JSON.parse(readFileSync(join(rootDir, 'package.json'), 'utf8')).scripts.serve;
		for (const [name, value] of Object.entries(SERVER_ENV_DEFAULTS)) expect(serve).toContain(`${name}=\${${name}:-${value}}`);
		// a user's own value wins
		expect(serverEnv({ KEEP_ALIVE_TIMEOUT: '120' }).KEEP_ALIVE_TIMEOUT).toBe('120');
		expect(serverEnv({}).HEADERS_TIMEOUT).toBe(SERVER_ENV_DEFAULTS.HEADERS_TIMEOUT);
		expect(Number(SERVER_ENV_DEFAULTS.HEADERS_TIMEOUT)).toBeGreaterThan(Number(SERVER_ENV_DEFAULTS.KEEP_ALIVE_TIMEOUT));
	});
});
