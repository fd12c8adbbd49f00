// measurement: an uploaded Touchstone S11 sweep of a built board, with what it says; and the revision column naming the
// measurement a retuned revision came from (added by migration 2026-12-02T0330, typed here by interface merging).
import type { ColumnType, Insertable, Selectable } from 'kysely';

export interface MeasurementTable {
	id: string;
	revision_id: string;
	file_name: string;
	file_sha256: string;
	/** The uploaded file's text. */
	touchstone: string;
	/** S11 samples: { frequencyHz, s11: { re, im } }[]. */
	points: ColumnType<unknown, string, never>;
	/** The plot's thinned trace: [frequencyHz, s11Db][] (migration 2026-12-02T0610; NULL for rows stored before it). */
	trace: ColumnType<unknown, string | undefined, never>;
	/** Resonance, band, minimum VSWR and file facts (see server/measurements/measurement-model.ts). */
	summary: ColumnType<unknown, string, never>;
	uploaded_by: string;
	uploaded_at: ColumnType<Date, Date | string | undefined, never>;
}
export type MeasurementRow = Selectable<MeasurementTable>;
export type InsertableMeasurementRow = Insertable<MeasurementTable>;

declare module './design.table' {
	interface RevisionTable {
		/** Set at insert time on a revision made by a retune; never updated (revisions are immutable). */
		retuned_from_measurement_id: ColumnType<string | null, string | null | undefined, never>;
	}
}
