// Cancelling: a queued check ends at once; a running one is marked, and its worker stops the engine on its next
// heartbeat (≤ ~2 s) and ends it. Either way the pg-boss job is cancelled in the same transaction, so it is never retried.
import type { Kysely } from 'kysely';
import type { Database } from '../db/database';
import * as fieldCheckQueries from '../db/field-check.queries';
import { getQueue, jobNames, toBossDb } from '../jobs';

export type CancelOutcome = 'cancelled' | 'cancelling' | 'already-final';

export async function cancelFieldCheck(db: Kysely<Database>, id: string, byName: string): Promise<CancelOutcome> {
	const boss = await getQueue();
	return db.transaction().execute(async (trx) => {
		const row = await fieldCheckQueries.lockFieldCheckById(trx, id);
		if (!row || (row.state !== 'queued' && row.state !== 'running')) return 'already-final';
		await boss.cancel(jobNames[row.kind], row.job_id, { db: toBossDb(trx) });
		if (row.state === 'queued') {
			await fieldCheckQueries.endUnownedFieldCheckById(trx, id, 'cancelled', `cancelled by ${byName} before it started`);
			return 'cancelled';
		}
		await fieldCheckQueries.requestCancelFieldCheckById(trx, id);
		return 'cancelling';
	});
}
