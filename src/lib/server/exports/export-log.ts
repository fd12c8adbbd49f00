// The export log as the API answers it: one page of records, each with whether it matches the first earlier export of its revision
// and kind (and, for a sweep-plan download, its plan).
import type { z } from 'zod';
import type { ExportLogQuery, exportLogSchema, exportRecordSchema } from '$lib/schemas/api';
import { getDb } from '../db';
import * as exportQueries from '../db/export.queries';

export type ExportLogEntry = z.input<typeof exportRecordSchema>;
export type ExportLogPage = z.input<typeof exportLogSchema>;

export function toExportLogEntry(row: exportQueries.ExportLogRow): ExportLogEntry {
	return {
		id: row.id,
		createdAt: row.created_at.toISOString(),
		design: { id: row.design_id, name: row.design_name },
		revision: { label: row.revision_label },
		kind: row.kind as ExportLogEntry['kind'],
		sweepPlan: row.sweep_plan_id ? { id: row.sweep_plan_id, name: row.sweep_plan_name ?? '' } : null,
		via: row.via,
		user: { displayName: row.user_display_name },
		files: row.files,
		sizeBytes: row.size_bytes === null ? null : Number(row.size_bytes),
		sha256: row.sha256,
		waiver: row.waiver,
		earlier: row.earlier_id && row.earlier_created_at ? { exportId: row.earlier_id, createdAt: row.earlier_created_at.toISOString(), matches: row.earlier_matches === true } : null
	};
}

export async function listExportLog(teamId: string, query: ExportLogQuery): Promise<ExportLogPage> {
	const { rows, total } = await exportQueries.listExportsByTeam(getDb(), teamId, query);
	return { items: rows.map(toExportLogEntry), total, page: query.page, pageSize: query.pageSize };
}
