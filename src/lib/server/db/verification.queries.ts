// E-mail confirmation links and the verified mark on a person: only the sha256 of a token is stored; a link is used at most once.
import type { Kysely } from 'kysely';
import type { Database } from './database';
import type { InsertableEmailVerificationRow } from './email-verification.table';

export async function insertEmailVerification(db: Kysely<Database>, row: InsertableEmailVerificationRow): Promise<void> {
	await db.insertInto('email_verification').values(row).execute();
}

/** Marks a live link used in one statement (two racing requests cannot both use it); returns its person. */
export async function consumeEmailVerificationByHash(db: Kysely<Database>, tokenHash: string, now: Date) {
	return db
		.updateTable('email_verification')
		.set({ used_at: now })
		.where('token_hash', '=', tokenHash)
		.where('used_at', 'is', null)
		.where('expires_at', '>', now)
		.returning(['id', 'user_id'])
		.executeTakeFirst();
}

/** Ends every other open link of a person. */
export async function retireEmailVerificationsByUser(db: Kysely<Database>, userId: string, now: Date): Promise<void> {
	await db.updateTable('email_verification').set({ used_at: now }).where('user_id', '=', userId).where('used_at', 'is', null).execute();
}

/** Sets the verified mark once (the first confirmation's time is kept). */
export async function markEmailVerifiedById(db: Kysely<Database>, userId: string, now: Date): Promise<void> {
	await db.updateTable('app_user').set({ email_verified_at: now }).where('id', '=', userId).where('email_verified_at', 'is', null).execute();
}

export async function findEmailVerifiedAtById(db: Kysely<Database>, userId: string): Promise<Date | null> {
	const row = await db.selectFrom('app_user').select('email_verified_at').where('id', '=', userId).executeTakeFirst();
	return row?.email_verified_at ?? null;
}

export async function findEmailVerifiedAtByEmail(db: Kysely<Database>, email: string): Promise<{ id: string; emailVerifiedAt: Date | null } | undefined> {
	const row = await db.selectFrom('app_user').select(['id', 'email_verified_at']).where('email', '=', email).executeTakeFirst();
	return row && { id: row.id, emailVerifiedAt: row.email_verified_at };
}
