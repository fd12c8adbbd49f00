// Password-reset links: only the sha256 of the token is stored; a link is used at most once.
import type { Kysely } from 'kysely';
import type { Database } from './database';
import type { InsertablePasswordResetRow } from './password-reset.table';

export async function insertPasswordReset(db: Kysely<Database>, row: InsertablePasswordResetRow): Promise<void> {
	await db.insertInto('password_reset').values(row).execute();
}

/** The reset behind a token hash when it is unused and unexpired at `now`. */
export async function findLivePasswordResetByHash(db: Kysely<Database>, tokenHash: string, now: Date) {
	return db
		.selectFrom('password_reset')
		.innerJoin('app_user', 'app_user.id', 'password_reset.user_id')
		.select(['password_reset.id', 'password_reset.user_id', 'password_reset.expires_at', 'app_user.email'])
		.where('password_reset.token_hash', '=', tokenHash)
		.where('password_reset.used_at', 'is', null)
		.where('password_reset.expires_at', '>', now)
		.executeTakeFirst();
}

/** Marks a live reset used in one statement (so two racing requests cannot both use it); returns its user. */
export async function consumePasswordResetByHash(db: Kysely<Database>, tokenHash: string, now: Date) {
	return db
		.updateTable('password_reset')
		.set({ used_at: now })
		.where('token_hash', '=', tokenHash)
		.where('used_at', 'is', null)
		.where('expires_at', '>', now)
		.returning(['id', 'user_id'])
		.executeTakeFirst();
}

/** Ends every other open link of a person once one has been used. */
export async function retirePasswordResetsByUser(db: Kysely<Database>, userId: string, now: Date): Promise<void> {
	await db.updateTable('password_reset').set({ used_at: now }).where('user_id', '=', userId).where('used_at', 'is', null).execute();
}
