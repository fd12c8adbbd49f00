// A revision → the bytes of one download, built by the pure core: the bundle zip, one format's single file, or a zip of a format's several files.
import { createSVGWindow } from 'svgdom';
import { error } from '@sveltejs/kit';
import {
	buildBundle,
	buildFiles,
	bundleFileName,
	createExportMeta,
	exportFileName,
	exportFormats,
	type ExportFile,
	type ExportFormat,
	type ExportMeta,
	type FabNotesWaiver,
	type SvgWindow
} from '$lib/formats';
import { buildArtwork } from '$lib/artwork';
import type { SizedDesign } from '$lib/rf';
import type { ExportKind } from '$lib/schemas/api';
import type { ExportDependencies } from './export-dependencies';
import type { ExportTarget } from './export-target';
import { assertReadBack, readBackFiles } from './read-back-gate';

export interface BuiltExport {
	kind: ExportKind;
	/** Name of the delivered file (the core's pattern). */
	fileName: string;
	contentType: string;
	/** The delivered bytes. */
	body: Uint8Array;
	/** Every file the delivery holds (for a zip: its entries, manifest included). */
	files: ExportFile[];
}

const contentTypes: Record<string, string> = {
	zip: 'application/zip',
	gbr: 'application/vnd.gerber',
	drl: 'text/plain; charset=utf-8',
	dxf: 'image/vnd.dxf',
	svg: 'image/svg+xml',
	json: 'application/json',
	txt: 'text/plain; charset=utf-8'
};

export function contentTypeOf(fileName: string): string {
	return contentTypes[fileName.split('.').pop() ?? ''] ?? 'application/octet-stream';
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

function isManifest(meta: ExportMeta, file: ExportFile): boolean {
	return file.name === exportFileName(meta, 'manifest', 'json');
}

/** Kinds whose delivery holds Gerber or drill files: these are read back before they are offered. */
const fabKinds: readonly ExportKind[] = ['bundle', 'gerber', 'drill'];

export interface BuildExportOptions {
	/** Waived design-rule violations, printed in the fab notes. */
	waiver?: FabNotesWaiver;
	deps?: ExportDependencies;
}

export async function buildExport(target: ExportTarget, kind: ExportKind, opts: BuildExportOptions = {}): Promise<BuiltExport> {
	const meta = exportMetaOf(target);
	// The sized design stored with the revision: what the revision is, whatever later engines compute.
	const sized = target.revision.results as SizedDesign;
	const formats: readonly ExportFormat[] = kind === 'bundle' ? exportFormats : [kind];
	const env = { ...(formats.includes('svg') ? { svgWindow: createSVGWindow() as unknown as SvgWindow } : {}), ...(opts.waiver ? { waiver: opts.waiver } : {}) };
	const written = buildFiles(sized, meta, formats, env);
	const files = opts.deps?.corruptFiles ? opts.deps.corruptFiles(written) : written;
	if (fabKinds.includes(kind)) {
		// The Gerber + drill set this delivery belongs to, so that a Gerber-only download is judged with its holes.
		const companions = kind === 'bundle' ? [] : buildFiles(sized, meta, ['gerber', 'drill']);
		const context = { designId: target.design.id, revisionId: target.revision.id, revision: target.revision.label, kind };
		assertReadBack(buildArtwork(sized), readBackFiles(files, companions), context, opts.deps?.logError);
	}

	if (kind === 'bundle') {
		return { kind, fileName: bundleFileName(meta), contentType: contentTypes.zip, body: await buildBundle(files, meta.revisionDate), files };
	}
	const own = files.filter((f) => !isManifest(meta, f));
	if (own.length === 0) error(404, `Revision ${meta.revisionLabel} has no ${kind} files (the design has nothing of that kind)`);
	if (own.length === 1) {
		const [file] = own;
		return { kind, fileName: file.name, contentType: contentTypeOf(file.name), body: file.bytes, files: [file] };
	}
	// Several files of one format (a Gerber per layer): one zip of them with their manifest.
	const name = exportFileName(meta, kind, 'zip');
	return { kind, fileName: name, contentType: contentTypes.zip, body: await buildBundle(files, meta.revisionDate), files };
}
