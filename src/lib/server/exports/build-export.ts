// A revision → one download's outcome (the bundle zip, one format's single file, or a zip of a format's several
// files, or the gate's refusal), built as one task on a worker thread within the work budget (see export-work.ts).
import { createExportMeta, type ExportMeta } from '$lib/formats/export-meta';
import type { SizedDesign } from '$lib/rf';
import type { ExportKind } from '$lib/schemas/api';
import type { FabProfile } from '$lib/schemas/fab-profile';
import { runBudgetedWork } from '../work';
import type { ExportDependencies } from './export-dependencies';
import type { ExportTarget } from './export-target';
import type { ExportBuildInput, ExportBuildReport } from './export-work';

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
	/** The reason given for exporting despite violations. */
	waiverReason?: string;
	deps?: ExportDependencies;
}

/** Runs one download's task: on a worker thread, or here when a test hook (a function) must run between steps. */
export async function buildExport(target: ExportTarget, profile: FabProfile, kind: ExportKind, opts: BuildExportOptions = {}): Promise<ExportBuildReport> {
	const meta = exportMetaOf(target);
	// The sized design stored with the revision: what the revision is, whatever later engines compute.
	const input: ExportBuildInput = { sized: target.revision.results as SizedDesign, profile, meta, kind, ...(opts.waiverReason ? { waiverReason: opts.waiverReason } : {}) };
	// The tests' corruption hook is a function, which cannot cross to a thread: those builds run here.
	if (opts.deps?.corruptFiles) return (await import('./export-work')).buildExportBytes(input, opts.deps.corruptFiles);
	const { report } = await runBudgetedWork({ type: 'export', input }, { what: `The ${kind} download of revision ${meta.revisionLabel}` });
	return report;
}
