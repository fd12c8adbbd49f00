// The manifest: every file's name, size and SHA-256, as JSON, so a fab or a later audit can check the bundle.
import type { ExportMeta } from '../export-meta';
import { sha256Hex } from './sha256';

/** One output file: a name of our pattern and its bytes. */
export interface ExportFile {
	readonly name: string;
	readonly bytes: Uint8Array;
}

export interface Manifest {
	readonly format: 'fringefield-manifest';
	readonly formatVersion: 1;
	readonly design: string;
	readonly revision: string;
	readonly revisionDate: string;
	readonly files: readonly { name: string; sizeBytes: number; sha256: string }[];
}

export function buildManifest(files: readonly ExportFile[], meta: ExportMeta): Manifest {
	return {
		format: 'fringefield-manifest',
		formatVersion: 1,
		design: meta.designSlug,
		revision: meta.revisionLabel,
		revisionDate: meta.revisionDate,
		files: files.map((f) => ({ name: f.name, sizeBytes: f.bytes.length, sha256: sha256Hex(f.bytes) }))
	};
}

export function serializeManifest(manifest: Manifest): string {
	return JSON.stringify(manifest, null, 2) + '\n';
}
