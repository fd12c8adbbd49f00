// The queue mechanics with a scripted test double of the engine (the real engine's run is real-engine.test.ts):
// job rows, progress written while it runs, the result stored once and read back through the zod schemas, cancel
// (queued and running), a worker killed with SIGKILL mid-job and the job finished by another worker, nothing half-stored.
import { spawn, type ChildProcess } from 'node:child_process';
import { sql } from 'kysely';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { findRevision, findDesign } from '../../../src/lib/server/designs';
import { cancelFieldCheck, findFieldCheck, reviseFromHoming, startFieldCheck } from '../../../src/lib/server/field-checks';
import { stopQueue } from '../../../src/lib/server/jobs';
import { startFieldCheckWorker, type RunningWorker } from '../../../src/worker/field-check-worker';
import { createWorkspace, type Workspace } from '../exports/workspace-fixture';
import { cancelOpenFieldChecks } from './helpers/open-checks';
import { createScriptedEngine } from './helpers/scripted-engine';
import { waitFor } from './helpers/wait-for';

let ws: Workspace;
const databaseUrl = process.env.DATABASE_URL!;

async function start(kind: 'check' | 'homing' = 'check') {
	const design = (await findDesign(getDb(), ws.designId))!;
	const revision = (await findRevision(getDb(), ws.designId, 'A'))!;
	return startFieldCheck(getDb(), { design, revision, userId: ws.people.editor.id, kind, mode: 'quick' });
}

async function row(id: string) {
	return getDb().selectFrom('field_check').selectAll().where('id', '=', id).executeTakeFirstOrThrow();
}

async function bossJob(jobId: string) {
	const { rows } = await sql<{ state: string; retry_count: number; name: string }>`select state, retry_count, name from pgboss.job where id = ${jobId}::uuid`.execute(getDb());
	return rows[0];
}

beforeAll(async () => {
	await cancelOpenFieldChecks(getDb());
	ws = await createWorkspace('queue');
});
afterAll(async () => {
	await cancelOpenFieldChecks(getDb(), ws.teamId);
	await stopQueue();
	await closeDb();
});

describe('a field check through the queue', () => {
	let worker: RunningWorker | undefined;
	afterAll(async () => worker?.stop());

	it('queues a job row with its check, writes progress while running, and stores the result once', async () => {
		const { id } = await start();
		const queued = await row(id);
		expect(queued.state).toBe('queued');
		expect(queued.result).toBeNull();
		expect((await bossJob(queued.job_id)).state).toBe('created');

		const { engine } = createScriptedEngine({ steps: 12, stepMs: 250 });
		worker = await startFieldCheckWorker({ engine, databaseUrl, heartbeatMs: 500, pollMs: 200, staleSeconds: 5, log: () => undefined });

		// Progress is seen in the database while it runs, at most every heartbeat (500 ms here, ~2 s by default).
		const seen = new Set<string>();
		await waitFor('three progress reports', async () => {
			const r = await row(id);
			if (r.state === 'running' && r.progress) seen.add(JSON.stringify(r.progress));
			expect(r.result).toBeNull(); // nothing before the end
			return seen.size >= 3;
		});
		const done = await waitFor('success', async () => ((await row(id)).state === 'succeeded' ? row(id) : undefined));
		expect(done.attempt).toBe(1);
		expect(done.finished_at).not.toBeNull();
		expect((await bossJob(done.job_id)).state).toBe('completed');

		// Read back through the contract's schemas.
		const check = (await findFieldCheck(getDb(), id))!;
		expect(check.result?.samples).toHaveLength(41);
		expect(check.result?.resonance?.frequencyHz).toBe(2.4e9);
		expect(check.progress).toEqual({ fraction: 1, message: 'done' });
	});

	it('refuses to change a stored result (the database trigger)', async () => {
		const [done] = await getDb().selectFrom('field_check').select('id').where('state', '=', 'succeeded').limit(1).execute();
		await expect(getDb().updateTable('field_check').set({ result: JSON.stringify({ forged: true }) }).where('id', '=', done.id).execute()).rejects.toThrow(/can no longer change/);
		await expect(getDb().updateTable('field_check').set({ state: 'failed' }).where('id', '=', done.id).execute()).rejects.toThrow(/can no longer change/);
	});

	it('runs a Homing study and keeps its iterations and tuned input', async () => {
		const { id } = await start('homing');
		await waitFor('the study to end', async () => ['succeeded', 'failed'].includes((await row(id)).state), 20_000);
		const study = (await findFieldCheck(getDb(), id))!;
		expect(study.state).toBe('succeeded');
		expect(study.homing?.iterations[0].parameter).toBe('lengthMm');
		expect(study.result).toEqual(study.homing?.final);

		// "Make a revision from the tuned input": a child of the studied revision that records the study at insert.
		const design = (await findDesign(getDb(), ws.designId))!;
		const { label } = await reviseFromHoming(getDb(), { design, study, userId: ws.people.editor.id });
		const made = await getDb().selectFrom('revision').selectAll().where('design_id', '=', ws.designId).where('label', '=', label).executeTakeFirstOrThrow();
		expect(made.homed_from_field_check_id).toBe(id);
		expect(made.note).toMatch(new RegExp(`Homing study ${id.slice(0, 8)} of rev A`));
		expect((made.input as { name: string }).name).toBe((study.homing!.tunedInput as { name: string }).name);
		// A check that is not a finished Homing study cannot be revised from.
		const { id: plain } = await start();
		await expect(reviseFromHoming(getDb(), { design, study: (await findFieldCheck(getDb(), plain))!, userId: ws.people.editor.id })).rejects.toThrow(/Homing study that has finished/);
		await cancelFieldCheck(getDb(), plain, 'Editor');
	});
});

describe('cancelling', () => {
	it('ends a queued check at once and cancels its job', async () => {
		const { id } = await start();
		expect(await cancelFieldCheck(getDb(), id, 'Editor')).toBe('cancelled');
		const r = await row(id);
		expect(r.state).toBe('cancelled');
		expect(r.error).toMatch(/before it started/);
		expect((await bossJob(r.job_id)).state).toBe('cancelled');
		expect(await cancelFieldCheck(getDb(), id, 'Editor')).toBe('already-final');
	});

	it('stops the engine of a running check within a heartbeat', async () => {
		const { engine, state } = createScriptedEngine({ steps: 200, stepMs: 200 });
		const worker = await startFieldCheckWorker({ engine, databaseUrl, heartbeatMs: 500, pollMs: 200, staleSeconds: 5, log: () => undefined });
		try {
			const { id } = await start();
			await waitFor('running with progress', async () => {
				const r = await row(id);
				return r.state === 'running' && r.progress !== null;
			});
			expect(await cancelFieldCheck(getDb(), id, 'Editor')).toBe('cancelling');
			const asked = Date.now();
			const r = await waitFor('cancelled', async () => ((await row(id)).state === 'cancelled' ? row(id) : undefined), 10_000);
			expect(Date.now() - asked).toBeLessThan(5000);
			expect(state.aborted).toBe(1);
			expect(state.finished).toBe(0);
			expect(r.result).toBeNull();
			expect((await bossJob(r.job_id)).state).toBe('cancelled');
		} finally {
			await worker.stop();
		}
	});
});

describe('a worker lost mid-job', () => {
	let child: ChildProcess | undefined;
	afterAll(() => {
		try {
			if (child?.pid) process.kill(-child.pid, 'SIGKILL');
		} catch {
			/* already gone */
		}
	});

	it('is retried by another worker, which finishes it; nothing was stored half-way', async () => {
		const { id } = await start();
		child = spawn('npx', ['tsx', 'tests/integration/jobs/helpers/double-worker.ts'], { env: { ...process.env, DATABASE_URL: databaseUrl }, detached: true, stdio: 'ignore' });
		const firstWorker = await waitFor(
			'the first worker to report progress',
			async () => {
				const r = await row(id);
				return r.state === 'running' && r.progress ? r.worker_id : undefined;
			},
			30_000
		);
		process.kill(-child.pid!, 'SIGKILL');
		await waitFor('the first worker to be gone', async () => child!.exitCode !== null || child!.signalCode !== null);
		const killed = await row(id);
		expect(killed.state).toBe('running');
		expect(killed.result).toBeNull();

		const { engine } = createScriptedEngine({ steps: 5, stepMs: 100 });
		const second = await startFieldCheckWorker({ engine, databaseUrl, heartbeatMs: 500, pollMs: 200, staleSeconds: 3, log: () => undefined });
		try {
			const done = await waitFor('the retry to succeed', async () => ((await row(id)).state === 'succeeded' ? row(id) : undefined), 30_000);
			expect(done.worker_id).toBe(second.workerId);
			expect(done.worker_id).not.toBe(firstWorker);
			expect(done.attempt).toBe(2);
			const job = await bossJob(done.job_id);
			expect(job.state).toBe('completed');
			expect(job.retry_count).toBe(1);
			expect((await findFieldCheck(getDb(), id))!.result?.samples.length).toBe(41);
		} finally {
			await second.stop();
		}
	});
});

describe('a worker that shuts down mid-job', () => {
	it('hands the job back: queued again, retried by the next worker, finished there', async () => {
		const { id } = await start();
		const slow = createScriptedEngine({ steps: 200, stepMs: 200 });
		const leaving = await startFieldCheckWorker({ engine: slow.engine, databaseUrl, heartbeatMs: 500, pollMs: 200, staleSeconds: 5, log: () => undefined });
		await waitFor('running with progress', async () => {
			const r = await row(id);
			return r.state === 'running' && r.progress !== null && r.worker_id === leaving.workerId;
		});
		await leaving.stop();
		const handedBack = await row(id);
		expect(handedBack.state).toBe('queued');
		expect(handedBack.error).toMatch(/shut down/);
		expect(handedBack.result).toBeNull();
		expect(slow.state.aborted).toBe(1);
		expect((await bossJob(handedBack.job_id)).state).toBe('retry');

		const { engine } = createScriptedEngine({ steps: 3, stepMs: 50 });
		const next = await startFieldCheckWorker({ engine, databaseUrl, heartbeatMs: 500, pollMs: 200, staleSeconds: 5, log: () => undefined });
		try {
			const done = await waitFor('the next worker to finish it', async () => ((await row(id)).state === 'succeeded' ? row(id) : undefined), 15_000);
			expect(done.worker_id).toBe(next.workerId);
			expect(done.attempt).toBe(2);
		} finally {
			await next.stop();
		}
	});
});

