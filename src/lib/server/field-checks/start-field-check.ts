// Starts a field check or a Homing study: our row and its pg-boss job are written in one transaction, so a check is
// never queued without a job nor a job sent without a check.
import { randomUUID } from 'node:crypto';
import { error } from '@sveltejs/kit';
import type { Kysely } from 'kysely';
import { fieldCheckOptionsSchema, type FieldCheckMode } from '../../schemas/field-check';
import type { Database } from '../db/database';
import * as fieldCheckQueries from '../db/field-check.queries';
import type { FieldCheckKind } from '../db/field-check.table';
import type { Design, Revision } from '../designs/design-model';
import { getQueue, jobExpireSeconds, jobNames, JOB_RETRY_LIMIT, toBossDb } from '../jobs';

/** Queued or running checks a team may have at once (a full-wave run takes minutes of a worker's time). */
export const MAX_ACTIVE_FIELD_CHECKS_PER_TEAM = 10;

/** The limit in force: FRINGEFIELD_MAX_ACTIVE_FIELD_CHECKS when set (the job benchmark queues more), else the default. */
function activeLimit(): number {
	const set = Number(process.env.FRINGEFIELD_MAX_ACTIVE_FIELD_CHECKS);
	return Number.isInteger(set) && set > 0 ? set : MAX_ACTIVE_FIELD_CHECKS_PER_TEAM;
}

export interface StartFieldCheckOptions {
	design: Design;
	revision: Revision;
	userId: string;
	kind: FieldCheckKind;
	mode: FieldCheckMode;
}

/** Returns the new check's id. Throws HttpError 429 when the team already has too many waiting or running. */
export async function startFieldCheck(db: Kysely<Database>, opts: StartFieldCheckOptions): Promise<{ id: string }> {
	const options = fieldCheckOptionsSchema.parse({ mode: opts.mode });
	const boss = await getQueue();
	const id = randomUUID();
	const jobId = randomUUID();
	await db.transaction().execute(async (trx) => {
		// One team at a time decides on its count (the design row lock orders concurrent starts of its designs).
		await trx.selectFrom('team').select('id').where('id', '=', opts.design.teamId).forUpdate().executeTakeFirst();
		const active = await trx
			.selectFrom('field_check')
			.select((eb) => eb.fn.countAll<string>().as('n'))
			.where('team_id', '=', opts.design.teamId)
			.where('state', 'in', ['queued', 'running'])
			.executeTakeFirstOrThrow();
		const limit = activeLimit();
		if (Number(active.n) >= limit) {
			error(429, `Your team already has ${active.n} field checks waiting or running (at most ${limit}); wait for one to finish or cancel one`);
		}
		await fieldCheckQueries.insertFieldCheck(trx, {
			id,
			team_id: opts.design.teamId,
			design_id: opts.design.id,
			revision_id: opts.revision.id,
			kind: opts.kind,
			mode: options.mode,
			options: JSON.stringify(options),
			requested_by: opts.userId,
			job_id: jobId
		});
		await boss.send(jobNames[opts.kind], { fieldCheckId: id }, { id: jobId, db: toBossDb(trx), expireInSeconds: jobExpireSeconds(opts.kind, options), retryLimit: JOB_RETRY_LIMIT });
	});
	return { id };
}
