// `npm run bench -- --fuzz`: 10 000 hostile requests per /api/v1 route and per form action against the
// built server (a fresh fringefield_fuzz database), then PostgreSQL restarted three times under the
// running app (on a cluster of its own) to time the recovery. Prints the rows and writes them to the
// Reliability section of BENCHMARKS.md.
import { spawnSync } from 'node:child_process';
import pg from 'pg';
import { loadConfig, rootDir } from '../lib/config.ts';
import { migrateToLatest } from '../lib/migrate.ts';
import { connectionUrl, provideDatabase } from '../lib/postgres.ts';
import { api } from '../../tests/integration/hardening/helpers/client.ts';
import { copyBuild, startBuiltServer } from '../../tests/integration/hardening/helpers/built-server.ts';
import { fuzzTarget, type TargetReport } from '../../tests/integration/hardening/helpers/fuzz-run.ts';
import { fuzzTargets } from '../../tests/integration/hardening/helpers/fuzz-targets.ts';
import { privateCluster } from '../../tests/integration/hardening/helpers/private-cluster.ts';
import { writeReliabilitySubsection } from './reliability-section.ts';

const FUZZ_DATABASE = 'fringefield_fuzz';

async function freshDatabase(): Promise<string> {
	const config = loadConfig();
	if (config.databaseUrl) {
		await migrateToLatest(config.databaseUrl, () => undefined);
		return config.databaseUrl;
	}
	const url = await provideDatabase(config, FUZZ_DATABASE, () => undefined);
	const admin = new pg.Client({ connectionString: connectionUrl(config, 'postgres') });
	await admin.connect();
	await admin.query(`drop database if exists "${FUZZ_DATABASE}" with (force)`);
	await admin.query(`create database "${FUZZ_DATABASE}"`);
	await admin.end();
	await migrateToLatest(url, () => undefined);
	return url;
}

export function build(): void {
	const r = spawnSync('flock', ['/tmp/ff-build.lock', 'npx', 'vite', 'build', '--logLevel', 'error'], { cwd: rootDir, stdio: 'inherit' });
	if (r.status !== 0) throw new Error('the build failed');
}

interface RecoveryRow {
	restart: number;
	downAnswers: string;
	recoveredMs: number;
}

/** Stops and starts PostgreSQL under the running app three times; the time from "accepting connections" to the first 200. */
async function recoveryRows(buildDir: string): Promise<RecoveryRow[]> {
	const cluster = await privateCluster();
	const { closeDb } = await import('../../src/lib/server/db/index.ts');
	const accounts = { ...(await import('../../src/lib/server/accounts/sign-up.ts')), ...(await import('../../src/lib/server/accounts/teams.ts')), ...(await import('../../src/lib/server/accounts/api-tokens.ts')) };
	await closeDb();
	const url = await cluster.database('fringefield_recovery');
	process.env.DATABASE_URL = url;
	const server = await startBuiltServer({ databaseUrl: url, buildDir });
	const rows: RecoveryRow[] = [];
	try {
		const user = await accounts.signUp({ displayName: 'Recovery runner', email: 'recovery@fringefield.test', password: 'recovery-password-2450' });
		const team = await accounts.createTeam(user.id, { name: 'Recovery team' });
		const token = await accounts.createApiToken(user.id, team.id, { name: 'recovery' });
		await closeDb();
		const auth = { token: token.secret };
		for (let i = 1; i <= 3; i++) {
			await cluster.stop();
			const down = await api(server.origin, '/api/v1/teams', auth);
			await cluster.start();
			const back = performance.now();
			let recoveredMs = -1;
			while (performance.now() - back < 30_000) {
				if ((await api(server.origin, '/api/v1/teams', auth)).status === 200) {
					recoveredMs = performance.now() - back;
					break;
				}
				await new Promise((r) => setTimeout(r, 10));
			}
			rows.push({ restart: i, downAnswers: `${down.status} ${down.body?.error ?? ''}`, recoveredMs });
		}
	} finally {
		await server.stop();
		await cluster.destroy();
	}
	return rows;
}

export async function fuzzRun(opts: { runs: number; concurrency: number; seed: number }): Promise<{ reports: TargetReport[]; recovery: RecoveryRow[]; table: string }> {
	build();
	const url = await freshDatabase();
	process.env.DATABASE_URL = url;
	const buildDir = copyBuild();
	const server = await startBuiltServer({ databaseUrl: url, buildDir });
	const reports: TargetReport[] = [];
	const started = Date.now();
	try {
		const { createHardeningWorkspace } = await import('../../tests/integration/hardening/helpers/workspace.ts');
		const ws = await createHardeningWorkspace('bench');
		for (const target of fuzzTargets(ws)) reports.push(await fuzzTarget(server.origin, ws, target, { ...opts, onProgress: (line) => console.log(line) }));
	} finally {
		await server.stop();
	}
	console.log('PostgreSQL restarts under the running app…');
	const recovery = await recoveryRows(buildDir);
	spawnSync('rm', ['-rf', buildDir]);

	const lines = ['| route | cases | 4xx | 5xx | accepted (valid by chance) | 4xx without a message | rows written while refusing |', '| --- | ---: | ---: | ---: | ---: | ---: | ---: |'];
	for (const r of reports) {
		const fourxx = Object.entries(r.statuses).filter(([s]) => Number(s) >= 400 && Number(s) < 500).reduce((n, [, c]) => n + c, 0);
		lines.push(`| ${r.name.replace(/\|/g, '\\|')} | ${r.cases} | ${fourxx} | ${r.serverErrors} | ${r.accepted} | ${r.unexplained} | ${r.writtenTables.length} |`);
	}
	const total = (f: (r: TargetReport) => number) => reports.reduce((n, r) => n + f(r), 0);
	lines.push(`| **all ${reports.length} routes** | **${total((r) => r.cases)}** | | **${total((r) => r.serverErrors)}** | ${total((r) => r.accepted)} | **${total((r) => r.unexplained)}** | **${total((r) => r.writtenTables.length)}** |`);
	const recoveryLines = ['| restart | answer while down | recovery after PostgreSQL accepts connections |', '| ---: | --- | ---: |', ...recovery.map((r) => `| ${r.restart} | ${r.downAnswers} | ${r.recoveredMs.toFixed(0)} ms |`)];
	const failures = reports.flatMap((r) => r.samples.map((s) => `- ${r.name}: ${s.status} ${s.message} ← ${s.request}`));
	const table = [
		`Measured on ${new Date().toISOString().slice(0, 10)}, Node.js ${process.version}: ${opts.runs} seeded cases (seed ${opts.seed}) per route, ${opts.concurrency} at a time, against \`node build\` on loopback; ${((Date.now() - started) / 1000).toFixed(0)} s in all. Generators: tests/integration/hardening/helpers/hostile.ts (wrong types, huge/tiny numbers, NaN/Infinity as text, nesting 200–3000 deep, unicode, lone surrogates, oversize bodies). "Rows written while refusing" counts the tables of the fuzzed workspace whose row count changed on a route that accepted nothing (0 = nothing lost, nothing half-written).`,
		'',
		lines.join('\n'),
		'',
		'PostgreSQL stopped (`pg_ctl stop -m fast`) and started again three times under the running app, no app restart:',
		'',
		recoveryLines.join('\n'),
		...(failures.length ? ['', 'Failures:', '', ...failures] : [])
	].join('\n');
	return { reports, recovery, table };
}

export async function runFuzzBench(): Promise<void> {
	const runs = Number(process.env.FUZZ_RUNS || 10_000);
	const { table } = await fuzzRun({ runs, concurrency: 16, seed: 92450 });
	console.log(`\n${table}\n`);
	writeReliabilitySubsection('Input fuzzing and PostgreSQL restarts', table);
	console.log('written to the Reliability section of BENCHMARKS.md');
}
