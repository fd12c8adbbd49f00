// Benchmark rows 5–6: the built server on 127.0.0.1 under autocannon, and 100 concurrent bundle downloads.
// Starts its own database (fringefield_bench on the private cluster, or DATABASE_URL) and its own server.
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import autocannon from 'autocannon';
import pg from 'pg';
import { loadConfig, rootDir } from '../lib/config.ts';
import { migrateToLatest } from '../lib/migrate.ts';
import { isPortOpen, waitFor } from '../lib/ports.ts';
import { connectionUrl, provideDatabase } from '../lib/postgres.ts';
import type { BenchRow } from './core.ts';
import { serverEnv } from '../lib/server-env.ts';

const BENCH_DATABASE = 'fringefield_bench';

async function freshDatabase(): Promise<string> {
	const config = loadConfig();
	if (config.databaseUrl) {
		await migrateToLatest(config.databaseUrl, () => undefined);
		return config.databaseUrl;
	}
	const url = await provideDatabase(config, BENCH_DATABASE, () => undefined);
	const admin = new pg.Client({ connectionString: connectionUrl(config, 'postgres') });
	await admin.connect();
	await admin.query(`drop database if exists "${BENCH_DATABASE}" with (force)`);
	await admin.query(`create database "${BENCH_DATABASE}"`);
	await admin.end();
	await migrateToLatest(url, () => undefined);
	return url;
}

interface Fixture {
	token: string;
	designIds: string[];
}

/** One person, one team, an API token and `count` designs (revision A each), made through the server's own functions. */
async function makeFixture(count: number): Promise<Fixture> {
	const { getDb } = await import('../../src/lib/server/db/index.ts');
	const { signUp } = await import('../../src/lib/server/accounts/sign-up.ts');
	const { createTeam } = await import('../../src/lib/server/accounts/teams.ts');
	const { createApiToken } = await import('../../src/lib/server/accounts/api-tokens.ts');
	const { createDesign } = await import('../../src/lib/server/designs/create-design.ts');
	const user = await signUp({ displayName: 'Bench runner', email: 'bench@fringefield.test', password: 'bench-password-2450' });
	const team = await createTeam(user.id, { name: 'Bench team' });
	const token = await createApiToken(user.id, team.id, { name: 'bench' });
	const designIds: string[] = [];
	for (let i = 0; i < count; i++) {
		const created = await createDesign(getDb(), {
			teamId: team.id,
			userId: user.id,
			raw: { name: `Bench patch ${i}`, frequencyHz: 2.4e9 + i * 1e6, feed: 'inset', substrate: { relativePermittivity: 4.3, lossTangent: 0.017, heightMm: 1.6 } }
		});
		designIds.push(created.design.id);
	}
	return { token: token.secret, designIds };
}

async function cannon(url: string, headers: Record<string, string>, seconds: number) {
	return autocannon({ url, connections: 50, duration: seconds, headers });
}

export async function httpRows(opts: { seconds: number }): Promise<BenchRow[]> {
	const databaseUrl = await freshDatabase();
	process.env.DATABASE_URL = databaseUrl;
	const port = Number(process.env.BENCH_PORT || 3300);
	const origin = `http://127.0.0.1:${port}`;

	const build = spawnSync('npx', ['vite', 'build', '--logLevel', 'error'], { cwd: rootDir, stdio: 'inherit' });
	if (build.status !== 0) throw new Error('the build failed');
	const server: ChildProcess = spawn(process.execPath, ['build'], {
		cwd: rootDir,
		stdio: ['ignore', 'ignore', 'inherit'],
		env: { ...process.env, DATABASE_URL: databaseUrl, HOST: '127.0.0.1', PORT: String(port), ORIGIN: origin, ...serverEnv(), DATABASE_POOL_SIZE: '20', FRINGEFIELD_LOCAL_TRIAL: '1' }
	});
	try {
		if (!(await waitFor(() => isPortOpen(port), 30_000))) throw new Error('the server did not start');
		const fixture = await makeFixture(100);
		const auth = { authorization: `Bearer ${fixture.token}` };
		const bundleUrl = (designId: string) => `${origin}/api/v1/designs/${designId}/revisions/A/export/bundle`;

		const trivial = await cannon(`${origin}/api/v1/teams`, auth, opts.seconds);
		const bundle = await cannon(bundleUrl(fixture.designIds[0]), auth, opts.seconds);
		const errors = bundle.errors + bundle.timeouts + bundle.non2xx;
		const ratio = bundle.requests.average / trivial.requests.average;
		const rows: BenchRow[] = [
			{ work: 'HTTP bundle download, req/s (50 conns)', ours: bundle.requests.average, floor: trivial.requests.average, unit: 'µs', floorName: 'GET /api/v1/teams, same server', ratio, target: 'ratio ≥ 0.2', pass: ratio >= 0.2, note: 'req/s, not µs' },
			{ work: 'HTTP bundle download, p99 latency', ours: bundle.latency.p99, floor: trivial.latency.p99, unit: 'ms', floorName: 'GET /api/v1/teams p99', ratio: bundle.latency.p99 / Math.max(trivial.latency.p99, 1), target: 'p99 ≤ 100 ms', pass: bundle.latency.p99 <= 100 },
			{ work: 'HTTP bundle download, errors', ours: errors, floor: trivial.errors + trivial.timeouts + trivial.non2xx, unit: 'ms', floorName: 'errors on /api/v1/teams', ratio: 0, target: '0 errors', pass: errors === 0, note: 'count, not ms' }
		];

		// Row 6: 100 concurrent downloads of different revisions; each must succeed and record exactly one export.
		const { getDb } = await import('../../src/lib/server/db/index.ts');
		const before = await getDb().selectFrom('export_record').select(({ fn }) => fn.countAll<string>().as('n')).executeTakeFirstOrThrow();
		const startedAt = performance.now();
		const responses = await Promise.all(fixture.designIds.map((id) => fetch(bundleUrl(id), { headers: auth }).then(async (r) => ({ ok: r.ok, id: r.headers.get('x-export-id'), bytes: (await r.arrayBuffer()).byteLength }))));
		const elapsedMs = performance.now() - startedAt;
		const perDesign = await getDb()
			.selectFrom('export_record')
			.select(['design_id', ({ fn }) => fn.countAll<string>().as('n')])
			.where('design_id', 'in', fixture.designIds)
			.where('via', '=', 'api')
			.groupBy('design_id')
			.execute();
		const okCount = responses.filter((r) => r.ok && r.bytes > 0).length;
		const firstExportOfEach = fixture.designIds.every((id) => {
			const n = Number(perDesign.find((p) => p.design_id === id)?.n ?? 0);
			return id === fixture.designIds[0] ? n >= 1 : n === 1;
		});
		void before;
		rows.push({
			work: '100 concurrent bundle downloads',
			ours: elapsedMs,
			floor: okCount,
			unit: 'ms',
			floorName: 'downloads that succeeded (of 100)',
			ratio: okCount / 100,
			target: 'all succeed, one record each',
			pass: okCount === 100 && firstExportOfEach
		});
		return rows;
	} finally {
		server.kill('SIGTERM');
		const { closeDb } = await import('../../src/lib/server/db/index.ts');
		await closeDb();
	}
}
