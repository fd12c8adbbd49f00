// field_check: one full-wave simulation (kind 'check') or one Homing study (kind 'homing') of a revision, run by a
// worker from the pg-boss queue. The result is written once, in the same transaction that ends the job, and never
// changes afterwards (a trigger refuses it). A revision made from a Homing study names the study (set at insert).
import { sql, type Kysely } from 'kysely';

export async function up(db: Kysely<any>): Promise<void> {
	await db.schema
		.createTable('field_check')
		.addColumn('id', 'text', (c) => c.primaryKey())
		.addColumn('team_id', 'text', (c) => c.notNull().references('team.id').onDelete('cascade'))
		.addColumn('design_id', 'text', (c) => c.notNull().references('design.id').onDelete('cascade'))
		.addColumn('revision_id', 'text', (c) => c.notNull().references('revision.id').onDelete('cascade'))
		.addColumn('kind', 'text', (c) => c.notNull())
		.addColumn('mode', 'text', (c) => c.notNull())
		/** The engine options the job runs with (mode, budgetSeconds). */
		.addColumn('options', 'jsonb', (c) => c.notNull())
		.addColumn('state', 'text', (c) => c.notNull().defaultTo('queued'))
		/** The latest progress the worker reported (fieldCheckProgressSchema). */
		.addColumn('progress', 'jsonb')
		/** fieldCheckResultSchema (check) or homingResultSchema (homing); set once, with state 'succeeded'. */
		.addColumn('result', 'jsonb')
		.addColumn('error', 'text')
		.addColumn('requested_by', 'text', (c) => c.notNull().references('app_user.id'))
		.addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
		.addColumn('started_at', 'timestamptz')
		.addColumn('finished_at', 'timestamptz')
		.addColumn('cancel_requested_at', 'timestamptz')
		/** Written by the running worker every ~2 s; a stale one means the worker was lost. */
		.addColumn('heartbeat_at', 'timestamptz')
		/** How many times a worker has taken the job (a retry after a lost worker counts again). */
		.addColumn('attempt', 'integer', (c) => c.notNull().defaultTo(0))
		.addColumn('worker_id', 'text')
		/** The pg-boss job that carries it. */
		.addColumn('job_id', 'text', (c) => c.notNull().unique())
		.addCheckConstraint('field_check_kind', sql`kind in ('check', 'homing')`)
		.addCheckConstraint('field_check_mode', sql`mode in ('quick', 'standard', 'accurate')`)
		.addCheckConstraint('field_check_state', sql`state in ('queued', 'running', 'succeeded', 'failed', 'cancelled')`)
		// Nothing half-stored: a result exactly when the check succeeded, and a finish time for every final state.
		.addCheckConstraint('field_check_result_when_succeeded', sql`(state = 'succeeded') = (result is not null)`)
		.addCheckConstraint('field_check_finished_when_final', sql`(state in ('succeeded', 'failed', 'cancelled')) = (finished_at is not null)`)
		.execute();
	await db.schema.createIndex('field_check_revision_created').on('field_check').columns(['revision_id', 'created_at']).execute();
	await db.schema.createIndex('field_check_running').on('field_check').column('heartbeat_at').where(sql.ref('state'), '=', 'running').execute();

	// A final state is final: no change to a succeeded, failed or cancelled check (its result included).
	await sql`
		create function field_check_final_is_final() returns trigger language plpgsql as $$
		begin
			if old.state in ('succeeded', 'failed', 'cancelled') then
				raise exception 'field check % is % and can no longer change', old.id, old.state using errcode = 'check_violation';
			end if;
			return new;
		end $$`.execute(db);
	await sql`create trigger field_check_no_change_when_final before update on field_check for each row execute function field_check_final_is_final()`.execute(db);

	await db.schema
		.alterTable('revision')
		.addColumn('homed_from_field_check_id', 'text', (c) => c.references('field_check.id'))
		.execute();
	await db.schema.createIndex('revision_homed_from').on('revision').column('homed_from_field_check_id').execute();
}

export async function down(db: Kysely<any>): Promise<void> {
	await db.schema.dropIndex('revision_homed_from').execute();
	await db.schema.alterTable('revision').dropColumn('homed_from_field_check_id').execute();
	await sql`drop trigger if exists field_check_no_change_when_final on field_check`.execute(db);
	await db.schema.dropTable('field_check').execute();
	await sql`drop function if exists field_check_final_is_final()`.execute(db);
}
