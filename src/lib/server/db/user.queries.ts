// People and their sessions: look-ups by e-mail and id, sign-up inserts, password changes.
import type { Kysely } from 'kysely';
import type { Database } from './database';
import type { InsertableAppUserRow } from './app-user.table';

export async function findUserByEmail(db: Kysely<Database>, email: string) {
	return db.selectFrom('app_user').select(['id', 'email', 'display_name', 'password_hash', 'email_verified_at']).where('email', '=', email).executeTakeFirst();
}

export async function findUserById(db: Kysely<Database>, id: string) {
	return db.selectFrom('app_user').select(['id', 'email', 'display_name', 'email_verified_at']).where('id', '=', id).executeTakeFirst();
}

/** Inserts a person; returns undefined when the e-mail is taken. */
export async function insertUser(db: Kysely<Database>, row: InsertableAppUserRow) {
	return db
		.insertInto('app_user')
		.values(row)
		.onConflict((oc) => oc.column('email').doNothing())
		.returning(['id', 'email', 'display_name'])
		.executeTakeFirst();
}

export async function updatePasswordHashById(db: Kysely<Database>, id: string, passwordHash: string): Promise<void> {
	await db.updateTable('app_user').set({ password_hash: passwordHash }).where('id', '=', id).execute();
}

export async function listSessionIdsByUser(db: Kysely<Database>, userId: string): Promise<string[]> {
	const rows = await db.selectFrom('user_session').select('id').where('user_id', '=', userId).execute();
	return rows.map((r) => r.id);
}

export async function deleteSessionsByUser(db: Kysely<Database>, userId: string): Promise<number> {
	const result = await db.deleteFrom('user_session').where('user_id', '=', userId).executeTakeFirst();
	return Number(result.numDeletedRows);
}

export async function findDisplayUnitsById(db: Kysely<Database>, id: string) {
	return db.selectFrom('app_user').select(['length_unit', 'copper_unit']).where('id', '=', id).executeTakeFirst();
}

export async function updateDisplayUnitsById(db: Kysely<Database>, id: string, units: { length_unit: string; copper_unit: string }): Promise<void> {
	await db.updateTable('app_user').set(units).where('id', '=', id).execute();
}
