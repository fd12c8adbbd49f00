// app_user: one row per person.
import type { ColumnType, Insertable, Selectable, Updateable } from 'kysely';

export interface AppUserTable {
	id: string;
	email: string;
	display_name: string;
	password_hash: string;
	/** NULL until the person follows the confirmation link mailed at sign-up (or completes a password reset). */
	email_verified_at: ColumnType<Date | null, Date | null | undefined, Date | null>;
	/** The person's display unit for lengths: 'mm' or 'mil' (stored lengths stay in mm). */
	length_unit: ColumnType<string, string | undefined, string>;
	/** The person's display unit for copper foil: 'um' or 'oz' (stored thicknesses stay in µm). */
	copper_unit: ColumnType<string, string | undefined, string>;
	created_at: ColumnType<Date, Date | string | undefined, never>;
}
export type AppUserRow = Selectable<AppUserTable>;
export type InsertableAppUserRow = Insertable<AppUserTable>;
export type UpdateableAppUserRow = Updateable<AppUserTable>;
