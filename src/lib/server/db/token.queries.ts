// Personal API tokens: create, list a person's live tokens, revoke (the look-up by hash is in api-token.queries.ts).
import type { Kysely } from 'kysely';
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

/** The stored row of a token (tests check that only the hash is kept). */
export async function findTokenRowById(db: Kysely<Database>, id: string) {
	return db.selectFrom('api_token').selectAll().where('id', '=', id).executeTakeFirst();
}
