// field_check: a full-wave check or a Homing study of one revision, carried by a pg-boss job; and the revision column
// naming the Homing study a revision was made from (migration 2026-12-02T0700, typed here by interface merging).
import type { ColumnType, Insertable, Selectable, Updateable } from 'kysely';
import type { fieldCheckStates } from '../../schemas/api';
import type { FieldCheckMode } from '../../schemas/field-check';

export type FieldCheckKind = 'check' | 'homing';
export type FieldCheckState = (typeof fieldCheckStates)[number];

export interface FieldCheckTable {
	id: string;
	team_id: string;
	design_id: string;
	revision_id: string;
	kind: FieldCheckKind;
	mode: FieldCheckMode;
	/** fieldCheckOptionsSchema output. */
	options: ColumnType<unknown, string, never>;
	state: ColumnType<FieldCheckState, FieldCheckState | undefined, FieldCheckState>;
	/** fieldCheckProgressSchema; null before the first report. */
	progress: ColumnType<unknown, string | null | undefined, string | null>;
	/** fieldCheckResultSchema or homingResultSchema; set once with state 'succeeded'. */
	result: ColumnType<unknown, never, string>;
	error: ColumnType<string | null, string | null | undefined, string | null>;
	requested_by: string;
	created_at: ColumnType<Date, Date | string | undefined, never>;
	started_at: ColumnType<Date | null, never, Date | string | null>;
	finished_at: ColumnType<Date | null, never, Date | string | null>;
	cancel_requested_at: ColumnType<Date | null, never, Date | string | null>;
	heartbeat_at: ColumnType<Date | null, never, Date | string | null>;
	attempt: ColumnType<number, never, number>;
	worker_id: ColumnType<string | null, never, string | null>;
	job_id: ColumnType<string, string, never>;
}
export type FieldCheckRow = Selectable<FieldCheckTable>;
export type InsertableFieldCheckRow = Insertable<FieldCheckTable>;
export type UpdateableFieldCheckRow = Updateable<FieldCheckTable>;

declare module './design.table' {
	interface RevisionTable {
		/** Set at insert time on a revision made from a Homing study's tuned input; never updated. */
		homed_from_field_check_id: ColumnType<string | null, string | null | undefined, never>;
	}
}
