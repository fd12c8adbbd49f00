// Demo data for `npm start`: a scenario of our own (a small team building GNSS and ISM-band boards).
import { Kysely, PostgresDialect } from 'kysely';
import pg from 'pg';
import type { Database } from '../../src/lib/server/db/database.ts';
import { hashPassword } from '../../src/lib/server/auth/password.ts';

export const DEMO_EMAIL = 'demo@fringefield.test';
export const DEMO_PASSWORD = 'patch-demo-2450';

export async function seedDemo(databaseUrl: string): Promise<void> {
	const db = new Kysely<Database>({ dialect: new PostgresDialect({ pool: new pg.Pool({ connectionString: databaseUrl, max: 1 }) }) });
	try {
		const existing = await db.selectFrom('app_user').select('id').where('email', '=', DEMO_EMAIL).executeTakeFirst();
		if (existing) return;
		await db
			.insertInto('app_user')
			.values({ id: 'demo-user-0001', email: DEMO_EMAIL, display_name: 'Imke Varga (demo)', password_hash: await hashPassword(DEMO_PASSWORD) })
			.execute();
	} finally {
		await db.destroy();
	}
}
