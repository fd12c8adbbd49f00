// A prepared revision → the bytes of one download, through the design pipeline: the bundle zip, one format's single
// file, or a zip of a format's several files. Gerber and drill files are read back before they are offered.
import { error } from '@sveltejs/kit';
import { bundle, holdsFabFiles, readBack, writeFiles, type PreparedDesign } from '$lib/design';
import { bundleFileName, contentTypeOfFile, createExportMeta, exportFileName, formatIds, type ExportMeta, type FabNotesWaiver, type FormatId, hashFiles, type HashedFile } from '$lib/formats';
import type { ExportKind } from '$lib/schemas/api';
import type { ExportDependencies } from './export-dependencies';
import type { ExportTarget } from './export-target';
import { assertReadBack } from './read-back-gate';

export interface BuiltExport {
	kind: ExportKind;
	/** Name of the delivered file (the core's pattern). */
	fileName: string;
	contentType: string;
	/** The delivered bytes. */
	body: Uint8Array;
	/** Every file the delivery holds (for a zip: its entries, manifest included), each with its SHA-256. */
	files: HashedFile[];
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
	/** Waived design-rule violations, printed in the fab notes. */
	waiver?: FabNotesWaiver;
	deps?: ExportDependencies;
}

export async function buildExport(target: ExportTarget, prepared: PreparedDesign, kind: ExportKind, opts: BuildExportOptions = {}): Promise<BuiltExport> {
	const meta = exportMetaOf(target);
	const formats: readonly FormatId[] = kind === 'bundle' ? formatIds : [kind];
	const written = await writeFiles(prepared, formats, meta, opts.waiver ? { waiver: opts.waiver } : {});
	// test hooks rewrite bytes on purpose: what they return is hashed again
	const files = opts.deps?.corruptFiles ? await hashFiles(opts.deps.corruptFiles(written)) : written;
	if (holdsFabFiles(files)) {
		const context = { designId: target.design.id, revisionId: target.revision.id, revision: target.revision.label, kind };
		assertReadBack(readBack(files, prepared, meta), context, opts.deps?.logError);
	}

	if (kind === 'bundle') {
		return { kind, fileName: bundleFileName(meta), contentType: contentTypeOfFile('.zip'), body: await bundle(files, meta), files };
	}
	const manifestName = exportFileName(meta, 'manifest', 'json');
	const own = files.filter((f) => f.name !== manifestName);
	if (own.length === 0) error(404, `Revision ${meta.revisionLabel} has no ${kind} files (the design has nothing of that kind)`);
	if (own.length === 1) {
		const [file] = own;
		return { kind, fileName: file.name, contentType: contentTypeOfFile(file.name), body: file.bytes, files: [file] };
	}
	// Several files of one format (a Gerber per layer): one zip of them with their manifest.
	const name = exportFileName(meta, kind, 'zip');
	return { kind, fileName: name, contentType: contentTypeOfFile(name), body: await bundle(files, meta), files };
}
