// password_reset: single-use, expiring reset links (only the token's hash is stored).
import type { ColumnType, Insertable, Selectable } from 'kysely';

export interface PasswordResetTable {
	id: string;
	user_id: string;
	token_hash: string;
	expires_at: Date;
	used_at: Date | null;
	created_at: ColumnType<Date, Date | string | undefined, never>;
}
export type PasswordResetRow = Selectable<PasswordResetTable>;
export type InsertablePasswordResetRow = Insertable<PasswordResetTable>;
