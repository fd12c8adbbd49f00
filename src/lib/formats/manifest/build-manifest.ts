// The manifest: every file's name, size and SHA-256, as JSON, so a fab or a later audit can check the bundle.
import type { ExportMeta } from '../export-meta';
import { sha256Hex } from './sha256';

/** One output file: a name of our pattern and its bytes. */
export interface ExportFile {
	readonly name: string;
	readonly bytes: Uint8Array;
}

/** A file with its SHA-256 (lowercase hex), hashed once when it was written. */
export interface HashedFile extends ExportFile {
	readonly sha256: string;
}

/** Hashes each file once (in parallel: Web Crypto is asynchronous). */
export async function hashFiles(files: readonly ExportFile[]): Promise<HashedFile[]> {
	const hashes = await Promise.all(files.map((f) => sha256Hex(f.bytes)));
	return files.map((f, i) => ({ name: f.name, bytes: f.bytes, sha256: hashes[i] }));
}

export interface Manifest {
	readonly format: 'fringefield-manifest';
	readonly formatVersion: 1;
	readonly design: string;
	readonly revision: string;
	readonly revisionDate: string;
	readonly files: readonly { name: string; sizeBytes: number; sha256: string }[];
}

export function buildManifest(files: readonly HashedFile[], meta: ExportMeta): Manifest {
	return {
		format: 'fringefield-manifest',
		formatVersion: 1,
		design: meta.designSlug,
		revision: meta.revisionLabel,
		revisionDate: meta.revisionDate,
		files: files.map((f) => ({ name: f.name, sizeBytes: f.bytes.length, sha256: f.sha256 }))
	};
}

export function serializeManifest(manifest: Manifest): string {
	return JSON.stringify(manifest, null, 2) + '\n';
}
