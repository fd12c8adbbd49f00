// audit_event: one security event (migration 2026-12-02T0500). Added to Database by interface merging.
import type { ColumnType, Insertable, Selectable } from 'kysely';

export interface AuditEventTable {
	id: string;
	/** NULL for events of no team (a failed sign-in). */
	team_id: string | null;
	/** NULL when nobody was identified. */
	actor_user_id: string | null;
	kind: string;
	details: ColumnType<Record<string, unknown>, string, never>;
	created_at: ColumnType<Date, Date | string | undefined, never>;
}
export type AuditEventRow = Selectable<AuditEventTable>;
export type InsertableAuditEventRow = Insertable<AuditEventTable>;

declare module './database' {
	interface Database {
		audit_event: AuditEventTable;
	}
}
