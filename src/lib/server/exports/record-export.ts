// Writes the ONE export record of a download: who, which revision, what, each file's name/size/sha256, the delivered bytes' sha256 and length, from where.
import { randomUUID } from 'node:crypto';
import { getDb } from '../db';
import * as exportQueries from '../db/export.queries';
import { recordAuditEvent } from '../audit/record-audit-event';
import type { ExportedFile, ExportVia } from '../db/export-record.table';
import type { ExportTarget } from './export-target';
import type { ExportLogKind } from '$lib/schemas/api';

export interface ExportRecordInput {
	target: ExportTarget;
	userId: string;
	via: ExportVia;
	kind: ExportLogKind;
	/** The saved plan a 'sweep-plan' download was built from; absent for every other kind. */
	sweepPlanId?: string | null;
	files: ExportedFile[];
	sha256: string;
	/** Length of the delivered bytes (the ones sha256 covers). */
	sizeBytes: number;
	/** Why design-rule violations were accepted; null/absent for a clean design. */
	waiver?: string | null;
}

export async function recordExport(input: ExportRecordInput): Promise<{ id: string; createdAt: Date }> {
	// A waiver is a security event too: its audit row is written in the same transaction as the record.
	return getDb()
		.transaction()
		.execute(async (trx) => {
			const row = await exportQueries.insertExportRecord(trx, {
				id: randomUUID(),
				team_id: input.target.design.teamId,
				design_id: input.target.design.id,
				revision_id: input.target.revision.id,
				user_id: input.userId,
				via: input.via,
				kind: input.kind,
				sweep_plan_id: input.sweepPlanId ?? null,
				files: input.files,
				sha256: input.sha256,
				size_bytes: input.sizeBytes,
				waiver: input.waiver ?? null
			});
			if (input.waiver) {
				const details = { exportId: row.id, designId: input.target.design.id, revisionId: input.target.revision.id, kind: input.kind, reason: input.waiver };
				await recordAuditEvent({ kind: 'export.waived', teamId: input.target.design.teamId, actorUserId: input.userId, details }, trx);
			}
			return { id: row.id, createdAt: row.created_at };
		});
}
