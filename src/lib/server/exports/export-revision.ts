// One download: one worker task runs the design-rule gate, builds the revision's bytes (read back before they are
// offered) and hashes every file and the delivery; then exactly one export record (with the waiver, if one was needed).
import type { Violation } from '$lib/drc';
import { copperLayerCountOf } from '$lib/schemas';
import type { SizedDesign } from '$lib/rf';
import type { ExportKind } from '$lib/schemas/api';
import type { FabProfile } from '$lib/schemas/fab-profile';
import { getDb } from '../db';
import type { ExportedFile, ExportVia } from '../db/export-record.table';
import { revisionFabProfile } from '../fab-profiles';
import { buildExport, exportMetaOf } from './build-export';
import { createImmutableCache } from './immutable-cache';
import type { ExportOptions } from './export-dependencies';
import { ExportRefusedError } from './export-refusal';
import type { ExportTarget } from './export-target';
import type { ExportBuildReport } from './export-work';
import { recordExport } from './record-export';
import { refuseReadBack } from './refuse-read-back';
import { error } from '@sveltejs/kit';

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
 * outcome (bytes and hashes, or the gate's refusal) is kept (at most 64 deliveries or 64 MB) and shared by every
 * later download of the same revision, kind and waiver; concurrent downloads of one key share one task. Each
 * delivered download still writes its own export record.
 */
const builtExports = createImmutableCache<ExportBuildReport>({
	maxEntries: 64,
	maxBytes: 64 * 1024 * 1024,
	sizeOf: (r) => (r.outcome.outcome === 'built' ? r.outcome.body.byteLength : 0)
});

/**
 * Refuses (ExportRefusedError, nothing recorded) a revision that breaks its fab profile unless
 * `opts.waiver` gives a reason; the caller has checked that the person may waive. A waiver on a
 * clean revision waives nothing and is not recorded.
 */
export async function exportRevision(target: ExportTarget, kind: ExportKind, by: { userId: string; via: ExportVia }, opts: ExportOptions = {}): Promise<DeliveredExport> {
	const { profile } = await revisionFabProfile(getDb(), target.revision.id, copperLayerCountOf((target.revision.results as SizedDesign).input));
	const buildOpts = { ...(opts.waiver ? { waiverReason: opts.waiver } : {}), deps: opts.deps };
	// Test hooks change the bytes on purpose: such builds are never shared.
	const { outcome } = opts.deps
		? await buildExport(target, profile, kind, buildOpts)
		: await builtExports.get(`${target.revision.id}\u0000${kind}\u0000${JSON.stringify(opts.waiver ?? null)}`, () => buildExport(target, profile, kind, buildOpts));
	switch (outcome.outcome) {
		case 'refused':
			throw new ExportRefusedError(outcome.violations, profile);
		case 'read-back-failed':
			return refuseReadBack(outcome.mismatches, { designId: target.design.id, revisionId: target.revision.id, revision: target.revision.label, kind }, opts.deps?.logError);
		case 'empty':
			error(404, `Revision ${exportMetaOf(target).revisionLabel} has no ${kind} files (the design has nothing of that kind)`);
	}
	const { files, sha256, waiver } = outcome;
	const record = await recordExport({ target, userId: by.userId, via: by.via, kind, files, sha256, sizeBytes: outcome.body.byteLength, waiver });
	return { exportId: record.id, kind, fileName: outcome.fileName, contentType: outcome.contentType, body: outcome.body, sha256, files, waiver, profile, waivedViolations: waiver ? outcome.violations : [] };
}
