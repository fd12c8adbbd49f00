// The heavy half of a sweep download, run on a worker thread: build the plan's sweep JSON once and keep it on
// disk (written to a temporary name, then renamed, so a reader never sees half a file).
import { createHash, randomBytes } from 'node:crypto';
import { closeSync, mkdirSync, openSync, renameSync, rmSync, writeFileSync, writeSync } from 'node:fs';
import { dirname } from 'node:path';
import { sweepCombinations, sweepTextPieces, type SweepPlan } from '../../formats/sweep';
import type { ExportMeta } from '../../formats/export-meta';
import type { DesignInputDocument } from '../../schemas';

export interface SweepBuildInput {
	input: DesignInputDocument;
	plan: SweepPlan;
	meta: ExportMeta;
	fileName: string;
	/** Where the bytes go, and where their description (SweepFileFacts as JSON) goes. */
	bodyPath: string;
	factsPath: string;
}

/** What is known of a cached sweep file without reading it. */
export interface SweepFileFacts {
	fileName: string;
	sizeBytes: number;
	sha256: string;
	pointCount: number;
}

/** Writes `bytes` to `path` atomically: a temporary file beside it, then a rename over it. */
export function writeFileAtomically(path: string, bytes: Uint8Array | string): void {
	mkdirSync(dirname(path), { recursive: true });
	const temp = `${path}.${randomBytes(6).toString('hex')}.tmp`;
	try {
		writeFileSync(temp, bytes);
		renameSync(temp, path);
	} catch (err) {
		rmSync(temp, { force: true });
		throw err;
	}
}

/**
 * Builds the plan's sweep one point at a time, writing and hashing each piece as it is made (the file is
 * `serializeSweep(buildSweepDocument(…))` byte for byte), so a 10 000-point plan never holds its whole text:
 * the hash is node's incremental SHA-256, since Web Crypto digests only whole buffers.
 */
export async function writeSweepFile(job: SweepBuildInput): Promise<SweepFileFacts> {
	mkdirSync(dirname(job.bodyPath), { recursive: true });
	const temp = `${job.bodyPath}.${randomBytes(6).toString('hex')}.tmp`;
	const hash = createHash('sha256');
	const encoder = new TextEncoder();
	let sizeBytes = 0;
	const fd = openSync(temp, 'w');
	try {
		for (const piece of sweepTextPieces(job.input, job.plan, job.meta)) {
			const bytes = encoder.encode(piece);
			hash.update(bytes);
			sizeBytes += bytes.byteLength;
			writeSync(fd, bytes);
		}
		closeSync(fd);
		// the body first: facts on disk always describe a complete body
		renameSync(temp, job.bodyPath);
	} catch (err) {
		try {
			closeSync(fd);
		} catch {
			// already closed
		}
		rmSync(temp, { force: true });
		throw err;
	}
	const facts: SweepFileFacts = { fileName: job.fileName, sizeBytes, sha256: hash.digest('hex'), pointCount: sweepCombinations(job.plan).length };
	writeFileAtomically(job.factsPath, JSON.stringify(facts));
	return facts;
}
