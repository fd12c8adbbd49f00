// `npm run bench -- --jobs`: field checks per minute through the pg-boss queue with 1 and 2 worker processes, each
// `node --import tsx src/worker/main.ts` as `npm run worker` starts it, running the real engine (openEMS, quick mesh) on
// a low-Q demo patch; and the queue's own ceiling with an engine that returns at once. Writes the "## Job queue"
// section of BENCHMARKS.md. Each worker's engine runs the default one thread; on one machine, two workers share its cores.
import { spawn, type ChildProcess } from 'node:child_process';
import { availableParallelism } from 'node:os';
import pg from 'pg';
import { loadConfig, rootDir } from '../lib/config.ts';
import { migrateToLatest } from '../lib/migrate.ts';
import { connectionUrl, provideDatabase } from '../lib/postgres.ts';
import { writeTopSection } from './reliability-section.ts';

const JOBS_DATABASE = 'fringefield_jobs_bench';

async function freshDatabase(): Promise<string> {
	const config = loadConfig();
	if (config.databaseUrl) throw new Error('DATABASE_URL is set: the job bench makes its own database on the private cluster; unset it');
	await provideDatabase(config, JOBS_DATABASE, () => undefined);
	const admin = new pg.Client({ connectionString: connectionUrl(config, 'postgres') });
	await admin.connect();
	await admin.query(`drop database if exists "${JOBS_DATABASE}" with (force)`);
	await admin.query(`create database "${JOBS_DATABASE}"`);
	await admin.end();
	const url = connectionUrl(config, JOBS_DATABASE);
	await migrateToLatest(url, () => undefined);
	return url;
}

/** A thick, low-εr 2.45 GHz patch (demo data): quick to settle, so a quick-mesh run takes tens of seconds. */
const lowQInput = { name: 'Bench low-Q patch', frequencyHz: 2.45e9, shape: 'rectangular', feed: 'inset', substrate: { relativePermittivity: 2.2, heightMm: 3.175, lossTangent: 0.0009 } };

interface Row {
	work: string;
	workers: number;
	jobs: number;
	seconds: number;
	perMinute: number;
	note: string;
}

function startWorker(databaseUrl: string, entry: string[], env: Record<string, string>): ChildProcess {
	return spawn(process.execPath, ['--import', 'tsx', ...entry], { cwd: rootDir, env: { ...process.env, ...env, DATABASE_URL: databaseUrl, FRINGEFIELD_WORKER_POLL_MS: '250' }, detached: true, stdio: 'ignore' });
}

async function stopWorkers(children: ChildProcess[]): Promise<void> {
	for (const c of children) {
		try {
			process.kill(-c.pid!, 'SIGTERM');
		} catch {
			/* gone */
		}
	}
	await Promise.all(children.map((c) => (c.exitCode === null && c.signalCode === null ? new Promise((r) => c.on('exit', r)) : undefined)));
}

async function runRound(opts: { databaseUrl: string; designId: string; workers: number; jobs: number; entry: string[]; env: Record<string, string> }): Promise<number> {
	const { getDb } = await import('../../src/lib/server/db/index.ts');
	const { findDesign, findRevision } = await import('../../src/lib/server/designs/index.ts');
	const { startFieldCheck } = await import('../../src/lib/server/field-checks/index.ts');
	const db = getDb();
	const design = (await findDesign(db, opts.designId))!;
	const revision = (await findRevision(db, design.id, 'A'))!;
	const ids: string[] = [];
	// Queue first, then start the workers: the clock measures taking and running, not sending.
	for (let i = 0; i < opts.jobs; i++) ids.push((await startFieldCheck(db, { design, revision, userId: 'bench-jobs-user', kind: 'check', mode: 'quick' })).id);
	const started = Date.now();
	const children = Array.from({ length: opts.workers }, () => startWorker(opts.databaseUrl, opts.entry, opts.env));
	try {
		for (;;) {
			const rows = await db.selectFrom('field_check').select(['state', 'error']).where('id', 'in', ids).execute();
			const failed = rows.find((r) => r.state === 'failed' || r.state === 'cancelled');
			if (failed) throw new Error(`a bench job ended ${failed.state}: ${failed.error}`);
			if (rows.every((r) => r.state === 'succeeded')) break;
			await new Promise((r) => setTimeout(r, 200));
		}
		return (Date.now() - started) / 1000;
	} finally {
		await stopWorkers(children);
	}
}

export async function runJobsBench(): Promise<void> {
	const databaseUrl = await freshDatabase();
	process.env.DATABASE_URL = databaseUrl;
	process.env.FRINGEFIELD_MAX_ACTIVE_FIELD_CHECKS = '1000';
	const { getDb, closeDb } = await import('../../src/lib/server/db/index.ts');
	const { createDesign } = await import('../../src/lib/server/designs/index.ts');
	const { stopQueue } = await import('../../src/lib/server/jobs/index.ts');
	const db = getDb();
	await db.insertInto('app_user').values({ id: 'bench-jobs-user', email: 'bench-jobs@bench.test', display_name: 'Bench', password_hash: 'not-a-real-hash' }).execute();
	await db.insertInto('team').values({ id: 'bench-jobs-team', name: 'Bench team' }).execute();
	await db.insertInto('team_member').values({ team_id: 'bench-jobs-team', user_id: 'bench-jobs-user', role: 'editor' }).execute();
	const { design } = await createDesign(db, { teamId: 'bench-jobs-team', userId: 'bench-jobs-user', raw: lowQInput });
	const cores = availableParallelism();
	const rows: Row[] = [];
	const jobs = Number(process.env.FRINGEFIELD_BENCH_JOBS || 4);
	try {
		for (const workers of [1, 2]) {
			// each worker's engine on the product's default: one thread (src/worker/fullwave/run-field-check.ts threadCount)
			const threads = '1';
			console.log(`real engine: ${jobs} quick checks, ${workers} worker(s), ${threads} engine thread(s) each…`);
			const seconds = await runRound({ databaseUrl, designId: design.id, workers, jobs, entry: ['src/worker/main.ts'], env: { FRINGEFIELD_OPENEMS_THREADS: threads } });
			rows.push({ work: 'field check, openEMS quick mesh', workers, jobs, seconds, perMinute: (jobs * 60) / seconds, note: `${threads} engine thread(s) per worker` });
		}
		// One check at a time with 1 and with 2 engine threads: how well one engine uses this machine's cores.
		for (const threads of ['1', String(cores)]) {
			console.log(`real engine: 1 quick check, 1 worker, ${threads} engine thread(s)…`);
			const seconds = await runRound({ databaseUrl, designId: design.id, workers: 1, jobs: 1, entry: ['src/worker/main.ts'], env: { FRINGEFIELD_OPENEMS_THREADS: threads } });
			rows.push({ work: 'one field check alone, openEMS quick mesh', workers: 1, jobs: 1, seconds, perMinute: 60 / seconds, note: `${threads} engine thread(s)` });
		}
		const instant = 40;
		for (const workers of [1, 2]) {
			console.log(`queue ceiling: ${instant} jobs with an instant engine, ${workers} worker(s)…`);
			const seconds = await runRound({ databaseUrl, designId: design.id, workers, jobs: instant, entry: ['scripts/bench/instant-worker.ts'], env: {} });
			rows.push({ work: 'queue alone (engine returns at once)', workers, jobs: instant, seconds, perMinute: (instant * 60) / seconds, note: 'claim, heartbeat, store and complete; polling every 250 ms' });
		}
	} finally {
		await stopQueue();
		await closeDb();
	}
	const table = ['| work | workers | jobs | wall time | jobs per minute | note |', '| --- | ---: | ---: | ---: | ---: | --- |', ...rows.map((r) => `| ${r.work} | ${r.workers} | ${r.jobs} | ${r.seconds.toFixed(1)} s | ${r.perMinute.toFixed(1)} | ${r.note} |`)].join('\n');
	console.log(`\n${table}\n`);
	const [one, two, alone1, aloneN] = rows;
	writeTopSection(
		'## Job queue',
		`Written by \`npm run bench -- --jobs\` on ${new Date().toISOString().slice(0, 10)} (${cores} cores): field checks queued first, then 1 or 2 worker processes (\`node --import tsx src/worker/main.ts\`, as \`npm run worker\`) started on the same PostgreSQL; the clock runs from the workers' start to the last stored result.\n\n${table}\n\n` +
			`- Two workers on this one machine ran ${(two.perMinute / one.perMinute).toFixed(2)}× the checks per minute of one. They share the same ${cores} cores, so the gain is not more hardware: one check alone took ${alone1.seconds.toFixed(1)} s with 1 engine thread and ${aloneN.seconds.toFixed(1)} s with ${cores}, i.e. on this (shared) machine one engine does not turn a second thread into speed, while a second worker keeps the second core busy. Set \`FRINGEFIELD_OPENEMS_THREADS\` and the number of workers per machine from such a measurement on your own hardware; workers on other machines add their cores (README "Scaling out").\n` +
			'- The instant-engine rows are the queue\'s own cost per job (taking it, heartbeats, one transaction to store and complete), with the workers\' start-up (tsx) inside the wall time; well under a second per job, small beside a full-wave run of tens of seconds. A second worker does not speed them up: the cost is PostgreSQL round trips and polling, not CPU.\n'
	);
	console.log('written to BENCHMARKS.md');
}
