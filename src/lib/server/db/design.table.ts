// design and revision: a design holds immutable revisions labelled A, B, C… (the database refuses updates).
import type { ColumnType, Insertable, Selectable } from 'kysely';

export interface DesignTable {
	id: string;
	team_id: string;
	slug: string;
	name: string;
	created_by: string;
	created_at: ColumnType<Date, Date | string | undefined, never>;
}
export type DesignRow = Selectable<DesignTable>;
export type InsertableDesignRow = Insertable<DesignTable>;

export interface RevisionTable {
	id: string;
	design_id: string;
	label: string;
	seq: number;
	parent_id: string | null;
	/** The complete design-input document (designInputSchema output). */
	input: ColumnType<unknown, string, never>;
	/** The sized design computed from it when it was saved. */
	results: ColumnType<unknown, string, never>;
	note: ColumnType<string, string | undefined, never>;
	created_by: string;
	created_at: ColumnType<Date, Date | string | undefined, never>;
}
export type RevisionRow = Selectable<RevisionTable>;
export type InsertableRevisionRow = Insertable<RevisionTable>;
