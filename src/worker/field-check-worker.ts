// A worker: takes field-check and Homing jobs from the pg-boss queues (at most `concurrency` at once, 1 by default),
// runs them, and sweeps for checks whose worker was lost (no heartbeat for `staleSeconds`): pg-boss fails their job,
// which it retries on the next free worker within the retry limit. Any number of workers on any machines may share a
// database; each takes jobs with SELECT … FOR UPDATE SKIP LOCKED (pg-boss), so none is run twice at once.
import { hostname } from 'node:os';
import { randomUUID } from 'node:crypto';
import { Kysely, PostgresDialect } from 'kysely';
import pg from 'pg';
import type { Database } from '../lib/server/db/database';
import * as fieldCheckQueries from '../lib/server/db/field-check.queries';
import { allJobNames, createQueue, jobNames, toBossDb, type Boss, type JobName } from '../lib/server/jobs';
import type { FieldCheckEngine } from './engine';
import { runFieldCheckJob, type JobOutcome } from './run-field-check-job';

export interface WorkerOptions {
	engine: FieldCheckEngine;
	databaseUrl: string;
	/** Jobs run at once by this worker. */
	concurrency?: number;
	/** Milliseconds between looks at an empty queue. */
	pollMs?: number;
	/** Milliseconds between heartbeats of a running job (its progress is written at most this often). */
	heartbeatMs?: number;
	/** A running check whose heartbeat is older than this many seconds has lost its worker. */
	staleSeconds?: number;
	workerId?: string;
	log?: (line: string) => void;
	/** Called when a job ends (tests, benchmarks). */
	onJobEnd?: (outcome: JobOutcome) => void;
}

export interface RunningWorker {
	workerId: string;
	/** Stops taking jobs; running ones stop their engine and go back to the queue. */
	stop(): Promise<void>;
}

export async function startFieldCheckWorker(options: WorkerOptions): Promise<RunningWorker> {
	const concurrency = options.concurrency ?? 1;
	const pollMs = options.pollMs ?? 1000;
	const heartbeatMs = options.heartbeatMs ?? 2000;
	const staleSeconds = options.staleSeconds ?? 30;
	const workerId = options.workerId ?? `${hostname()}:${process.pid}:${randomUUID().slice(0, 8)}`;
	const log = options.log ?? ((line: string) => console.log(`[worker ${workerId}] ${line}`));

	const pool = new pg.Pool({ connectionString: options.databaseUrl, max: concurrency + 2, application_name: 'fringefield-worker' });
	pool.on('error', (err) => log(`database pool: ${err.message}`));
	const db = new Kysely<Database>({ dialect: new PostgresDialect({ pool }) });
	const boss: Boss = await createQueue({ databaseUrl: options.databaseUrl, role: 'worker', poolSize: 2 });
	const shutdown = new AbortController();
	const running = new Set<Promise<unknown>>();
	let turn = 0;

	const sleep = (ms: number) =>
		new Promise<void>((done) => {
			const wake = () => {
				clearTimeout(t);
				shutdown.signal.removeEventListener('abort', wake);
				done();
			};
			const t = setTimeout(wake, ms);
			shutdown.signal.addEventListener('abort', wake, { once: true });
		});

	/** One job from the queues, taken in turn so neither kind starves the other. */
	async function takeJob(): Promise<{ name: JobName; id: string; data: unknown } | null> {
		for (let i = 0; i < allJobNames.length; i++) {
			const name = allJobNames[(turn + i) % allJobNames.length];
			const [job] = await boss.fetch<unknown>(name, { batchSize: 1 });
			if (job) {
				turn = (turn + i + 1) % allJobNames.length;
				return { name, id: job.id, data: job.data };
			}
		}
		return null;
	}

	async function loop(): Promise<void> {
		while (!shutdown.signal.aborted) {
			if (running.size >= concurrency) {
				await Promise.race([...running, sleep(pollMs)]);
				continue;
			}
			let job;
			try {
				job = await takeJob();
			} catch (err) {
				log(`taking a job failed: ${(err as Error).message}`);
			}
			if (!job || shutdown.signal.aborted) {
				if (job) await boss.fail(job.name, job.id, { reason: 'worker shut down' }).catch(() => undefined);
				await sleep(pollMs);
				continue;
			}
			const run = runFieldCheckJob({ db, boss, engine: options.engine, workerId, heartbeatMs, shutdown: shutdown.signal, log }, job)
				.then((outcome) => options.onJobEnd?.(outcome))
				.catch((err) => log(`job ${job.id} could not be ended: ${(err as Error).stack ?? err}`));
			running.add(run);
			void run.finally(() => running.delete(run));
		}
	}

	/** Checks whose worker went quiet: cancelled if a cancel was asked for, else failed in pg-boss (which retries or gives up). */
	async function sweepLostWorkers(): Promise<void> {
		const stale = await fieldCheckQueries.listStaleFieldChecks(db, staleSeconds);
		for (const candidate of stale) {
			await db.transaction().execute(async (trx) => {
				const row = await fieldCheckQueries.lockStaleFieldCheckById(trx, candidate.id, staleSeconds);
				if (!row) return;
				const name = jobNames[row.kind];
				if (row.cancel_requested_at) {
					await fieldCheckQueries.endUnownedFieldCheckById(trx, row.id, 'cancelled', 'cancelled on request; its worker was lost');
					return;
				}
				await boss.fail(name, row.job_id, { reason: `worker ${row.worker_id} lost` }, { db: toBossDb(trx) });
				const job = await boss.getJobById(name, row.job_id, { db: toBossDb(trx), includeArchive: true });
				if (job?.state === 'retry') {
					await fieldCheckQueries.requeueFieldCheckById(trx, row.id, `its worker (${row.worker_id}) was lost; queued again`);
					log(`field check ${row.id}: worker ${row.worker_id} lost; queued again`);
				} else {
					await fieldCheckQueries.endUnownedFieldCheckById(trx, row.id, 'failed', `its worker was lost ${row.attempt} times; not retried again`);
					log(`field check ${row.id}: worker lost, retries used up`);
				}
			});
		}
	}
	const sweeper = setInterval(
		() => void sweepLostWorkers().catch((err) => log(`lost-worker sweep failed: ${(err as Error).message}`)),
		Math.max(1000, (staleSeconds * 1000) / 3)
	);

	const looping = loop();
	log(`taking ${allJobNames.join(' and ')} jobs, ${concurrency} at a time`);

	return {
		workerId,
		async stop() {
			shutdown.abort();
			clearInterval(sweeper);
			await looping;
			await Promise.allSettled([...running]);
			await boss.stop({ graceful: false, close: true, wait: true });
			await db.destroy();
		}
	};
}
