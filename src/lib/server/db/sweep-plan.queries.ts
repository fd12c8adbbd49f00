// Sweep-plan queries: plans are inserted and read; a changed plan is saved as a new one.
import type { Kysely } from 'kysely';
import type { Database } from './database';
import type { InsertableSweepPlanRow } from './sweep-plan.table';

export async function insertSweepPlan(db: Kysely<Database>, row: InsertableSweepPlanRow): Promise<void> {
	await db.insertInto('sweep_plan').values(row).execute();
}

const planColumns = [
	'sweep_plan.id',
	'sweep_plan.revision_id',
	'sweep_plan.name',
	'sweep_plan.plan',
	'sweep_plan.point_count',
	'sweep_plan.created_by',
	'sweep_plan.created_at',
	'app_user.display_name as created_by_name'
] as const;

/** A revision's plans, newest first. */
export async function listSweepPlansByRevision(db: Kysely<Database>, revisionId: string) {
	return db
		.selectFrom('sweep_plan')
		.innerJoin('app_user', 'app_user.id', 'sweep_plan.created_by')
		.select(planColumns)
		.where('sweep_plan.revision_id', '=', revisionId)
		.orderBy('sweep_plan.created_at', 'desc')
		.orderBy('sweep_plan.id')
		.execute();
}

export async function findSweepPlanByRevisionAndId(db: Kysely<Database>, revisionId: string, id: string) {
	return db
		.selectFrom('sweep_plan')
		.innerJoin('app_user', 'app_user.id', 'sweep_plan.created_by')
		.select(planColumns)
		.where('sweep_plan.revision_id', '=', revisionId)
		.where('sweep_plan.id', '=', id)
		.executeTakeFirst();
}

export async function countSweepPlansByRevision(db: Kysely<Database>, revisionId: string): Promise<number> {
	const row = await db.selectFrom('sweep_plan').select((eb) => eb.fn.countAll<string>().as('n')).where('revision_id', '=', revisionId).executeTakeFirstOrThrow();
	return Number(row.n);
}
