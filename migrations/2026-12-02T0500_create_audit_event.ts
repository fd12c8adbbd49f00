// audit_event: security events (failed sign-ins, role changes, API token creation and revocation,
// design-rule waivers). team_id is NULL for events that belong to no team (a failed sign-in); the
// actor is NULL when nobody could be identified. Rows are only ever inserted.
import { sql, type Kysely } from 'kysely';

export async function up(db: Kysely<any>): Promise<void> {
	await db.schema
		.createTable('audit_event')
		.addColumn('id', 'text', (c) => c.primaryKey())
		.addColumn('team_id', 'text', (c) => c.references('team.id').onDelete('cascade'))
		.addColumn('actor_user_id', 'text', (c) => c.references('app_user.id').onDelete('set null'))
		.addColumn('kind', 'text', (c) => c.notNull())
		.addColumn('details', 'jsonb', (c) => c.notNull().defaultTo(sql`'{}'::jsonb`))
		.addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
		.addCheckConstraint('audit_event_details_object', sql`jsonb_typeof(details) = 'object'`)
		.execute();
	await db.schema.createIndex('audit_event_team_created').on('audit_event').columns(['team_id', 'created_at']).execute();
}

export async function down(db: Kysely<any>): Promise<void> {
	await db.schema.dropTable('audit_event').execute();
}
