// The heavy half of a download, run on a worker thread (see ../work): the design-rule check of a revision's
// artwork, and building a delivery's bytes (files, read-back self-check, zip, hashes). Plain data in and out.
import { createSVGWindow } from 'svgdom';
import { buildArtwork } from '$lib/artwork';
import { checkArtwork, type Violation } from '$lib/drc';
import { buildBundle, buildFiles, bundleFileName, exportFileName, exportFormats, type ExportFile, type ExportFormat, type ExportMeta, type FabNotesWaiver, type SvgWindow } from '$lib/formats';
import { checkReadBack, type ReadBackMismatch } from '$lib/formats/readback';
import type { SizedDesign } from '$lib/rf';
import type { ExportKind } from '$lib/schemas/api';
import type { FabProfile } from '$lib/schemas/fab-profile';
import type { ExportedFile } from '../db/export-record.table';
import { contentTypeOf, ZIP_CONTENT_TYPE } from './content-type';
import { readBackFiles } from './read-back-gate';
import { sha256Hex } from './sha256';

/** The revision's artwork against its profile: every violation, in the rules' fixed order. */
export function checkRevisionArtwork(sized: SizedDesign, profile: FabProfile): Violation[] {
	return checkArtwork(buildArtwork(sized), profile);
}

export interface ExportBuildInput {
	/** The sized design stored with the revision. */
	sized: SizedDesign;
	meta: ExportMeta;
	kind: ExportKind;
	/** The fab profile the revision recorded (its gate's): named in the fab notes with its figures. */
	profile: FabProfile;
	/** Waived design-rule violations, printed in the fab notes. */
	waiver?: FabNotesWaiver;
}

export type ExportBuildOutcome =
	| {
			outcome: 'built';
			fileName: string;
			contentType: string;
			body: Uint8Array;
			/** Every file the delivery holds (for a zip: its entries, manifest included), with their hashes. */
			files: ExportedFile[];
			sha256: string;
	  }
	/** The format has nothing to deliver for this design (e.g. no holes: no drill file). */
	| { outcome: 'empty' }
	/** The files did not read back as the artwork: a writer bug; nothing is delivered. */
	| { outcome: 'read-back-failed'; mismatches: ReadBackMismatch[] };

/** Kinds whose delivery holds Gerber or drill files: these are read back before they are offered. */
const fabKinds: readonly ExportKind[] = ['bundle', 'gerber', 'drill'];

const hashed = (files: readonly ExportFile[]): ExportedFile[] => files.map((f) => ({ name: f.name, sizeBytes: f.bytes.byteLength, sha256: sha256Hex(f.bytes) }));

/**
 * Builds one delivery: the bundle zip, one format's single file, or a zip of a format's several files.
 * `corruptFiles` is the tests' hook between writing and the read-back (in-process runs only).
 */
export async function buildExportBytes(input: ExportBuildInput, corruptFiles?: (files: ExportFile[]) => ExportFile[]): Promise<ExportBuildOutcome> {
	const { sized, meta, kind } = input;
	const formats: readonly ExportFormat[] = kind === 'bundle' ? exportFormats : [kind];
	const env = { ...(formats.includes('svg') ? { svgWindow: createSVGWindow() as unknown as SvgWindow } : {}), profile: input.profile, ...(input.waiver ? { waiver: input.waiver } : {}) };
	const written = buildFiles(sized, meta, formats, env);
	const files = corruptFiles ? corruptFiles(written) : written;
	if (fabKinds.includes(kind)) {
		// The Gerber + drill set this delivery belongs to, so that a Gerber-only download is judged with its holes.
		const companions = kind === 'bundle' ? [] : buildFiles(sized, meta, ['gerber', 'drill']);
		const result = checkReadBack(buildArtwork(sized), readBackFiles(files, companions));
		if (!result.ok) return { outcome: 'read-back-failed', mismatches: result.mismatches };
	}
	if (kind === 'bundle') {
		const body = await buildBundle(files, meta.revisionDate);
		return { outcome: 'built', fileName: bundleFileName(meta), contentType: ZIP_CONTENT_TYPE, body, files: hashed(files), sha256: sha256Hex(body) };
	}
	const own = files.filter((f) => f.name !== exportFileName(meta, 'manifest', 'json'));
	if (own.length === 0) return { outcome: 'empty' };
	if (own.length === 1) {
		const [file] = own;
		return { outcome: 'built', fileName: file.name, contentType: contentTypeOf(file.name), body: file.bytes, files: hashed([file]), sha256: sha256Hex(file.bytes) };
	}
	// Several files of one format (a Gerber per layer): one zip of them with their manifest.
	const body = await buildBundle(files, meta.revisionDate);
	return { outcome: 'built', fileName: exportFileName(meta, kind, 'zip'), contentType: ZIP_CONTENT_TYPE, body, files: hashed(files), sha256: sha256Hex(body) };
}
