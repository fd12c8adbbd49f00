// API token lookup for request authentication.
import { sql, type Kysely } from 'kysely';
import type { Database } from './database';

export async function findLiveTokenByHash(db: Kysely<Database>, tokenHash: string) {
	return db
		.selectFrom('api_token')
		.innerJoin('app_user', 'app_user.id', 'api_token.user_id')
		.select(['api_token.id', 'api_token.team_id', 'api_token.user_id', 'api_token.last_used_at', 'app_user.email', 'app_user.display_name'])
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
