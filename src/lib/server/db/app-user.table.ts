// app_user: one row per person.
import type { ColumnType, Insertable, Selectable, Updateable } from 'kysely';

export interface AppUserTable {
	id: string;
	email: string;
	display_name: string;
	password_hash: string;
	created_at: ColumnType<Date, Date | string | undefined, never>;
}
export type AppUserRow = Selectable<AppUserTable>;
export type InsertableAppUserRow = Insertable<AppUserTable>;
export type UpdateableAppUserRow = Updateable<AppUserTable>;
