// laminate: a team's own laminate library (properties validated by the laminate schema).
import type { ColumnType, Insertable, Selectable } from 'kysely';

export interface LaminateTable {
	id: string;
	team_id: string;
	name: string;
	properties: ColumnType<unknown, string, string>;
	created_by: string;
	created_at: ColumnType<Date, Date | string | undefined, never>;
}
export type LaminateRow = Selectable<LaminateTable>;
export type InsertableLaminateRow = Insertable<LaminateTable>;
