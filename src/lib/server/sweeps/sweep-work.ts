// The heavy half of a sweep download, run on a worker thread: build the plan's sweep JSON once and keep it on
// disk (written to a temporary name, then renamed, so a reader never sees half a file).
import { randomBytes } from 'node:crypto';
import { mkdirSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';
import { buildSweepDocument, serializeSweep, type SweepPlan } from '../../formats/sweep';
import type { ExportMeta } from '../../formats/export-meta';
import type { DesignInputDocument } from '../../schemas';
import { sha256Hex } from '../../formats/manifest';

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

export async function writeSweepFile(job: SweepBuildInput): Promise<SweepFileFacts> {
	const doc = buildSweepDocument(job.input, job.plan, job.meta);
	// the text becomes UTF-8 bytes once; those same bytes are hashed (Web Crypto) and written
	const body = new TextEncoder().encode(serializeSweep(doc));
	const facts: SweepFileFacts = { fileName: job.fileName, sizeBytes: body.byteLength, sha256: await sha256Hex(body), pointCount: doc.pointCount };
	// the body first: facts on disk always describe a complete body
	writeFileAtomically(job.bodyPath, body);
	writeFileAtomically(job.factsPath, JSON.stringify(facts));
	return facts;
}
