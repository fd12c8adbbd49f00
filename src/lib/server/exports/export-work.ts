// The heavy half of a download, run on a worker thread (see ../work) as one task: the revision prepared once
// (sized design → artwork), the design-rule gate, the files written and hashed, the read-back, the zip.
// Plain data in and out; the task reports how many artworks it drew (one per download).
import { artworkBuildCount } from '$lib/artwork';
import { bundle, gate, holdsFabFiles, prepareSized, readBack, writeFiles, type PreparedDesign } from '$lib/design';
import type { Violation } from '$lib/drc';
import { bundleFileName, contentTypeOfFile, exportFileName, bundleFormatIds, hashFiles, sha256Hex, type ExportFile, type ExportMeta, type FabNotesWaiver, type FormatId, type HashedFile } from '$lib/formats';
import type { ReadBackMismatch } from '$lib/formats/readback';
import type { SizedDesign } from '$lib/rf';
import type { ExportKind } from '$lib/schemas/api';
import type { FabProfile } from '$lib/schemas/fab-profile';
import type { ExportedFile } from '../db/export-record.table';

/** The revision's artwork against its profile: every violation, in the rules' fixed order. */
export function checkRevisionArtwork(sized: SizedDesign, profile: FabProfile): Violation[] {
	return gate(prepareSized(sized), profile);
}

export interface ExportBuildInput {
	/** The sized design stored with the revision. */
	sized: SizedDesign;
	/** The fab profile the revision recorded: the gate's measure. */
	profile: FabProfile;
	meta: ExportMeta;
	kind: ExportKind;
	/** The reason given for exporting despite violations (ignored when the revision is clean). */
	waiverReason?: string;
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
			/** What the gate found (waived when not empty). */
			violations: Violation[];
			/** The waiver printed in the fab notes, if violations were waived. */
			waiver: string | null;
	  }
	/** The revision breaks its profile and no waiver was given: nothing was written. */
	| { outcome: 'refused'; violations: Violation[] }
	/** The format has nothing to deliver for this design (e.g. no holes: no drill file). */
	| { outcome: 'empty'; violations: Violation[] }
	/** The files did not read back as the artwork: a writer bug; nothing is delivered. */
	| { outcome: 'read-back-failed'; mismatches: ReadBackMismatch[] };

export interface ExportBuildReport {
	outcome: ExportBuildOutcome;
	/** Artworks drawn while this task ran (on its thread): the pipeline's promise is exactly one. */
	artworkBuilds: number;
}

const recorded = (files: readonly HashedFile[]): ExportedFile[] => files.map((f) => ({ name: f.name, sizeBytes: f.bytes.byteLength, sha256: f.sha256 }));

/**
 * One download: prepareSized → gate (violations without a waiver refuse) → writeFiles → readBack → bundle.
 * `corruptFiles` is the tests' hook between writing and the read-back (in-process runs only).
 */
export async function buildExportBytes(input: ExportBuildInput, corruptFiles?: (files: ExportFile[]) => ExportFile[]): Promise<ExportBuildReport> {
	const before = artworkBuildCount();
	const outcome = await buildPrepared(input, prepareSized(input.sized), corruptFiles);
	return { outcome, artworkBuilds: artworkBuildCount() - before };
}

async function buildPrepared(input: ExportBuildInput, prepared: PreparedDesign, corruptFiles?: (files: ExportFile[]) => ExportFile[]): Promise<ExportBuildOutcome> {
	const { meta, kind, profile } = input;
	const violations = gate(prepared, profile);
	if (violations.length > 0 && !input.waiverReason) return { outcome: 'refused', violations };
	const waiver = violations.length > 0 && input.waiverReason ? input.waiverReason : null;
	const notesWaiver: FabNotesWaiver | undefined = waiver ? { reason: waiver, profileName: profile.name, violations: violations.map((v) => v.message) } : undefined;
	const formats: readonly FormatId[] = kind === 'bundle' ? bundleFormatIds : [kind];
	const written = await writeFiles(prepared, formats, meta, { profile, ...(notesWaiver ? { waiver: notesWaiver } : {}) });
	// test hooks rewrite bytes on purpose: what they return is hashed again
	const files = corruptFiles ? await hashFiles(corruptFiles(written)) : written;
	if (holdsFabFiles(files)) {
		const result = readBack(files, prepared, meta);
		if (!result.ok) return { outcome: 'read-back-failed', mismatches: result.mismatches };
	}
	const zipped = async (fileName: string) => {
		const body = await bundle(files, meta);
		return { outcome: 'built' as const, fileName, contentType: contentTypeOfFile(fileName), body, files: recorded(files), sha256: await sha256Hex(body), violations, waiver };
	};
	if (kind === 'bundle') return zipped(bundleFileName(meta));
	const own = files.filter((f) => f.name !== exportFileName(meta, 'manifest', 'json'));
	if (own.length === 0) return { outcome: 'empty', violations };
	if (own.length === 1) {
		// every file was hashed once when it was written; a one-file delivery is that file
		const [file] = own;
		return { outcome: 'built', fileName: file.name, contentType: contentTypeOfFile(file.name), body: file.bytes, files: recorded([file]), sha256: file.sha256, violations, waiver };
	}
	// Several files of one format (a Gerber per layer): one zip of them with their manifest.
	return zipped(exportFileName(meta, kind, 'zip'));
}
