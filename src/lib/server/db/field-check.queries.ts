// Field check queries: the app inserts and cancels; a worker claims, beats, and finishes (only while it still owns
// the row); the lost-worker sweep finds running checks whose heartbeat went quiet.
import { sql, type Kysely } from 'kysely';
import type { Database } from './database';
import type { FieldCheckState, InsertableFieldCheckRow } from './field-check.table';

export async function insertFieldCheck(db: Kysely<Database>, row: InsertableFieldCheckRow): Promise<void> {
	await db.insertInto('field_check').values(row).execute();
}

const viewColumns = [
	'field_check.id',
	'field_check.team_id',
	'field_check.design_id',
	'field_check.revision_id',
	'revision.label as revision_label',
	'field_check.kind',
	'field_check.mode',
	'field_check.options',
	'field_check.state',
	'field_check.progress',
	'field_check.error',
	'field_check.requested_by',
	'app_user.display_name as requested_by_name',
	'field_check.created_at',
	'field_check.started_at',
	'field_check.finished_at',
	'field_check.cancel_requested_at',
	'field_check.attempt',
	'field_check.job_id'
] as const;

/** One check with its result. */
export async function findFieldCheckById(db: Kysely<Database>, id: string) {
	return db
		.selectFrom('field_check')
		.innerJoin('revision', 'revision.id', 'field_check.revision_id')
		.innerJoin('app_user', 'app_user.id', 'field_check.requested_by')
		.select([...viewColumns, 'field_check.result'])
		.where('field_check.id', '=', id)
		.executeTakeFirst();
}

/** A revision's checks without their results, newest first. */
export async function listFieldChecksByRevision(db: Kysely<Database>, revisionId: string, limit = 50) {
	return db
		.selectFrom('field_check')
		.innerJoin('revision', 'revision.id', 'field_check.revision_id')
		.innerJoin('app_user', 'app_user.id', 'field_check.requested_by')
		.select(viewColumns)
		.where('field_check.revision_id', '=', revisionId)
		.orderBy('field_check.created_at', 'desc')
		.orderBy('field_check.id')
		.limit(limit)
		.execute();
}

/** What a worker needs to run a check: the row, and the revision's input document. */
export async function findFieldCheckWorkById(db: Kysely<Database>, id: string) {
	return db
		.selectFrom('field_check')
		.innerJoin('revision', 'revision.id', 'field_check.revision_id')
		.select(['field_check.id', 'field_check.kind', 'field_check.options', 'field_check.state', 'field_check.job_id', 'field_check.attempt', 'revision.input'])
		.where('field_check.id', '=', id)
		.executeTakeFirst();
}

/** Locks the row until the transaction ends (cancel and the lost-worker sweep decide on a stable state). */
export async function lockFieldCheckById(db: Kysely<Database>, id: string) {
	return db.selectFrom('field_check').select(['id', 'kind', 'state', 'job_id', 'attempt', 'cancel_requested_at']).where('id', '=', id).forUpdate().executeTakeFirst();
}

/**
 * A worker takes the check: queued, or running under a worker that was lost (a retry). Null when it was cancelled
 * or finished meanwhile.
 */
export async function claimFieldCheckById(db: Kysely<Database>, id: string, workerId: string) {
	return db
		.updateTable('field_check')
		.set((eb) => ({
			state: 'running',
			worker_id: workerId,
			attempt: eb('attempt', '+', 1),
			started_at: sql<Date>`coalesce(started_at, now())`,
			heartbeat_at: sql<Date>`now()`,
			progress: null
		}))
		.where('id', '=', id)
		.where('state', 'in', ['queued', 'running'])
		.where('cancel_requested_at', 'is', null)
		.returning(['id', 'attempt'])
		.executeTakeFirst();
}

/**
 * The running worker's heartbeat, with its latest progress when it changed. Returns whether a cancel was asked for;
 * undefined when the worker no longer owns the row (the check was retried elsewhere, or ended).
 */
export async function beatFieldCheckById(db: Kysely<Database>, id: string, workerId: string, progressJson?: string) {
	return db
		.updateTable('field_check')
		.set({ heartbeat_at: sql<Date>`now()`, ...(progressJson !== undefined ? { progress: progressJson } : {}) })
		.where('id', '=', id)
		.where('worker_id', '=', workerId)
		.where('state', '=', 'running')
		.returning(['cancel_requested_at'])
		.executeTakeFirst();
}

/** Ends a check the worker owns: succeeded with its result, or failed/cancelled with a reason. False when not owned. */
export async function finishFieldCheckById(
	db: Kysely<Database>,
	id: string,
	workerId: string,
	end: { state: 'succeeded'; resultJson: string; progressJson: string } | { state: 'failed' | 'cancelled'; error: string }
): Promise<boolean> {
	const done = await db
		.updateTable('field_check')
		.set({
			state: end.state,
			finished_at: sql<Date>`now()`,
			heartbeat_at: sql<Date>`now()`,
			...(end.state === 'succeeded' ? { result: end.resultJson, progress: end.progressJson, error: null } : { error: end.error })
		})
		.where('id', '=', id)
		.where('worker_id', '=', workerId)
		.where('state', '=', 'running')
		.executeTakeFirst();
	return Number(done.numUpdatedRows) === 1;
}

/** Ends a check nobody runs (queued, or running under a lost worker): cancelled or failed. */
export async function endUnownedFieldCheckById(db: Kysely<Database>, id: string, state: Extract<FieldCheckState, 'failed' | 'cancelled'>, error: string) {
	await db
		.updateTable('field_check')
		.set({ state, error, finished_at: sql<Date>`now()` })
		.where('id', '=', id)
		.where('state', 'in', ['queued', 'running'])
		.execute();
}

/** Marks a running check for cancelling; its worker sees it on its next heartbeat. */
export async function requestCancelFieldCheckById(db: Kysely<Database>, id: string) {
	await db.updateTable('field_check').set({ cancel_requested_at: sql<Date>`coalesce(cancel_requested_at, now())` }).where('id', '=', id).where('state', '=', 'running').execute();
}

/** Puts a check whose worker was lost back to queued (pg-boss hands its job to the next worker). */
export async function requeueFieldCheckById(db: Kysely<Database>, id: string, reason: string) {
	await db.updateTable('field_check').set({ state: 'queued', worker_id: null, heartbeat_at: null, error: reason }).where('id', '=', id).where('state', '=', 'running').execute();
}

/** Running checks whose worker has not beaten for `staleSeconds`. */
export async function listStaleFieldChecks(db: Kysely<Database>, staleSeconds: number) {
	return db
		.selectFrom('field_check')
		.select(['id', 'kind', 'job_id', 'attempt', 'worker_id', 'cancel_requested_at'])
		.where('state', '=', 'running')
		.where('heartbeat_at', '<', sql<Date>`now() - make_interval(secs => ${staleSeconds})`)
		.execute();
}

/** Locks a check that is still running with a heartbeat older than `staleSeconds` (undefined when it recovered or ended). */
export async function lockStaleFieldCheckById(db: Kysely<Database>, id: string, staleSeconds: number) {
	return db
		.selectFrom('field_check')
		.select(['id', 'kind', 'job_id', 'attempt', 'worker_id', 'cancel_requested_at'])
		.where('id', '=', id)
		.where('state', '=', 'running')
		.where('heartbeat_at', '<', sql<Date>`now() - make_interval(secs => ${staleSeconds})`)
		.forUpdate()
		.executeTakeFirst();
}

/** Revisions made from a Homing study's tuned input, oldest first. */
export async function listRevisionsByHomedFromFieldCheck(db: Kysely<Database>, fieldCheckId: string) {
	return db.selectFrom('revision').select(['revision.id', 'revision.label']).where('revision.homed_from_field_check_id', '=', fieldCheckId).orderBy('revision.seq').execute();
}

/** The Homing study a revision was made from (with the label of the revision it studied), if any. */
export async function findHomingSourceByRevision(db: Kysely<Database>, revisionId: string) {
	return db
		.selectFrom('revision')
		.innerJoin('field_check', 'field_check.id', 'revision.homed_from_field_check_id')
		.innerJoin('revision as studied', 'studied.id', 'field_check.revision_id')
		.select(['field_check.id as field_check_id', 'studied.label as studied_label'])
		.where('revision.id', '=', revisionId)
		.executeTakeFirst();
}

/** The id of a revision's newest succeeded check (or study), if any. */
export async function findLatestSucceededFieldCheckIdByRevision(db: Kysely<Database>, revisionId: string) {
	return db
		.selectFrom('field_check')
		.select('id')
		.where('revision_id', '=', revisionId)
		.where('state', '=', 'succeeded')
		.orderBy('finished_at', 'desc')
		.orderBy('id')
		.limit(1)
		.executeTakeFirst();
}
