// Reading field checks: one with its result, or a revision's list.
import type { Kysely } from 'kysely';
import type { Database } from '../db/database';
import * as fieldCheckQueries from '../db/field-check.queries';
import { toFieldCheck, toFieldCheckWithResult, type FieldCheck, type FieldCheckWithResult } from './field-check-model';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export async function findFieldCheck(db: Kysely<Database>, id: string): Promise<FieldCheckWithResult | null> {
	if (!UUID.test(id)) return null;
	const row = await fieldCheckQueries.findFieldCheckById(db, id);
	return row ? toFieldCheckWithResult(row) : null;
}

export async function listFieldChecks(db: Kysely<Database>, revisionId: string): Promise<FieldCheck[]> {
	return (await fieldCheckQueries.listFieldChecksByRevision(db, revisionId)).map(toFieldCheck);
}

/** A revision's newest succeeded check or study, with its result (the full-wave curve a measurement is drawn against). */
export async function findLatestFieldCheckResult(db: Kysely<Database>, revisionId: string): Promise<FieldCheckWithResult | null> {
	const latest = await fieldCheckQueries.findLatestSucceededFieldCheckIdByRevision(db, revisionId);
	return latest ? findFieldCheck(db, latest.id) : null;
}
