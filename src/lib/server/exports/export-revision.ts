// One download: the design-rule gate, then build the revision's bytes (read back before they are offered),
// hash every file and the delivery, write exactly one export record (with the waiver, if one was needed).
import type { Violation } from '$lib/drc';
import type { ExportKind } from '$lib/schemas/api';
import type { FabProfile } from '$lib/schemas/fab-profile';
import type { ExportedFile, ExportVia } from '../db/export-record.table';
import { buildExport } from './build-export';
import type { ExportOptions } from './export-dependencies';
import { checkExportTarget } from './export-gate';
import { ExportRefusedError } from './export-refusal';
import type { ExportTarget } from './export-target';
import { recordExport } from './record-export';
import { sha256Hex } from './sha256';

export interface DeliveredExport {
	exportId: string;
	kind: ExportKind;
	fileName: string;
	contentType: string;
	body: Uint8Array;
	sha256: string;
	files: ExportedFile[];
	/** The waiver recorded with this export: null when the design was clean. */
	waiver: string | null;
	/** The profile the artwork was checked against, and what was waived. */
	profile: FabProfile;
	waivedViolations: Violation[];
}

/**
 * Refuses (ExportRefusedError, nothing recorded) a revision that breaks its fab profile unless
 * `opts.waiver` gives a reason; the caller has checked that the person may waive. A waiver on a
 * clean revision waives nothing and is not recorded.
 */
export async function exportRevision(target: ExportTarget, kind: ExportKind, by: { userId: string; via: ExportVia }, opts: ExportOptions = {}): Promise<DeliveredExport> {
	const gate = await checkExportTarget(target);
	if (gate.violations.length > 0 && !opts.waiver) throw new ExportRefusedError(gate.violations, gate.profile);
	const waiver = gate.violations.length > 0 && opts.waiver ? opts.waiver : null;
	const notesWaiver = waiver ? { reason: waiver, profileName: gate.profile.name, violations: gate.violations.map((v) => v.message) } : undefined;
	const built = await buildExport(target, kind, { waiver: notesWaiver, deps: opts.deps });
	const files = built.files.map((f) => ({ name: f.name, sizeBytes: f.bytes.byteLength, sha256: sha256Hex(f.bytes) }));
	const sha256 = sha256Hex(built.body);
	const record = await recordExport({ target, userId: by.userId, via: by.via, kind, files, sha256, waiver });
	return { exportId: record.id, kind, fileName: built.fileName, contentType: built.contentType, body: built.body, sha256, files, waiver, profile: gate.profile, waivedViolations: waiver ? gate.violations : [] };
}
