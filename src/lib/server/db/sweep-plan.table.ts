// sweep_plan: a named parameter sweep on one revision; `plan` is a sweep-plan document (formats/sweep/plan.ts).
import type { ColumnType, Insertable, Selectable } from 'kysely';

export interface SweepPlanTable {
	id: string;
	revision_id: string;
	name: string;
	/** The validated sweep-plan document (sweepPlanSchema output). */
	plan: ColumnType<unknown, string, never>;
	point_count: number;
	created_by: string;
	created_at: ColumnType<Date, Date | string | undefined, never>;
}
export type SweepPlanRow = Selectable<SweepPlanTable>;
export type InsertableSweepPlanRow = Insertable<SweepPlanTable>;
