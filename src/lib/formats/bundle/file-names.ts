// Our file-name pattern: <design slug>-<revision label>.<part>.<extension>, e.g. "sunroof-gnss-B.copper-top.gbr".
import type { ExportMeta } from '../export-meta';

export function exportFileName(meta: ExportMeta, part: string, extension: string): string {
	return `${meta.designSlug}-${meta.revisionLabel}.${part}.${extension}`;
}

/** Name of the zip that holds a revision's files. */
export function bundleFileName(meta: ExportMeta): string {
	return `${meta.designSlug}-${meta.revisionLabel}.zip`;
}
