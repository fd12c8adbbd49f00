// The read-back self-check on an export's Gerber and drill files: every fab file delivered, plus the fab files
// it was written with, parsed as a board house would and compared with the artwork. A mismatch refuses the export.
import type { Artwork } from '$lib/artwork';
import type { ExportFile } from '$lib/formats';
import { checkReadBack, isFabFileName, type ReadBackResult } from '$lib/formats/readback';
import { refuseReadBack } from './refuse-read-back';

/**
 * `delivered` are the files about to be offered; `companions` the complete Gerber + drill set of the
 * same revision (a Gerber-only download is compared together with its drill file, and the other way
 * round). A delivered file always wins over its companion of the same name, so what is checked is
 * what is sent.
 */
export function readBackFiles(delivered: readonly ExportFile[], companions: readonly ExportFile[]): ExportFile[] {
	const fab = delivered.filter((f) => isFabFileName(f.name));
	const names = new Set(fab.map((f) => f.name));
	return [...fab, ...companions.filter((f) => isFabFileName(f.name) && !names.has(f.name))];
}

export function assertReadBack(artwork: Artwork, files: readonly ExportFile[], context: Record<string, string>, logError: (line: string) => void = console.error): ReadBackResult {
	const result = checkReadBack(artwork, files);
	if (!result.ok) refuseReadBack(result.mismatches, context, logError);
	return result;
}
