// Saves a sweep plan on a revision: the form draft → the plan document, validated and counted by formats/sweep (≤ 10 000 points).
import { randomUUID } from 'node:crypto';
import type { Kysely } from 'kysely';
import { checkPlanFitsDesign, parseSweepPlan, countSweepPoints } from '../../formats/sweep';
import { InputError, parseWith, type DesignInput } from '../../schemas';
import { sweepPlanDraftSchema, sweepPlanFromDraft } from '../../schemas/sweep-plan';
import type { LengthUnit } from '../../units';
import type { Database } from '../db/database';
import * as sweepPlanQueries from '../db/sweep-plan.queries';

export interface SaveSweepPlanOptions {
	revisionId: string;
	userId: string;
	/** The form's draft (sweepPlanDraftSchema). */
	draft: unknown;
	/** The revision's design input: a plan that holds the geometry must fit it. */
	base?: Pick<DesignInput, 'shape'>;
	/** The unit the draft's length fields were typed in (the form's hidden field); mm when not said (the API, old forms). */
	lengthUnit?: LengthUnit;
}

/**
 * Throws InputError with paths in the form's terms ("name", "axes.<row>.from", "axes" for the point limit);
 * nothing is written then.
 */
export async function saveSweepPlan(db: Kysely<Database>, opts: SaveSweepPlanOptions): Promise<{ id: string; pointCount: number }> {
	const draft = parseWith(sweepPlanDraftSchema, opts.draft);
	const { plan: document, rows } = sweepPlanFromDraft(draft, opts.lengthUnit ?? 'mm');
	let plan;
	try {
		plan = parseSweepPlan(document);
		if (opts.base) checkPlanFitsDesign(opts.base, plan);
	} catch (err) {
		if (!(err instanceof InputError)) throw err;
		// "plan.axes.2.from" → the form row that made axis 2.
		throw new InputError(
			err.issues.map((i) => ({ ...i, path: i.path.replace(/^plan\.axes\.(\d+)/, (_, n: string) => `axes.${rows[Number(n)] ?? n}`).replace(/^plan\.?/, '') }))
		);
	}
	const pointCount = countSweepPoints(plan);
	const id = randomUUID();
	await sweepPlanQueries.insertSweepPlan(db, {
		id,
		revision_id: opts.revisionId,
		name: draft.name,
		plan: JSON.stringify(plan),
		point_count: pointCount,
		created_by: opts.userId
	});
	return { id, pointCount };
}
