// People and their sign-in sessions (the session table's shape is the one lucia's PostgreSQL adapter reads).
import { sql, type Kysely } from 'kysely';

export async function up(db: Kysely<any>): Promise<void> {
	await db.schema
		.createTable('app_user')
		.addColumn('id', 'text', (c) => c.primaryKey())
		.addColumn('email', 'text', (c) => c.notNull().unique())
		.addColumn('display_name', 'text', (c) => c.notNull())
		.addColumn('password_hash', 'text', (c) => c.notNull())
		.addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
		.addCheckConstraint('app_user_email_lower', sql`email = lower(email)`)
		.execute();
	await db.schema
		.createTable('user_session')
		.addColumn('id', 'text', (c) => c.primaryKey())
		.addColumn('user_id', 'text', (c) => c.notNull().references('app_user.id').onDelete('cascade'))
		.addColumn('expires_at', 'timestamptz', (c) => c.notNull())
		.execute();
	await db.schema.createIndex('user_session_user_id').on('user_session').column('user_id').execute();
}

export async function down(db: Kysely<any>): Promise<void> {
	await db.schema.dropTable('user_session').execute();
	await db.schema.dropTable('app_user').execute();
}
