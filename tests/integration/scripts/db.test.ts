// scripts/db.ts and scripts/lib/postgres.ts: the private cluster is idempotent, survives a crash, and
// stays out of the way when DATABASE_URL is set. Uses its own data folder and port, not the test cluster's.
import { mkdtempSync, existsSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { isPortOpen, waitFor } from '../../../scripts/lib/ports';
import { runScript } from './run-script';

const dataDir = mkdtempSync(join(tmpdir(), 'ff-db-'));
const port = 54000 + (process.pid % 900);
const env = { FRINGEFIELD_DATA_DIR: dataDir, FRINGEFIELD_PG_PORT: String(port), DATABASE_URL: undefined };
const postmasterPid = () => Number(readFileSync(join(dataDir, 'pg', 'postmaster.pid'), 'utf8').split('\n')[0]);

afterAll(() => {
	runScript('db.ts', ['stop'], env);
	rmSync(dataDir, { recursive: true, force: true });
});

describe('the private PostgreSQL cluster', () => {
	it('starts once: a second start finds the running server', async () => {
		const first = runScript('db.ts', ['start'], env);
		expect(first.status, first.stderr).toBe(0);
		expect(first.stdout).toMatch(/PostgreSQL started/);
		const pid = postmasterPid();
		const second = runScript('db.ts', ['start'], env);
		expect(second.status, second.stderr).toBe(0);
		expect(second.stdout).toMatch(new RegExp(`already running \\(pid ${pid}\\)`));
		expect(postmasterPid()).toBe(pid);
		expect(await isPortOpen(port)).toBe(true);
	});

	it('listens on 127.0.0.1 with its socket inside the data folder', () => {
		const lines = readFileSync(join(dataDir, 'pg', 'postmaster.pid'), 'utf8').split('\n');
		// postmaster.pid lines (PostgreSQL docs, "Database File Layout"): 4 port, 5 socket dir, 6 listen address.
		expect(lines[3]).toBe(String(port));
		expect(lines[4]).toBe(join(dataDir, 'pg'));
		expect(lines[5]).toBe('127.0.0.1');
	});

	it('stop closes the port', async () => {
		const stop = runScript('db.ts', ['stop'], env);
		expect(stop.status, stop.stderr).toBe(0);
		expect(await waitFor(async () => !(await isPortOpen(port)), 5000)).toBe(true);
	});

	it('comes back after the postmaster is killed with SIGKILL (stale pid file)', async () => {
		expect(runScript('db.ts', ['start'], env).status).toBe(0);
		const pid = postmasterPid();
		process.kill(pid, 'SIGKILL');
		await waitFor(async () => {
			try {
				process.kill(pid, 0);
				return false;
			} catch {
				return true;
			}
		}, 5000);
		expect(existsSync(join(dataDir, 'pg', 'postmaster.pid'))).toBe(true);
		const again = runScript('db.ts', ['start'], env);
		expect(again.status, again.stderr + again.stdout).toBe(0);
		expect(again.stdout).toMatch(/PostgreSQL started/);
		expect(postmasterPid()).not.toBe(pid);
		expect(await isPortOpen(port)).toBe(true);
	});

	it('starts nothing when DATABASE_URL is set', () => {
		const other = mkdtempSync(join(tmpdir(), 'ff-db-url-'));
		const r = runScript('db.ts', ['start'], { FRINGEFIELD_DATA_DIR: other, FRINGEFIELD_PG_PORT: String(port + 1), DATABASE_URL: `postgres://postgres@127.0.0.1:${port}/postgres` });
		expect(r.status).toBe(0);
		expect(r.stdout).toMatch(/starting nothing/);
		expect(existsSync(join(other, 'pg'))).toBe(false);
		rmSync(other, { recursive: true, force: true });
	});
});

describe('where the cluster lives', () => {
	it('is <data dir>/pg, or a folder of its own when root runs it below a folder the server user cannot enter', async () => {
		const { clusterDir } = await import('../../../scripts/lib/postgres');
		const { loadConfig } = await import('../../../scripts/lib/config');
		const open = mkdtempSync(join(tmpdir(), 'ff-open-'));
		const closed = mkdtempSync(join(tmpdir(), 'ff-closed-'));
		const { chmodSync } = await import('node:fs');
		chmodSync(open, 0o755);
		chmodSync(closed, 0o700);
		const base = loadConfig();
		expect(clusterDir({ ...base, dataDir: join(open, 'data') })).toBe(join(open, 'data', 'pg'));
		// the data folder itself may be closed (it is ours and gets opened); a closed folder above it cannot be
		const hidden = clusterDir({ ...base, dataDir: join(closed, 'data') });
		if (process.getuid?.() === 0) {
			expect(hidden.startsWith(join(closed, 'data'))).toBe(false);
			expect(hidden).toBe(clusterDir({ ...base, dataDir: join(closed, 'data') }));
		} else {
			expect(hidden).toBe(join(closed, 'data', 'pg'));
		}
		rmSync(open, { recursive: true, force: true });
		rmSync(closed, { recursive: true, force: true });
	});
});
