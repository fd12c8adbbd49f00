// api_token: personal tokens scoped to one team; only the sha256 of the secret is stored.
import type { ColumnType, Insertable, Selectable } from 'kysely';

export interface ApiTokenTable {
	id: string;
	team_id: string;
	user_id: string;
	name: string;
	token_hash: string;
	last_used_at: Date | null;
	revoked_at: Date | null;
	created_at: ColumnType<Date, Date | string | undefined, never>;
}
export type ApiTokenRow = Selectable<ApiTokenTable>;
export type InsertableApiTokenRow = Insertable<ApiTokenTable>;
