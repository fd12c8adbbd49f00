// Abuse review item 2: the demo and production modes of the built server (`node build`) and of `npm start`.
// The demo shows caught mail and a banner; production has no mailbox route, and refuses to start without real
// SMTP settings and an HTTPS ORIGIN unless FRINGEFIELD_LOCAL_TRIAL=1; `npm start` with DATABASE_URL seeds nothing.
import { spawn } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { copyBuild, freePort, rootDir, startBuiltServer, type BuiltServer } from './helpers/built-server';

const scratch = `fringefield_modes_${randomBytes(4).toString('hex')}`;
const adminUrl = process.env.DATABASE_URL!.replace(/\/[^/]+$/, '/postgres');
const scratchUrl = process.env.DATABASE_URL!.replace(/\/[^/]+$/, `/${scratch}`);
const dataDir = mkdtempSync(join(tmpdir(), 'ff-modes-'));
let buildDir = '';

/** What a real production deployment sets (nothing is sent during these tests). */
const PRODUCTION = { FRINGEFIELD_MODE: 'production', FRINGEFIELD_LOCAL_TRIAL: '0', SMTP_HOST: 'smtp.example.org', SMTP_PORT: '587', SMTP_FROM: 'Fringefield <noreply@example.org>' };
/** Settings of the test run that a production server must not silently inherit. */
const INHERITED = ['FRINGEFIELD_MODE', 'FRINGEFIELD_LOCAL_TRIAL', 'FRINGEFIELD_DEV_MAILBOX', 'SMTP_HOST', 'SMTP_PORT', 'SMTP_FROM', 'MAIL_FROM', 'SMTP_USER', 'SMTP_PASSWORD', 'SMTP_TLS', 'ORIGIN'];

async function admin(sql: string): Promise<void> {
	const client = new pg.Client({ connectionString: adminUrl });
	await client.connect();
	try {
		await client.query(sql);
	} finally {
		await client.end();
	}
}

async function count(table: string): Promise<number> {
	const client = new pg.Client({ connectionString: scratchUrl });
	await client.connect();
	try {
		return Number((await client.query(`select count(*) as n from ${table}`)).rows[0].n);
	} finally {
		await client.end();
	}
}

function childEnv(extra: Record<string, string | undefined>): NodeJS.ProcessEnv {
	const env: NodeJS.ProcessEnv = { ...process.env };
	for (const key of INHERITED) delete env[key];
	for (const [k, v] of Object.entries(extra)) {
		if (v === undefined) delete env[k];
		else env[k] = v;
	}
	return env;
}

/** Runs `node build` with `env` and expects it to exit: its code and stderr. */
async function refusedStart(env: Record<string, string | undefined>): Promise<{ code: number | null; stderr: string }> {
	const child = spawn(process.execPath, [buildDir], {
		cwd: rootDir,
		stdio: ['ignore', 'pipe', 'pipe'],
		env: childEnv({ DATABASE_URL: process.env.DATABASE_URL, HOST: '127.0.0.1', PORT: String(await freePort()), ...env })
	});
	let stderr = '';
	child.stderr!.on('data', (c: Buffer) => (stderr += c.toString()));
	const timer = setTimeout(() => child.kill('SIGKILL'), 30_000);
	const code = await new Promise<number | null>((done) => child.once('exit', (c) => done(c)));
	clearTimeout(timer);
	return { code, stderr };
}

function expectOneLine(stderr: string, setting: string): void {
	const lines = stderr.trim().split('\n').filter((l) => !/ExperimentalWarning|--trace-warnings|engine/i.test(l));
	expect(lines, stderr).toHaveLength(1);
	expect(lines[0].startsWith(`${setting}:`), lines[0]).toBe(true);
	expect(stderr).not.toMatch(/\n\s+at /);
}

async function status(server: BuiltServer, path: string): Promise<number> {
	const res = await fetch(`${server.origin}${path}`, { redirect: 'manual' });
	await res.arrayBuffer();
	return res.status;
}

async function page(server: BuiltServer, path: string): Promise<string> {
	return (await fetch(`${server.origin}${path}`)).text();
}

/** Routes every mode serves, with the status an anonymous visitor gets. */
const COMMON_ROUTES: [string, number][] = [
	['/healthz', 200],
	['/', 200],
	['/signin', 200],
	['/signup', 200],
	['/reset', 200],
	['/api/v1/openapi.json', 200],
	['/api/v1/teams', 401],
	['/designs', 303]
];

beforeAll(async () => {
	buildDir = copyBuild();
	await admin(`create database "${scratch}"`);
}, 120_000);
afterAll(async () => {
	rmSync(buildDir, { recursive: true, force: true });
	rmSync(dataDir, { recursive: true, force: true });
	await admin(`drop database if exists "${scratch}" with (force)`);
});

describe('the demo mode', () => {
	let server: BuiltServer;
	beforeAll(async () => {
		server = await startBuiltServer({ databaseUrl: process.env.DATABASE_URL!, buildDir, env: { FRINGEFIELD_MODE: 'demo', FRINGEFIELD_LOCAL_TRIAL: '0' } });
	}, 90_000);
	afterAll(() => server?.stop());

	it('serves the common routes and the mailbox page and JSON', async () => {
		for (const [path, expected] of [...COMMON_ROUTES, ['/dev/mailbox', 200], ['/dev/mailbox.json', 200]] as const) expect([path, await status(server, path)]).toEqual([path, expected]);
	});

	it('says on every page that it is a public demo', async () => {
		for (const path of ['/', '/signin', '/signup', '/reset']) {
			const html = await page(server, path);
			expect(html, path).toContain('data-testid="demo-banner"');
			expect(html, path).toContain('everything here is public');
		}
	});
});

describe('the production mode', () => {
	let server: BuiltServer;
	beforeAll(async () => {
		server = await startBuiltServer({ databaseUrl: process.env.DATABASE_URL!, buildDir, origin: 'https://fringefield.example', env: PRODUCTION });
	}, 90_000);
	afterAll(() => server?.stop());

	it('serves the common routes but has no mailbox: 404 for /dev/mailbox and /dev/mailbox.json', async () => {
		for (const [path, expected] of [...COMMON_ROUTES, ['/dev/mailbox', 404], ['/dev/mailbox.json', 404], ['/dev/mailbox.json?to=demo@fringefield.test', 404]] as const) {
			expect([path, await status(server, path)]).toEqual([path, expected]);
		}
	});

	it('shows no demo banner', async () => {
		expect(await page(server, '/signin')).not.toContain('demo-banner');
	});

	it('is the default: without FRINGEFIELD_MODE the mailbox is not there', async () => {
		const plain = await startBuiltServer({ databaseUrl: process.env.DATABASE_URL!, buildDir, origin: 'https://fringefield.example', env: { ...PRODUCTION, FRINGEFIELD_MODE: '', FRINGEFIELD_DEV_MAILBOX: '1' } });
		try {
			expect(await status(plain, '/dev/mailbox.json')).toBe(404);
		} finally {
			await plain.stop();
		}
	}, 90_000);
});

describe('a production server refuses to start with one line naming the setting', () => {
	it('without SMTP_HOST', async () => {
		const r = await refusedStart({ ...PRODUCTION, SMTP_HOST: undefined, ORIGIN: 'https://fringefield.example' });
		expect(r.code).toBe(1);
		expectOneLine(r.stderr, 'SMTP_HOST');
	}, 40_000);

	it('without SMTP_FROM', async () => {
		const r = await refusedStart({ ...PRODUCTION, SMTP_FROM: undefined, ORIGIN: 'https://fringefield.example' });
		expect(r.code).toBe(1);
		expectOneLine(r.stderr, 'SMTP_FROM');
	}, 40_000);

	it('with an http:// ORIGIN', async () => {
		const r = await refusedStart({ ...PRODUCTION, ORIGIN: 'http://fringefield.example' });
		expect(r.code).toBe(1);
		expectOneLine(r.stderr, 'ORIGIN');
	}, 40_000);

	it('with plain-text SMTP to another machine', async () => {
		const r = await refusedStart({ ...PRODUCTION, SMTP_TLS: 'none', ORIGIN: 'https://fringefield.example' });
		expect(r.code).toBe(1);
		expectOneLine(r.stderr, 'SMTP_TLS');
	}, 40_000);
});

describe('a local trial (FRINGEFIELD_LOCAL_TRIAL=1)', () => {
	it('starts without SMTP settings and on plain http, and still has no mailbox', async () => {
		const trial = await startBuiltServer({ databaseUrl: process.env.DATABASE_URL!, buildDir, env: { FRINGEFIELD_MODE: 'production', FRINGEFIELD_LOCAL_TRIAL: '1', SMTP_HOST: '', SMTP_FROM: '' } });
		try {
			expect(await status(trial, '/signin')).toBe(200);
			expect(await status(trial, '/dev/mailbox')).toBe(404);
			expect(await status(trial, '/dev/mailbox.json')).toBe(404);
			expect(await page(trial, '/signin')).not.toContain('demo-banner');
		} finally {
			await trial.stop();
		}
	}, 90_000);
});

describe('npm start with DATABASE_URL (the production path)', () => {
	function startScript(env: Record<string, string | undefined>) {
		return spawn(process.execPath, ['--import', 'tsx', 'scripts/start.ts'], {
			cwd: rootDir,
			stdio: ['ignore', 'pipe', 'pipe'],
			env: childEnv({ DATABASE_URL: scratchUrl, FRINGEFIELD_DATA_DIR: dataDir, FRINGEFIELD_SKIP_BUILD: '1', ...env })
		});
	}

	it('refuses without SMTP settings before touching the database', async () => {
		const child = startScript({ PORT: String(await freePort()) });
		let stderr = '';
		child.stderr!.on('data', (c: Buffer) => (stderr += c.toString()));
		const code = await new Promise<number | null>((done) => child.once('exit', (c) => done(c)));
		expect(code).toBe(1);
		expectOneLine(stderr, 'SMTP_HOST');
		await expect(count('app_user')).rejects.toThrow(/app_user/); // not even migrated
	}, 60_000);

	it('migrates, seeds nothing, starts no mailbox, and serves', async () => {
		const port = await freePort();
		const child = startScript({ PORT: String(port), FRINGEFIELD_LOCAL_TRIAL: '1' });
		let output = '';
		child.stdout!.on('data', (c: Buffer) => (output += c.toString()));
		child.stderr!.on('data', (c: Buffer) => (output += c.toString()));
		const exited = new Promise<number | null>((done) => child.once('exit', (c) => done(c)));
		try {
			const origin = `http://127.0.0.1:${port}`;
			const until = Date.now() + 60_000;
			for (;;) {
				const ok = await fetch(`${origin}/healthz`).then((r) => r.ok, () => false);
				if (ok) break;
				if (child.exitCode !== null || Date.now() > until) throw new Error(`npm start did not serve: ${output}`);
				await new Promise((r) => setTimeout(r, 200));
			}
			expect(await count('app_user')).toBe(0);
			expect(await count('team')).toBe(0);
			expect(await count('design')).toBe(0);
			const mailbox = await fetch(`${origin}/dev/mailbox.json`);
			expect(mailbox.status).toBe(404);
			expect(output).not.toMatch(/patch-demo|demo sign-in|caught e-mail/);
		} finally {
			child.kill('SIGTERM');
			await exited;
		}
	}, 120_000);
});
