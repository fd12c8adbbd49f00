// sweep_plan: a named parameter sweep saved on one revision (the plan document is checked by the app's zod schema).
import { sql, type Kysely } from 'kysely';

export async function up(db: Kysely<any>): Promise<void> {
	await db.schema
		.createTable('sweep_plan')
		.addColumn('id', 'text', (c) => c.primaryKey())
		.addColumn('revision_id', 'text', (c) => c.notNull().references('revision.id').onDelete('cascade'))
		.addColumn('name', 'text', (c) => c.notNull())
		.addColumn('plan', 'jsonb', (c) => c.notNull())
		.addColumn('point_count', 'integer', (c) => c.notNull())
		.addColumn('created_by', 'text', (c) => c.notNull().references('app_user.id'))
		.addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
		// The last guard behind the schema: the app refuses more than 10 000 points before it gets here.
		.addCheckConstraint('sweep_plan_point_count', sql`point_count between 1 and 10000`)
		.execute();
	await db.schema.createIndex('sweep_plan_revision').on('sweep_plan').column('revision_id').execute();
}

export async function down(db: Kysely<any>): Promise<void> {
	await db.schema.dropTable('sweep_plan').execute();
}
