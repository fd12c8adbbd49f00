// Runs one queued job: claims its field_check row, runs the engine with a heartbeat (progress at most every ~2 s, and
// the cancel flag read back), stops the engine on cancel, on the time budget or when the row was taken over, and
// stores the outcome and completes the pg-boss job in one transaction. Nothing is stored half-way.
import type { Kysely } from 'kysely';
import type { Database } from '../lib/server/db/database';
import * as fieldCheckQueries from '../lib/server/db/field-check.queries';
import { fieldCheckJobDataSchema, jobBudgetSeconds, toBossDb, type Boss, type JobName } from '../lib/server/jobs';
import { designInputSchema } from '../lib/schemas/design-input';
import { fieldCheckOptionsSchema, fieldCheckResultSchema, homingResultSchema, type FieldCheckOptions, type FieldCheckProgress } from '../lib/schemas/field-check';
import type { DesignInput } from '../lib/schemas/design-input';
import type { FieldCheckKind } from '../lib/server/db/field-check.table';
import type { FieldCheckEngine } from './engine';

export interface JobContext {
	db: Kysely<Database>;
	boss: Boss;
	engine: FieldCheckEngine;
	workerId: string;
	/** Milliseconds between heartbeats (progress writes and cancel checks). */
	heartbeatMs: number;
	/** Set when the worker shuts down: running jobs stop and go back to the queue for another worker. */
	shutdown: AbortSignal;
	log: (line: string) => void;
}

export interface QueuedJob {
	name: JobName;
	id: string;
	data: unknown;
}

/** Seconds past the job budget before the worker stops an engine that did not stop itself. */
const BUDGET_GRACE_SECONDS = 15;

type StopReason = 'cancel' | 'budget' | 'taken-over' | 'shutdown';

export type JobOutcome = 'succeeded' | 'failed' | 'cancelled' | 'skipped' | 'taken-over' | 'handed-back';

export async function runFieldCheckJob(ctx: JobContext, job: QueuedJob): Promise<JobOutcome> {
	const { db, boss } = ctx;
	const parsed = fieldCheckJobDataSchema.safeParse(job.data);
	if (!parsed.success) {
		await boss.fail(job.name, job.id, { reason: 'the job data names no field check' });
		return 'failed';
	}
	const id = parsed.data.fieldCheckId;
	const claimed = await fieldCheckQueries.claimFieldCheckById(db, id, ctx.workerId);
	if (!claimed) {
		// Cancelled or ended while it waited: nothing to run.
		await boss.complete(job.name, job.id);
		return 'skipped';
	}
	const work = await fieldCheckQueries.findFieldCheckWorkById(db, id);
	if (!work) return 'skipped';
	const options = fieldCheckOptionsSchema.safeParse(work.options);
	const input = designInputSchema.safeParse(work.input);
	if (!options.success || !input.success) {
		// A stored revision this engine cannot read: say so once instead of retrying.
		const error = `the stored ${options.success ? 'design input' : 'options'} could not be read: ${(options.error ?? input.error)!.issues[0]?.message ?? 'invalid'}`;
		await db.transaction().execute(async (trx) => {
			if (await fieldCheckQueries.finishFieldCheckById(trx, id, ctx.workerId, { state: 'failed', error })) await boss.complete(job.name, job.id, { state: 'failed' }, { db: toBossDb(trx) });
		});
		return 'failed';
	}
	return runClaimed(ctx, job, id, claimed.attempt, work.kind, options.data, input.data);
}

async function runClaimed(ctx: JobContext, job: QueuedJob, id: string, attempt: number, kind: FieldCheckKind, options: FieldCheckOptions, input: DesignInput): Promise<JobOutcome> {
	const { db, boss } = ctx;
	const budgetSeconds = jobBudgetSeconds(kind, options);
	ctx.log(`field check ${id} (${kind}, ${options.mode}, attempt ${attempt}) started`);

	const abort = new AbortController();
	let stopReason: StopReason | null = null;
	const stop = (reason: StopReason) => {
		if (stopReason) return;
		stopReason = reason;
		abort.abort(new Error(reason));
	};

	let latest: FieldCheckProgress = { fraction: 0, message: 'starting the engine' };
	let dirty = true;
	let beating: Promise<void> = Promise.resolve();
	const beat = () => {
		beating = beating.then(async () => {
			const progressJson = dirty ? JSON.stringify(latest) : undefined;
			dirty = false;
			try {
				const row = await fieldCheckQueries.beatFieldCheckById(db, id, ctx.workerId, progressJson);
				if (!row) stop('taken-over');
				else if (row.cancel_requested_at) stop('cancel');
			} catch (err) {
				// PostgreSQL away for a moment: keep running, report again on the next beat.
				dirty = dirty || progressJson !== undefined;
				ctx.log(`field check ${id}: heartbeat failed (${(err as Error).message})`);
			}
		});
	};
	beat();
	const heartbeat = setInterval(beat, ctx.heartbeatMs);
	// The engine stops itself at its budget and says so; this is the backstop a few seconds later.
	const budget = setTimeout(() => stop('budget'), (budgetSeconds + BUDGET_GRACE_SECONDS) * 1000);
	const onShutdown = () => stop('shutdown');
	ctx.shutdown.addEventListener('abort', onShutdown);
	if (ctx.shutdown.aborted) stop('shutdown');

	const control = {
		signal: abort.signal,
		onProgress: (p: FieldCheckProgress) => {
			latest = p;
			dirty = true;
		}
	};

	let outcome: { state: 'succeeded'; resultJson: string } | { state: 'failed' | 'cancelled'; error: string } | null = null;
	try {
		const result =
			kind === 'homing' ? homingResultSchema.parse(await ctx.engine.runHoming(input, options, control)) : fieldCheckResultSchema.parse(await ctx.engine.runFieldCheck(input, options, control));
		outcome = stopReason ? null : { state: 'succeeded', resultJson: JSON.stringify(result) };
	} catch (err) {
		if (!stopReason) outcome = { state: 'failed', error: `the engine stopped: ${(err as Error).message}`.slice(0, 2000) };
	} finally {
		clearInterval(heartbeat);
		clearTimeout(budget);
		ctx.shutdown.removeEventListener('abort', onShutdown);
		await beating;
	}

	const reason = stopReason as StopReason | null;
	if (reason === 'taken-over') {
		ctx.log(`field check ${id}: taken over by another worker; this run is dropped`);
		return 'taken-over';
	}
	if (reason === 'shutdown') {
		// Back to the queue: pg-boss retries the job on the next worker (within its retry limit).
		await db.transaction().execute(async (trx) => {
			await fieldCheckQueries.requeueFieldCheckById(trx, id, 'its worker shut down; queued again');
			await boss.fail(job.name, job.id, { reason: 'worker shut down' }, { db: toBossDb(trx) });
		});
		return 'handed-back';
	}
	if (reason === 'cancel') outcome = { state: 'cancelled', error: 'cancelled on request; the engine was stopped' };
	if (reason === 'budget') outcome = { state: 'failed', error: `stopped after its time budget of ${budgetSeconds} s` };
	const end = outcome!;
	const stored = await db.transaction().execute(async (trx) => {
		const done =
			end.state === 'succeeded'
				? await fieldCheckQueries.finishFieldCheckById(trx, id, ctx.workerId, { state: 'succeeded', resultJson: end.resultJson, progressJson: JSON.stringify({ fraction: 1, message: 'done' }) })
				: await fieldCheckQueries.finishFieldCheckById(trx, id, ctx.workerId, end);
		// An engine failure is not retried (it would fail the same way); only a lost worker is.
		if (done) await boss.complete(job.name, job.id, { state: end.state }, { db: toBossDb(trx) });
		return done;
	});
	ctx.log(`field check ${id}: ${stored ? end.state : 'taken over before it could be stored'}`);
	return stored ? end.state : 'taken-over';
}
