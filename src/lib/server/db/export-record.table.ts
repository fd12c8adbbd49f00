// export_record: every download — who, when, which revision, which files with their hashes, from where.
import type { ColumnType, Insertable, Selectable } from 'kysely';

export type ExportVia = 'ui' | 'api' | 'cli';

export interface ExportedFile {
	name: string;
	sizeBytes: number;
	sha256: string;
}

export interface ExportRecordTable {
	id: string;
	team_id: string;
	design_id: string;
	revision_id: string;
	user_id: string;
	via: ExportVia;
	/** What was downloaded: 'bundle', one format name, or 'sweep-plan' (one saved plan's sweep; see sweep_plan_id). */
	kind: string;
	/** The plan of a 'sweep-plan' download (migration 2026-12-02T0620); NULL for every other kind. */
	sweep_plan_id: ColumnType<string | null, string | null | undefined, never>;
	files: ColumnType<ExportedFile[], string, never>;
	/** sha256 of the bytes delivered (the zip for a bundle). */
	sha256: string;
	/** Length of the bytes sha256 covers (migration 2026-12-02T0945); NULL for zips recorded before it. */
	size_bytes: ColumnType<number | null, number | null | undefined, never>;
	waiver: string | null;
	created_at: ColumnType<Date, Date | string | undefined, never>;
}
export type ExportRecordRow = Selectable<ExportRecordTable>;
export type InsertableExportRecordRow = Insertable<ExportRecordTable>;
