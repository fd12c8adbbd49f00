// API token lookup for request authentication.
import type { Kysely } from 'kysely';
import type { Database } from './database';

export async function findLiveTokenByHash(db: Kysely<Database>, tokenHash: string) {
	return db
		.selectFrom('api_token')
		.innerJoin('app_user', 'app_user.id', 'api_token.user_id')
		.select(['api_token.id', 'api_token.team_id', 'api_token.user_id', 'app_user.email', 'app_user.display_name'])
		.where('api_token.token_hash', '=', tokenHash)
		.where('api_token.revoked_at', 'is', null)
		.executeTakeFirst();
}

export async function touchTokenById(db: Kysely<Database>, id: string): Promise<void> {
	await db.updateTable('api_token').set({ last_used_at: new Date() }).where('id', '=', id).execute();
}
