// email_verification: single-use, expiring links that confirm an e-mail address (only the token's hash is stored).
import type { ColumnType, Insertable, Selectable } from 'kysely';

export interface EmailVerificationTable {
	id: string;
	user_id: string;
	token_hash: string;
	expires_at: Date;
	used_at: Date | null;
	created_at: ColumnType<Date, Date | string | undefined, never>;
}
export type EmailVerificationRow = Selectable<EmailVerificationTable>;
export type InsertableEmailVerificationRow = Insertable<EmailVerificationTable>;
