// Every test file shares one test database and so one job queue. A file that queues field checks cancels them when
// it ends, and a file that runs a worker cancels whatever is still open before it starts: otherwise its worker
// takes another file's leftover jobs first (first in, first out) and the job under test waits behind them.
import type { Kysely } from 'kysely';
import type { Database } from '../../../../src/lib/server/db/database';
import { cancelFieldCheck } from '../../../../src/lib/server/field-checks';

/** Cancels the open (queued or running) field checks, of one team or of every team; returns how many. */
export async function cancelOpenFieldChecks(db: Kysely<Database>, teamId?: string): Promise<number> {
	let query = db.selectFrom('field_check').select('id').where('state', 'in', ['queued', 'running']);
	if (teamId) query = query.where('team_id', '=', teamId);
	const open = await query.execute();
	for (const { id } of open) await cancelFieldCheck(db, id, 'the test clean-up');
	return open.length;
}
