// Faults, on a PostgreSQL cluster of our own: the database stopped under load (503 with a clear message,
// no partial rows), back again (the app recovers without a restart), the app server killed in the middle
// of an upload (no half-stored measurement), and a failing migration (the whole batch rolls back).
import { mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { request } from 'node:http';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { migrateToLatest } from '../../../scripts/lib/migrate';
import { closeDb } from '../../../src/lib/server/db';
import { api } from './helpers/client';
import { copyBuild, rootDir, startBuiltServer, type BuiltServer } from './helpers/built-server';
import { privateCluster, queryOnce, type PrivateCluster } from './helpers/private-cluster';
import { createHardeningWorkspace, demoDesign, touchstoneFixture, type HardeningWorkspace } from './helpers/workspace';

let cluster: PrivateCluster;
let url: string;
let buildDir: string;
let server: BuiltServer;
let ws: HardeningWorkspace;

beforeAll(async () => {
	cluster = await privateCluster();
	url = await cluster.database('fringefield_faults');
	// This file's own server functions (the workspace fixture) talk to the private cluster too.
	process.env.DATABASE_URL = url;
	buildDir = copyBuild();
	server = await startBuiltServer({ databaseUrl: url, buildDir });
	ws = await createHardeningWorkspace('fault');
}, 180_000);
afterAll(async () => {
	if (server && server.process.exitCode !== null) console.log(`the app server exited:\n${server.log().slice(-4000)}`);
	await server?.stop();
	await closeDb();
	rmSync(buildDir, { recursive: true, force: true });
	await cluster?.destroy();
});

const designsOfTeam = async (teamId: string) => (await queryOnce<{ n: number }>(url, 'select count(*)::int as n from design where team_id = $1', [teamId]))[0].n;
/** Designs without exactly one revision: a half-written design. */
const halfDesigns = async (teamId: string) =>
	(await queryOnce<{ n: number }>(url, 'select count(*)::int as n from design d where d.team_id = $1 and (select count(*) from revision r where r.design_id = d.id) <> 1', [teamId]))[0].n;

describe('PostgreSQL stopped and started under the running app', () => {
	it('answers 503 "try again shortly" while it is down, writes no partial rows, and recovers by itself', async () => {
		const auth = { token: ws.editor.token };
		expect((await api(server.origin, '/api/v1/teams', auth)).status).toBe(200);
		const before = await designsOfTeam(ws.a.teamId);

		// 40 design creations in flight (each a design row plus revision A in one transaction) while the database
		// stops. A session of our own holds the revision table, so no creation can commit: once one of them waits
		// on that lock (its design row written, its revision not), every answer can only be 503.
		const blocker = new pg.Client({ connectionString: url });
		blocker.on('error', () => undefined); // the stop below ends this session as well
		await blocker.connect();
		await blocker.query('begin');
		await blocker.query('lock table revision in access exclusive mode');
		const creations = Array.from({ length: 40 }, (_, i) => api(server.origin, `/api/v1/teams/${ws.a.teamId}/designs`, auth, { body: { input: demoDesign(`Fault ${i} ${ws.suffix}`) } }));
		const waitingOnRevision = async () =>
			(await queryOnce<{ n: number }>(url, "select count(*)::int as n from pg_locks l join pg_class c on c.oid = l.relation where c.relname = 'revision' and not l.granted"))[0].n;
		await vi.waitFor(async () => expect(await waitingOnRevision()).toBeGreaterThan(0), { timeout: 30_000, interval: 25 });
		await cluster.stop();
		await blocker.end().catch(() => undefined);
		const answers = await Promise.all(creations);
		const statuses = answers.map((a) => a.status);
		expect(statuses, `statuses: ${statuses.join(',')}`).toEqual(Array.from({ length: 40 }, () => 503));

		// While down: JSON 503 under /api, a 503 page for people, never a 500.
		const apiDown = await api(server.origin, '/api/v1/teams', auth);
		expect(apiDown.status).toBe(503);
		expect(apiDown.body.error).toBe('The database is unavailable; try again shortly');
		expect(apiDown.headers.get('retry-after')).toBe('5');
		const pageDown = await fetch(`${server.origin}/designs`, { headers: { cookie: `ff_session=${ws.editor.sessionId}` } });
		expect(pageDown.status).toBe(503);
		expect(await pageDown.text()).toContain('The database is unavailable; try again shortly');
		const health = await fetch(`${server.origin}/healthz`);
		expect(health.status).toBe(503);
		await health.arrayBuffer();

		await cluster.start();
		const back = Date.now();
		let recoveredMs = -1;
		while (Date.now() - back < 30_000) {
			if ((await api(server.origin, '/api/v1/teams', auth)).status === 200) {
				recoveredMs = Date.now() - back;
				break;
			}
			await new Promise((r) => setTimeout(r, 50));
		}
		console.log(`recovery after PostgreSQL restart: ${recoveredMs} ms`);
		expect(recoveredMs).toBeGreaterThanOrEqual(0);
		expect(recoveredMs).toBeLessThan(10_000);
		expect(server.process.exitCode).toBeNull();

		// The 503s left nothing: not one of the design rows written inside the interrupted transactions remains.
		expect(await designsOfTeam(ws.a.teamId)).toBe(before);
		expect(await halfDesigns(ws.a.teamId)).toBe(0);
	}, 120_000);
});

describe('the app server killed during an upload', () => {
	it('stores no half measurement, and the restarted server takes the same upload whole', async () => {
		const count = async () => (await queryOnce<{ n: number }>(url, 'select count(*)::int as n from measurement where revision_id = $1', [ws.a.revisionId]))[0].n;
		const before = await count();
		const file = touchstoneFixture();
		const boundary = 'hardeningboundary';
		const head = Buffer.from(`--${boundary}\r\ncontent-disposition: form-data; name="file"; filename="bench-2g4.s1p"\r\ncontent-type: application/octet-stream\r\n\r\n`);
		const tail = Buffer.from(`\r\n--${boundary}--\r\n`);
		const body = Buffer.concat([head, Buffer.from(file), tail]);
		const path = `/designs/${ws.a.designId}/r/${ws.a.label}/measurements?/upload`;

		// Send half of the multipart body, then kill the server while it waits for the rest.
		const victim = await startBuiltServer({ databaseUrl: url, buildDir });
		const req = request({ host: '127.0.0.1', port: victim.port, path, method: 'POST', headers: { 'content-type': `multipart/form-data; boundary=${boundary}`, 'content-length': body.length, origin: victim.origin, cookie: `ff_session=${ws.editor.sessionId}` } });
		const outcome = new Promise<string>((done) => {
			req.on('error', (err) => done(`error: ${err.message}`));
			req.on('response', (res) => done(`status ${res.statusCode}`));
		});
		req.write(body.subarray(0, Math.floor(body.length / 2)));
		await new Promise((r) => setTimeout(r, 300));
		victim.process.kill('SIGKILL');
		expect(await outcome).toMatch(/^error/);
		await victim.stop();
		expect(await count()).toBe(before);

		// A new server process, the whole upload: stored once, complete.
		const again = await startBuiltServer({ databaseUrl: url, buildDir });
		try {
			const res = await fetch(again.origin + path, { method: 'POST', headers: { 'content-type': `multipart/form-data; boundary=${boundary}`, origin: again.origin, cookie: `ff_session=${ws.editor.sessionId}`, 'x-sveltekit-action': 'true' }, body });
			expect((await res.json()).type).toBe('redirect');
			expect(await count()).toBe(before + 1);
			const [row] = await queryOnce<{ len: number }>(url, 'select length(touchstone)::int as len from measurement where revision_id = $1 order by uploaded_at desc limit 1', [ws.a.revisionId]);
			expect(row.len).toBe(new TextDecoder().decode(file).length);
		} finally {
			await again.stop();
		}
	}, 120_000);
});

describe('a migration that fails', () => {
	it('rolls back the whole batch: no table of the batch and no migration recorded', async () => {
		const scratch = await cluster.database('fringefield_migration_scratch', false);
		const folder = mkdtempSync(join(tmpdir(), 'ff-failing-migrations-'));
		try {
			writeFileSync(join(folder, '0001_first.ts'), "import { sql } from 'kysely';\nexport async function up(db: any) { await sql`create table scratch_first (id int primary key)`.execute(db); }\nexport async function down() {}\n");
			writeFileSync(join(folder, '0002_breaks.ts'), "import { sql } from 'kysely';\nexport async function up(db: any) { await sql`create table scratch_second (id int)`.execute(db); await sql`insert into scratch_second values ('not a number')`.execute(db); }\nexport async function down() {}\n");
			await expect(migrateToLatest(scratch, () => undefined, folder)).rejects.toThrow(/migration failed/);
			const tables = await queryOnce<{ table_name: string }>(scratch, "select table_name from information_schema.tables where table_schema = 'public' and table_name like 'scratch_%'");
			expect(tables).toEqual([]);
			const recorded = await queryOnce<{ n: number }>(scratch, "select count(*)::int as n from information_schema.tables where table_name = 'schema_migration'");
			const applied = recorded[0].n ? (await queryOnce<{ n: number }>(scratch, 'select count(*)::int as n from schema_migration'))[0].n : 0;
			expect(applied).toBe(0);
			// And the real migrations still apply cleanly to the same database afterwards.
			expect(await migrateToLatest(scratch, () => undefined)).toBe(readdirSync(join(rootDir, 'migrations')).filter((f) => f.endsWith('.ts')).length);
		} finally {
			rmSync(folder, { recursive: true, force: true });
		}
	}, 60_000);
});
