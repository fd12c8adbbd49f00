// Counts behind the per-person limits (teams, live API tokens), and the row lock that makes a
// count-then-insert safe against two requests of the same person at once.
import type { Kysely } from 'kysely';
import type { Database } from './database';

export async function lockUserById(db: Kysely<Database>, userId: string): Promise<void> {
	await db.selectFrom('app_user').select('id').where('id', '=', userId).forUpdate().executeTakeFirst();
}

export async function countTeamsByUser(db: Kysely<Database>, userId: string): Promise<number> {
	const row = await db.selectFrom('team_member').select(({ fn }) => fn.countAll<string>().as('n')).where('user_id', '=', userId).executeTakeFirstOrThrow();
	return Number(row.n);
}

export async function countLiveTokensByUser(db: Kysely<Database>, userId: string): Promise<number> {
	const row = await db
		.selectFrom('api_token')
		.select(({ fn }) => fn.countAll<string>().as('n'))
		.where('user_id', '=', userId)
		.where('revoked_at', 'is', null)
		.executeTakeFirstOrThrow();
	return Number(row.n);
}
