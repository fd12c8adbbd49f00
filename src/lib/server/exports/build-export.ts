// A revision → the bytes of one download (the bundle zip, one format's single file, or a zip of a format's
// several files), built on a worker thread within the work budget (see export-work.ts for the work itself).
import { error } from '@sveltejs/kit';
import { createExportMeta, type ExportMeta } from '$lib/formats/export-meta';
import type { FabNotesWaiver } from '$lib/formats/fab-notes';
import type { SizedDesign } from '$lib/rf';
import { builtInFabProfileFor, copperLayerCountOf, type FabProfile } from '$lib/schemas';
import type { ExportKind } from '$lib/schemas/api';
import type { ExportedFile } from '../db/export-record.table';
import { runBudgetedWork } from '../work';
import type { ExportDependencies } from './export-dependencies';
import type { ExportTarget } from './export-target';
import type { ExportBuildInput } from './export-work';
import { refuseReadBack } from './refuse-read-back';

export { contentTypeOf } from './content-type';

export interface BuiltExport {
	kind: ExportKind;
	/** Name of the delivered file (the core's pattern). */
	fileName: string;
	contentType: string;
	/** The delivered bytes. */
	body: Uint8Array;
	/** Every file the delivery holds (for a zip: its entries, manifest included), with sizes and hashes. */
	files: ExportedFile[];
	/** sha256 of the body. */
	sha256: string;
}

/** The revision's date (UTC calendar day of created_at): the only date any file carries. */
export function revisionDateOf(createdAt: Date): string {
	return createdAt.toISOString().slice(0, 10);
}

export function exportMetaOf(target: ExportTarget): ExportMeta {
	const meta = createExportMeta({ designName: target.design.name, revisionLabel: target.revision.label, revisionDate: revisionDateOf(target.revision.createdAt) });
	// The design's stored slug is unique in its team, so two designs of one name never share file names.
	return { ...meta, designSlug: target.design.slug };
}

export interface BuildExportOptions {
	/** The fab profile the revision recorded (the gate's), named in the fab notes with its figures; default: the built-in that can build the stack. */
	profile?: FabProfile;
	/** Waived design-rule violations, printed in the fab notes. */
	waiver?: FabNotesWaiver;
	deps?: ExportDependencies;
}

export async function buildExport(target: ExportTarget, kind: ExportKind, opts: BuildExportOptions = {}): Promise<BuiltExport> {
	const meta = exportMetaOf(target);
	// The sized design stored with the revision: what the revision is, whatever later engines compute.
	const sized = target.revision.results as SizedDesign;
	const profile = opts.profile ?? builtInFabProfileFor(copperLayerCountOf(sized.input));
	const input: ExportBuildInput = { sized, meta, kind, profile, ...(opts.waiver ? { waiver: opts.waiver } : {}) };
	// The tests' corruption hook is a function, which cannot cross to a thread: those builds run here.
	const outcome = opts.deps?.corruptFiles
		? await (await import('./export-work')).buildExportBytes(input, opts.deps.corruptFiles)
		: (await runBudgetedWork({ type: 'export', input }, { what: `The ${kind} download of revision ${meta.revisionLabel}` })).outcome;
	if (outcome.outcome === 'read-back-failed') {
		refuseReadBack(outcome.mismatches, { designId: target.design.id, revisionId: target.revision.id, revision: target.revision.label, kind }, opts.deps?.logError);
	}
	if (outcome.outcome === 'empty') error(404, `Revision ${meta.revisionLabel} has no ${kind} files (the design has nothing of that kind)`);
	return { kind, fileName: outcome.fileName, contentType: outcome.contentType, body: outcome.body, files: outcome.files, sha256: outcome.sha256 };
}
