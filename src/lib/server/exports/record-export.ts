// Writes the ONE export record of a download: who, which revision, what, each file's name/size/sha256, the delivered bytes' sha256, from where.
import { randomUUID } from 'node:crypto';
import { getDb } from '../db';
import * as exportQueries from '../db/export.queries';
import type { ExportedFile, ExportVia } from '../db/export-record.table';
import type { ExportTarget } from './export-target';

export interface ExportRecordInput {
	target: ExportTarget;
	userId: string;
	via: ExportVia;
	kind: string;
	files: ExportedFile[];
	sha256: string;
	/** Why design-rule violations were accepted; null/absent for a clean design. */
	waiver?: string | null;
}

export async function recordExport(input: ExportRecordInput): Promise<{ id: string; createdAt: Date }> {
	const row = await exportQueries.insertExportRecord(getDb(), {
		id: randomUUID(),
		team_id: input.target.design.teamId,
		design_id: input.target.design.id,
		revision_id: input.target.revision.id,
		user_id: input.userId,
		via: input.via,
		kind: input.kind,
		files: input.files,
		sha256: input.sha256,
		waiver: input.waiver ?? null
	});
	return { id: row.id, createdAt: row.created_at };
}
