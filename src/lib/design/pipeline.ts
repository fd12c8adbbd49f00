// The one design pipeline: prepare → gate → writeFiles → readBack → bundle. The artwork is built here, once per
// request, and handed along; the server, the CLI, the browser preview and the bench all call these steps and no
// other module chains the artwork builder and a writer (scripts/eslint.config.js checks it).
import { buildArtwork, stampLegend } from '../artwork';
import { checkArtwork, type Violation } from '../drc';
import { buildBundle } from '../formats/bundle';
import { exportFileName } from '../formats/bundle/file-names';
import type { ExportMeta } from '../formats/export-meta';
import type { FabNotesWaiver } from '../formats/fab-notes';
import { formatEntry, type PreparedDesign } from '../formats/registry';
import { writeOrder, type FormatId } from '../formats/format-ids';
import { buildManifest, hashFiles, serializeManifest, type ExportFile, type HashedFile } from '../formats/manifest';
import { checkReadBack, isFabFileName, type ReadBackResult } from '../formats/readback';
import { size, type SizedDesign } from '../rf';
import { parseDesignInput, type DesignInput } from '../schemas';
import type { FabProfile } from '../schemas/fab-profile';
import { canonicalJson } from './canonical-json';

export type { PreparedDesign };

/** Sizes a validated design input and draws its artwork: the one place a design's artwork is built. */
export function prepare(input: DesignInput): PreparedDesign {
	const sized = size(input);
	return { input: sized.input, sized, artwork: buildArtwork(sized) };
}

/**
 * A stored sized design (a revision's results) ready for the writers. The stored values are what the
 * revision is; when today's sizing of its input gives exactly those values, that fresh object is used
 * (the same numbers in the code's key order, so the one-point sweep reuses this artwork too).
 */
export function prepareSized(stored: SizedDesign): PreparedDesign {
	let sized = stored;
	try {
		// the stored input is parsed here (this is where a stored revision enters the pipeline): in code key order, and
		// an input stored with another feed's option objects compares by what it means
		const input = parseDesignInput(stored.input);
		const fresh = size(input);
		if (canonicalJson(fresh) === canonicalJson({ ...stored, input })) sized = fresh;
	} catch {
		// a revision today's rules refuse keeps its stored results
	}
	return { input: sized.input, sized, artwork: buildArtwork(sized) };
}

/**
 * The prepared design as its files draw it: a legend's revision slot filled with this export's revision label and
 * date (never the clock). The check saw the slot's box, and the stamp stays inside it. Without a legend the same
 * object comes back, so designs without one write exactly what they wrote before.
 */
export function stamped(prepared: PreparedDesign, meta: ExportMeta): PreparedDesign {
	const artwork = stampLegend(prepared.artwork, meta);
	return artwork === prepared.artwork ? prepared : { ...prepared, artwork };
}

/** The design-rule check of the prepared artwork against a fab profile. */
export function gate(prepared: PreparedDesign, profile: FabProfile): Violation[] {
	return checkArtwork(prepared.artwork, profile);
}

export interface WriteOptions {
	/** Waived design-rule violations, printed in the fab notes (none: the notes are as without a waiver). */
	readonly waiver?: FabNotesWaiver;
	/** The fab profile the design was checked against, named in the fab notes (none: the built-in that can build the stack). */
	readonly profile?: FabProfile;
}

/**
 * The chosen formats' files in the write order (the fab notes last; formats that do not apply to the artwork write
 * nothing), each hashed once, with the manifest last.
 */
export async function writeFiles(unstamped: PreparedDesign, formats: readonly FormatId[], meta: ExportMeta, options: WriteOptions = {}): Promise<HashedFile[]> {
	const prepared = stamped(unstamped, meta);
	const manifestName = exportFileName(meta, 'manifest', 'json');
	const files: ExportFile[] = [];
	for (const format of writeOrder.map(formatEntry)) {
		if (!formats.includes(format.id) || !format.appliesTo(prepared.artwork)) continue;
		const context = { earlierFileNames: files.map((f) => f.name), manifestName, ...(options.waiver ? { waiver: options.waiver } : {}), ...(options.profile ? { profile: options.profile } : {}) };
		for (const file of format.write(prepared, meta, context)) files.push(file);
	}
	const hashed = await hashFiles(files);
	const [manifest] = await hashFiles([{ name: manifestName, bytes: new TextEncoder().encode(serializeManifest(buildManifest(hashed, meta))) }]);
	return [...hashed, manifest];
}

/**
 * Reads every Gerber and drill file of `files` back and compares it with the prepared artwork. A delivery
 * holding only some of them (a Gerber-only download) is judged with the rest of its Gerber + drill set,
 * written from the same artwork; a delivered file always wins over its twin, so what is checked is what is sent.
 */
export function readBack(files: readonly ExportFile[], unstamped: PreparedDesign, meta: ExportMeta): ReadBackResult {
	const prepared = stamped(unstamped, meta);
	const fab = files.filter((f) => isFabFileName(f.name));
	const names = new Set(fab.map((f) => f.name));
	const fabFormats = [formatEntry('gerber'), formatEntry('drill')].filter((f) => f.appliesTo(prepared.artwork));
	const missing = fabFormats.some((f) => !fab.some((file) => file.name.endsWith(`.${f.extension}`)));
	const context = { earlierFileNames: [], manifestName: exportFileName(meta, 'manifest', 'json') };
	const companions = missing ? fabFormats.flatMap((f) => f.write(prepared, meta, context)).filter((f) => !names.has(f.name)) : [];
	return checkReadBack(prepared.artwork, [...fab, ...companions]);
}

/** True when any of the files is a Gerber or drill file (those are read back before they are offered). */
export function holdsFabFiles(files: readonly ExportFile[]): boolean {
	return files.some((f) => isFabFileName(f.name));
}

/** The files as one zip: fixed order, the revision date on every entry. */
export function bundle(files: readonly ExportFile[], meta: ExportMeta): Promise<Uint8Array> {
	return buildBundle(files, meta.revisionDate);
}
