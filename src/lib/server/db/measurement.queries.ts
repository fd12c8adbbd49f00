// Measurement queries, and the link from a retuned revision back to its measurement.
import type { Kysely } from 'kysely';
import type { Database } from './database';
import type { InsertableMeasurementRow } from './measurement.table';

export async function insertMeasurement(db: Kysely<Database>, row: InsertableMeasurementRow): Promise<void> {
	await db.insertInto('measurement').values(row).execute();
}

const listColumns = [
	'measurement.id',
	'measurement.revision_id',
	'measurement.file_name',
	'measurement.file_sha256',
	'measurement.summary',
	'measurement.uploaded_by',
	'measurement.uploaded_at',
	'app_user.display_name as uploaded_by_name'
] as const;

/** A revision's measurements without their samples, newest first. */
export async function listMeasurementsByRevision(db: Kysely<Database>, revisionId: string) {
	return db
		.selectFrom('measurement')
		.innerJoin('app_user', 'app_user.id', 'measurement.uploaded_by')
		.select(listColumns)
		.where('measurement.revision_id', '=', revisionId)
		.orderBy('measurement.uploaded_at', 'desc')
		.orderBy('measurement.id')
		.execute();
}

/** One measurement with its plot trace (NULL for rows stored before the trace column), without its samples. */
export async function findMeasurementTraceByRevisionAndId(db: Kysely<Database>, revisionId: string, id: string) {
	return db
		.selectFrom('measurement')
		.innerJoin('app_user', 'app_user.id', 'measurement.uploaded_by')
		.select([...listColumns, 'measurement.trace'])
		.where('measurement.revision_id', '=', revisionId)
		.where('measurement.id', '=', id)
		.executeTakeFirst();
}

/** One measurement with its samples. */
export async function findMeasurementByRevisionAndId(db: Kysely<Database>, revisionId: string, id: string) {
	return db
		.selectFrom('measurement')
		.innerJoin('app_user', 'app_user.id', 'measurement.uploaded_by')
		.select([...listColumns, 'measurement.points'])
		.where('measurement.revision_id', '=', revisionId)
		.where('measurement.id', '=', id)
		.executeTakeFirst();
}

/** Deletes one measurement of a revision; the number of rows deleted (0 or 1). */
export async function deleteMeasurementByRevisionAndId(db: Kysely<Database>, revisionId: string, id: string): Promise<number> {
	const result = await db.deleteFrom('measurement').where('revision_id', '=', revisionId).where('id', '=', id).executeTakeFirst();
	return Number(result.numDeletedRows);
}

export async function countMeasurementsByRevision(db: Kysely<Database>, revisionId: string): Promise<number> {
	const row = await db.selectFrom('measurement').select((eb) => eb.fn.countAll<string>().as('n')).where('revision_id', '=', revisionId).executeTakeFirstOrThrow();
	return Number(row.n);
}

/** Revisions retuned from a measurement, oldest first. */
export async function listRevisionsByRetunedFromMeasurement(db: Kysely<Database>, measurementId: string) {
	return db
		.selectFrom('revision')
		.select(['revision.id', 'revision.label', 'revision.created_at'])
		.where('revision.retuned_from_measurement_id', '=', measurementId)
		.orderBy('revision.seq')
		.execute();
}

/** The measurement a revision was retuned from (with the label of the revision it measured), if any. */
export async function findRetuneSourceByRevision(db: Kysely<Database>, revisionId: string) {
	return db
		.selectFrom('revision')
		.innerJoin('measurement', 'measurement.id', 'revision.retuned_from_measurement_id')
		.innerJoin('revision as measured', 'measured.id', 'measurement.revision_id')
		.select(['measurement.id as measurement_id', 'measurement.file_name', 'measurement.uploaded_at', 'measured.label as measured_label'])
		.where('revision.id', '=', revisionId)
		.executeTakeFirst();
}
