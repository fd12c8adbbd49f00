// Reading a revision's sweep plans.
import type { Kysely } from 'kysely';
import type { Database } from '../db/database';
import * as sweepPlanQueries from '../db/sweep-plan.queries';
import { toSavedSweepPlan, type SavedSweepPlan } from './sweep-plan-model';

export async function listSweepPlans(db: Kysely<Database>, revisionId: string): Promise<SavedSweepPlan[]> {
	return (await sweepPlanQueries.listSweepPlansByRevision(db, revisionId)).map(toSavedSweepPlan);
}

export async function findSweepPlan(db: Kysely<Database>, revisionId: string, planId: string): Promise<SavedSweepPlan | null> {
	if (!/^[0-9a-f-]{36}$/.test(planId)) return null;
	const row = await sweepPlanQueries.findSweepPlanByRevisionAndId(db, revisionId, planId);
	return row ? toSavedSweepPlan(row) : null;
}
