// fab_profile: a team's own fab capability profiles; and revision.fab_profile, the profile values a revision is checked
// against (added by migration 2026-12-02T0400, typed here by interface merging; set at insert, never updated).
import type { ColumnType, Insertable, Selectable } from 'kysely';

export interface FabProfileTable {
	id: string;
	team_id: string;
	name: string;
	/** The whole profile document (fabProfileSchema output, name included). */
	properties: ColumnType<unknown, string, never>;
	created_by: string;
	created_at: ColumnType<Date, Date | string | undefined, never>;
}
export type FabProfileRow = Selectable<FabProfileTable>;
export type InsertableFabProfileRow = Insertable<FabProfileTable>;

declare module './design.table' {
	interface RevisionTable {
		/** The fab profile values this revision is checked against; NULL on revisions older than the gate (read as the built-in). */
		fab_profile: ColumnType<unknown, string | undefined, never>;
	}
}
