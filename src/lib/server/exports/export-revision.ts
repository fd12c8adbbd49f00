// One download: the design-rule gate, then build the revision's bytes (read back before they are offered),
// hash every file and the delivery, write exactly one export record (with the waiver, if one was needed).
import type { Violation } from '$lib/drc';
import type { ExportKind } from '$lib/schemas/api';
import type { FabProfile } from '$lib/schemas/fab-profile';
import type { ExportedFile, ExportVia } from '../db/export-record.table';
import { buildExport, type BuiltExport } from './build-export';
import { createImmutableCache } from './immutable-cache';
import type { ExportOptions } from './export-dependencies';
import { checkExportTarget } from './export-gate';
import { ExportRefusedError } from './export-refusal';
import type { ExportTarget } from './export-target';
import { recordExport } from './record-export';

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
 * A revision never changes, and neither do the profile it recorded or the bytes its files make: a download's
 * build and hashes are kept (at most 64 deliveries or 64 MB) and shared by every later download of the same
 * revision, kind and waiver; concurrent downloads of one key share one build. Each download still passes the
 * gate and writes its own export record.
 */
const builtExports = createImmutableCache<BuiltExport>({
	maxEntries: 64,
	maxBytes: 64 * 1024 * 1024,
	sizeOf: (b) => b.body.byteLength
});

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
	const buildOpts = { profile: gate.profile, waiver: notesWaiver, deps: opts.deps };
	// Test hooks change the bytes on purpose: such builds are never shared.
	const built = opts.deps
		? await buildExport(target, kind, buildOpts)
		: await builtExports.get(`${target.revision.id}\u0000${kind}\u0000${JSON.stringify(notesWaiver ?? null)}`, () => buildExport(target, kind, buildOpts));
	const { files, sha256 } = built;
	const record = await recordExport({ target, userId: by.userId, via: by.via, kind, files, sha256, waiver });
	return { exportId: record.id, kind, fileName: built.fileName, contentType: built.contentType, body: built.body, sha256, files, waiver, profile: gate.profile, waivedViolations: waiver ? gate.violations : [] };
}
