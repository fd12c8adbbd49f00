// measurement.trace: the plot's thinned trace ([frequencyHz, s11Db] pairs, at most 2 per plot column), computed
// once at upload, so that viewing a measurement never reads its raw samples (150 000 of them make ~12 MB of JSON).
// NULL for rows stored before this column: the app computes their trace from the samples when they are viewed.
import type { Kysely } from 'kysely';

export async function up(db: Kysely<any>): Promise<void> {
	await db.schema.alterTable('measurement').addColumn('trace', 'jsonb').execute();
}

export async function down(db: Kysely<any>): Promise<void> {
	await db.schema.alterTable('measurement').dropColumn('trace').execute();
}
