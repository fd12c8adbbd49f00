// A revision made by a retune names the measurement it was retuned from. Set when the revision is
// inserted (the immutability trigger refuses updates, so it can never be set or changed later).
import type { Kysely } from 'kysely';

export async function up(db: Kysely<any>): Promise<void> {
	// No ON DELETE action: measurements and revisions only go away together, when their design is deleted.
	await db.schema
		.alterTable('revision')
		.addColumn('retuned_from_measurement_id', 'text', (c) => c.references('measurement.id'))
		.execute();
	await db.schema.createIndex('revision_retuned_from').on('revision').column('retuned_from_measurement_id').execute();
}

export async function down(db: Kysely<any>): Promise<void> {
	await db.schema.dropIndex('revision_retuned_from').execute();
	await db.schema.alterTable('revision').dropColumn('retuned_from_measurement_id').execute();
}
