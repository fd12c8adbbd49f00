// Through the queue with the real engine (openEMS from Debian, quick mode): a worker process is killed with SIGKILL
// mid-run (with its engine: a lost machine), another worker retries the job and stores the real result, its progress
// written at most every ~2 s; then a running check is cancelled and its engine process is gone.
import { spawn, type ChildProcess } from 'node:child_process';
import { sql } from 'kysely';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { createDesign, findDesign, findRevision } from '../../../src/lib/server/designs';
import { cancelFieldCheck, findFieldCheck, startFieldCheck } from '../../../src/lib/server/field-checks';
import { stopQueue } from '../../../src/lib/server/jobs';
import { startFieldCheckWorker, type RunningWorker } from '../../../src/worker/field-check-worker';
import { runFieldCheck, runHoming } from '../../../src/worker/fullwave';
import { createWorkspace, type Workspace } from '../exports/workspace-fixture';
import { engineChildrenOf, isAlive } from './helpers/engine-processes';
import { cancelOpenFieldChecks } from './helpers/open-checks';
import { waitFor } from './helpers/wait-for';

const databaseUrl = process.env.DATABASE_URL!;
let ws: Workspace;
let designId: string;
let lost: ChildProcess | undefined;
let worker: RunningWorker | undefined;

/**
 * A thick, low-εr 2.45 GHz patch (demo data): its low Q lets the fields settle quickly, so a quick-mode run takes
 * tens of seconds on two cores rather than minutes.
 */
const lowQInput = { name: 'Low-Q bench patch', frequencyHz: 2.45e9, shape: 'rectangular', feed: 'inset', substrate: { relativePermittivity: 2.2, heightMm: 3.175, lossTangent: 0.0009 } };

async function start() {
	const design = (await findDesign(getDb(), designId))!;
	const revision = (await findRevision(getDb(), designId, 'A'))!;
	return startFieldCheck(getDb(), { design, revision, userId: ws.people.editor.id, kind: 'check', mode: 'quick' });
}
const row = (id: string) => getDb().selectFrom('field_check').selectAll().where('id', '=', id).executeTakeFirstOrThrow();

beforeAll(async () => {
	await cancelOpenFieldChecks(getDb());
	ws = await createWorkspace('engine');
	({ design: { id: designId } } = await createDesign(getDb(), { teamId: ws.teamId, userId: ws.people.owner.id, raw: lowQInput }));
});
afterAll(async () => {
	for (const pid of lost?.pid ? [lost.pid] : []) {
		try {
			process.kill(-pid, 'SIGKILL');
		} catch {
			/* gone */
		}
	}
	await worker?.stop();
	await cancelOpenFieldChecks(getDb(), ws.teamId);
	await stopQueue();
	await closeDb();
});

describe('a field check with the real engine', () => {
	it('survives a worker killed mid-run: another worker retries it and stores the real result', { timeout: 180_000 }, async () => {
		const { id } = await start();
		// The worker as `npm run worker` starts it, on its own process group.
		lost = spawn(process.execPath, ['--import', 'tsx', 'src/worker/main.ts'], {
			env: { ...process.env, DATABASE_URL: databaseUrl, FRINGEFIELD_WORKER_STALE_SECONDS: '3', FRINGEFIELD_WORKER_POLL_MS: '300' },
			detached: true,
			stdio: 'ignore'
		});
		const engines = await waitFor(
			'the first worker’s engine to run and report progress',
			async () => {
				const r = await row(id);
				const children = engineChildrenOf(lost!.pid!);
				return r.state === 'running' && (r.progress as { fraction: number } | null)?.fraction !== undefined && children.length > 0 ? children : undefined;
			},
			60_000,
			250
		);
		// A lost machine: the worker and its engine end at once, with no chance to clean up.
		process.kill(-lost.pid!, 'SIGKILL');
		for (const pid of engines) process.kill(pid, 'SIGKILL');
		await waitFor('the first worker to be gone', async () => !isAlive(lost!.pid!) || lost!.exitCode !== null || lost!.signalCode !== null);
		const killed = await row(id);
		expect(killed.state).toBe('running');
		expect(killed.result).toBeNull();

		worker = await startFieldCheckWorker({ engine: { runFieldCheck, runHoming }, databaseUrl, staleSeconds: 3, pollMs: 300, log: () => undefined });
		const progress: string[] = [];
		let runStarted = 0;
		const done = await waitFor(
			'the retry to finish',
			async () => {
				const r = await row(id);
				if (r.state === 'running' && r.worker_id === worker!.workerId) {
					runStarted ||= Date.now();
					const p = JSON.stringify(r.progress);
					if (r.progress && progress.at(-1) !== p) progress.push(p);
				}
				return ['succeeded', 'failed'].includes(r.state) ? r : undefined;
			},
			150_000,
			200
		);
		expect(done.error).toBeNull();
		expect(done.state).toBe('succeeded');
		expect(done.attempt).toBe(2);
		expect(done.worker_id).toBe(worker.workerId);
		// Progress was seen while it ran, and written at most every ~2 s (the default heartbeat) however often the engine reported.
		const runSeconds = (Date.now() - runStarted) / 1000;
		expect(progress.length).toBeGreaterThanOrEqual(2);
		expect(progress.length).toBeLessThanOrEqual(Math.ceil(runSeconds / 2) + 2);

		const check = (await findFieldCheck(getDb(), id))!;
		expect(check.result?.engine.name).toBe('openEMS');
		expect(check.result?.mode).toBe('quick');
		expect(check.result?.samples.length).toBeGreaterThan(50);
		expect(check.result?.targetFrequencyHz).toBe(2.45e9);
		const { rows } = await sql<{ state: string; retry_count: number }>`select state, retry_count from pgboss.job where id = ${done.job_id}::uuid`.execute(getDb());
		expect(rows[0]).toEqual({ state: 'completed', retry_count: 1 });
	});

	it('cancels a running check: state cancelled within seconds, the engine process gone, nothing stored', { timeout: 90_000 }, async () => {
		const { id } = await start();
		const [engine] = await waitFor('the engine to run', async () => {
			const r = await row(id);
			const children = engineChildrenOf(process.pid);
			return r.state === 'running' && children.length > 0 ? children : undefined;
		}, 60_000, 200);
		expect(await cancelFieldCheck(getDb(), id, 'Editor')).toBe('cancelling');
		const asked = Date.now();
		const r = await waitFor('cancelled', async () => ((await row(id)).state === 'cancelled' ? row(id) : undefined), 15_000, 100);
		expect(Date.now() - asked).toBeLessThan(6000);
		expect(r.result).toBeNull();
		expect(r.error).toMatch(/cancelled/);
		await waitFor('the engine process to be gone', async () => !isAlive(engine), 5000);
	});
});
