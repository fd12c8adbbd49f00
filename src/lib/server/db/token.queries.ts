// Personal API tokens: create, list a person's live tokens, revoke, and the look-up by hash that authenticates a request.
import { sql, type Kysely } from 'kysely';
import type { Database } from './database';
import type { InsertableApiTokenRow } from './api-token.table';

export async function insertApiToken(db: Kysely<Database>, row: InsertableApiTokenRow): Promise<void> {
	await db.insertInto('api_token').values(row).execute();
}

export async function listLiveTokensByUser(db: Kysely<Database>, userId: string) {
	return db
		.selectFrom('api_token')
		.innerJoin('team', 'team.id', 'api_token.team_id')
		.select(['api_token.id', 'api_token.name', 'api_token.team_id', 'team.name as team_name', 'api_token.created_at', 'api_token.last_used_at'])
		.where('api_token.user_id', '=', userId)
		.where('api_token.revoked_at', 'is', null)
		.orderBy('api_token.created_at', 'desc')
		.execute();
}

export async function findTokenByIdAndUser(db: Kysely<Database>, id: string, userId: string) {
	return db.selectFrom('api_token').select(['id', 'team_id', 'revoked_at']).where('id', '=', id).where('user_id', '=', userId).executeTakeFirst();
}

export async function revokeTokenByIdAndUser(db: Kysely<Database>, id: string, userId: string, now: Date): Promise<boolean> {
	const result = await db
		.updateTable('api_token')
		.set({ revoked_at: now })
		.where('id', '=', id)
		.where('user_id', '=', userId)
		.where('revoked_at', 'is', null)
		.executeTakeFirst();
	return Number(result.numUpdatedRows) > 0;
}

/** A person leaving a team loses the tokens they made for it. */
export async function revokeTokensByTeamAndUser(db: Kysely<Database>, teamId: string, userId: string, now: Date): Promise<void> {
	await db.updateTable('api_token').set({ revoked_at: now }).where('team_id', '=', teamId).where('user_id', '=', userId).where('revoked_at', 'is', null).execute();
}

/** Revokes every live token of a person (a completed password reset); returns what was revoked, oldest first. */
export async function revokeLiveTokensByUser(db: Kysely<Database>, userId: string, now: Date) {
	const rows = await db
		.updateTable('api_token')
		.set({ revoked_at: now })
		.where('user_id', '=', userId)
		.where('revoked_at', 'is', null)
		.returning(['id', 'name', 'team_id', 'created_at'])
		.execute();
	return rows.sort((a, b) => a.created_at.getTime() - b.created_at.getTime() || a.id.localeCompare(b.id));
}

/** The stored row of a token (tests check that only the hash is kept). */
export async function findTokenRowById(db: Kysely<Database>, id: string) {
	return db.selectFrom('api_token').selectAll().where('id', '=', id).executeTakeFirst();
}

export async function findLiveTokenByHash(db: Kysely<Database>, tokenHash: string) {
	return db
		.selectFrom('api_token')
		.innerJoin('app_user', 'app_user.id', 'api_token.user_id')
		.select(['api_token.id', 'api_token.team_id', 'api_token.user_id', 'api_token.last_used_at', 'app_user.email', 'app_user.display_name', 'app_user.email_verified_at'])
		.where('api_token.token_hash', '=', tokenHash)
		.where('api_token.revoked_at', 'is', null)
		.executeTakeFirst();
}

/** "Last used" is kept to the minute: a burst of requests with one token must not queue on one row's lock. */
export const TOKEN_TOUCH_INTERVAL_MS = 60_000;

export function isTouchDue(lastUsedAt: Date | null, now = new Date()): boolean {
	return lastUsedAt === null || now.getTime() - lastUsedAt.getTime() >= TOKEN_TOUCH_INTERVAL_MS;
}

export async function touchTokenById(db: Kysely<Database>, id: string): Promise<void> {
	await db
		.updateTable('api_token')
		.set({ last_used_at: new Date() })
		.where('id', '=', id)
		.where((eb) => eb.or([eb('last_used_at', 'is', null), eb('last_used_at', '<', sql<Date>`now() - interval '1 minute'`)]))
		.execute();
}
