// user_session: lucia's sign-in sessions.
import type { Insertable, Selectable } from 'kysely';

export interface UserSessionTable {
	id: string;
	user_id: string;
	expires_at: Date;
}
export type UserSessionRow = Selectable<UserSessionTable>;
export type InsertableUserSessionRow = Insertable<UserSessionTable>;
