// measurement: an uploaded Touchstone S11 sweep of a built board, kept with the revision it measures.
import { sql, type Kysely } from 'kysely';

export async function up(db: Kysely<any>): Promise<void> {
	await db.schema
		.createTable('measurement')
		.addColumn('id', 'text', (c) => c.primaryKey())
		.addColumn('revision_id', 'text', (c) => c.notNull().references('revision.id').onDelete('cascade'))
		.addColumn('file_name', 'text', (c) => c.notNull())
		.addColumn('file_sha256', 'text', (c) => c.notNull())
		/** The file as uploaded (text: Touchstone is ASCII). */
		.addColumn('touchstone', 'text', (c) => c.notNull())
		/** The S11 samples as read: [{ frequencyHz, s11: { re, im } }]. */
		.addColumn('points', 'jsonb', (c) => c.notNull())
		/** Resonance, the −10 dB band, minimum VSWR, file facts. */
		.addColumn('summary', 'jsonb', (c) => c.notNull())
		.addColumn('uploaded_by', 'text', (c) => c.notNull().references('app_user.id'))
		.addColumn('uploaded_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
		.addCheckConstraint('measurement_sha256', sql`file_sha256 ~ '^[0-9a-f]{64}$'`)
		.execute();
	await db.schema.createIndex('measurement_revision').on('measurement').column('revision_id').execute();
}

export async function down(db: Kysely<any>): Promise<void> {
	await db.schema.dropTable('measurement').execute();
}
