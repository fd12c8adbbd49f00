// Files → one zip with jszip: fixed order, a fixed date on every entry, no folder entries, so the bytes repeat.
import JSZip from 'jszip';
import type { ExportFile } from '../manifest';

/**
 * Zips the files in the order given. Every entry carries `date` (the revision date, midnight UTC)
 * and jszip's implicit folders are off, since those entries would carry the clock.
 */
export async function buildBundle(files: readonly ExportFile[], revisionDate: string): Promise<Uint8Array> {
	const [y, m, d] = revisionDate.split('-').map(Number);
	// jszip writes DOS date/time from the UTC getters, so midnight UTC is the same in every time zone
	const date = new Date(Date.UTC(y, m - 1, d, 0, 0, 0));
	const zip = new JSZip();
	for (const f of files) zip.file(f.name, f.bytes, { date, createFolders: false, binary: true });
	return zip.generateAsync({ type: 'uint8array', compression: 'DEFLATE', compressionOptions: { level: 6 }, platform: 'DOS' });
}
