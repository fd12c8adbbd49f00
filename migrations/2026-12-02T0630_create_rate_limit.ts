// rate_limit: the attempt counters of every limiter (sign-in failures, reset mails, invitations), shared by all
// app processes. The shape is the one rate-limiter-flexible's RateLimiterPostgres reads and writes (key,
// points, expire in epoch milliseconds); the app is told the table exists, so it never creates one itself.
import { sql, type Kysely } from 'kysely';

export async function up(db: Kysely<any>): Promise<void> {
	await db.schema
		.createTable('rate_limit')
		.addColumn('key', 'varchar(255)', (c) => c.primaryKey())
		.addColumn('points', 'integer', (c) => c.notNull().defaultTo(0))
		.addColumn('expire', 'bigint')
		.execute();
	await db.schema.createIndex('rate_limit_expire').on('rate_limit').column('expire').execute();
	await sql`comment on table rate_limit is 'rate-limiter-flexible counters; keys are <limiter>:<sha256 of the subject>'`.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
	await db.schema.dropTable('rate_limit').execute();
}
