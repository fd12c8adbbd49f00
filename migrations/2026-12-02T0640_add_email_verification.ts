// E-mail confirmation: app_user.email_verified_at (NULL until the person follows the link we mailed), and
// email_verification, the single-use expiring links (only the sha256 of a token is stored, as for resets).
// People who existed before this change keep working as before: they count as confirmed.
import { sql, type Kysely } from 'kysely';

export async function up(db: Kysely<any>): Promise<void> {
	await db.schema.alterTable('app_user').addColumn('email_verified_at', 'timestamptz').execute();
	await sql`update app_user set email_verified_at = created_at`.execute(db);
	await db.schema
		.createTable('email_verification')
		.addColumn('id', 'text', (c) => c.primaryKey())
		.addColumn('user_id', 'text', (c) => c.notNull().references('app_user.id').onDelete('cascade'))
		.addColumn('token_hash', 'text', (c) => c.notNull().unique())
		.addColumn('expires_at', 'timestamptz', (c) => c.notNull())
		.addColumn('used_at', 'timestamptz')
		.addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
		.execute();
	await db.schema.createIndex('email_verification_user_id').on('email_verification').column('user_id').execute();
}

export async function down(db: Kysely<any>): Promise<void> {
	await db.schema.dropTable('email_verification').execute();
	await db.schema.alterTable('app_user').dropColumn('email_verified_at').execute();
}
