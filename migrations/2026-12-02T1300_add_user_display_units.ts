// Each person's display units: lengths in mm or mil, copper foil in µm or oz. Only what pages show and accept;
// every stored length stays in mm. Everyone starts (and people who existed before stay) on mm and µm.
import { sql, type Kysely } from 'kysely';

export async function up(db: Kysely<any>): Promise<void> {
	await db.schema
		.alterTable('app_user')
		.addColumn('length_unit', 'text', (c) => c.notNull().defaultTo('mm').check(sql`length_unit in ('mm', 'mil')`))
		.addColumn('copper_unit', 'text', (c) => c.notNull().defaultTo('um').check(sql`copper_unit in ('um', 'oz')`))
		.execute();
}

export async function down(db: Kysely<any>): Promise<void> {
	await db.schema.alterTable('app_user').dropColumn('copper_unit').dropColumn('length_unit').execute();
}
