// Bad configuration gives one clear line naming the setting, a non-zero exit and no stack trace.
import { createServer, type Server } from 'node:net';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runScript } from './run-script';

let blocker: Server;
let blockedPort = 0;
const dataDir = mkdtempSync(join(tmpdir(), 'ff-cfg-'));

beforeAll(async () => {
	blocker = createServer();
	await new Promise<void>((done) => blocker.listen(0, '127.0.0.1', () => done()));
	blockedPort = (blocker.address() as { port: number }).port;
});
afterAll(() => {
	blocker.close();
	rmSync(dataDir, { recursive: true, force: true });
});

function expectOneLine(stderr: string, setting: string) {
	const lines = stderr.trim().split('\n').filter((l) => !/ExperimentalWarning|--trace-warnings|engine/i.test(l));
	expect(lines).toHaveLength(1);
	expect(lines[0].startsWith(`${setting}:`), lines[0]).toBe(true);
	expect(stderr).not.toMatch(/\n\s+at /);
}

describe('bad configuration', () => {
	it('an unreachable DATABASE_URL names DATABASE_URL', () => {
		const r = runScript('migrate.ts', [], { DATABASE_URL: `postgres://postgres@127.0.0.1:${blockedPort + 1}/nowhere` });
		expect(r.status).not.toBe(0);
		expectOneLine(r.stderr, 'DATABASE_URL');
	});

	it('a malformed DATABASE_URL names DATABASE_URL', () => {
		const r = runScript('migrate.ts', [], { DATABASE_URL: 'not a url' });
		expect(r.status).not.toBe(0);
		expectOneLine(r.stderr, 'DATABASE_URL');
	});

	it('the app port in use names PORT', () => {
		const r = runScript('start.ts', [], { PORT: String(blockedPort), FRINGEFIELD_DATA_DIR: dataDir });
		expect(r.status).not.toBe(0);
		expectOneLine(r.stderr, 'PORT');
	});

	it('the cluster port in use names FRINGEFIELD_PG_PORT', () => {
		const r = runScript('db.ts', ['start'], { FRINGEFIELD_PG_PORT: String(blockedPort), FRINGEFIELD_DATA_DIR: dataDir, DATABASE_URL: undefined });
		expect(r.status).not.toBe(0);
		expectOneLine(r.stderr, 'FRINGEFIELD_PG_PORT');
	});

	it('a port that is not a number names the setting', () => {
		const r = runScript('db.ts', ['start'], { FRINGEFIELD_PG_PORT: 'abc', FRINGEFIELD_DATA_DIR: dataDir });
		expect(r.status).not.toBe(0);
		expectOneLine(r.stderr, 'FRINGEFIELD_PG_PORT');
	});
});
