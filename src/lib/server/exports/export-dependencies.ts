// What an export may be given besides the revision: a waiver, and test-only hooks. Production passes none of the hooks.
import type { ExportFile } from '$lib/formats';

export interface ExportDependencies {
	/**
	 * TEST ONLY: rewrites the files after they are written and before the read-back check, to prove
	 * that a corrupted writer output is caught and refused. Never set outside tests.
	 */
	readonly corruptFiles?: (files: ExportFile[]) => ExportFile[];
	/** Where a read-back failure is logged (default console.error); tests capture it. */
	readonly logError?: (line: string) => void;
}

export interface ExportOptions {
	/** The reason an editor gave for exporting despite violations; null or absent for none. */
	readonly waiver?: string | null;
	readonly deps?: ExportDependencies;
}
