// Stores an uploaded Touchstone file with the revision it measures — only after it has been read and analysed in full.
import { createHash, randomUUID } from 'node:crypto';
import type { Kysely } from 'kysely';
import type { Database } from '../db/database';
import * as measurementQueries from '../db/measurement.queries';
import { readTouchstoneUpload } from './read-upload';

export interface UploadMeasurementOptions {
	revisionId: string;
	userId: string;
	fileName: string;
	bytes: Uint8Array;
}

/** Throws InputError (TouchstoneError for a malformed file) before writing anything. Returns the new id. */
export async function uploadMeasurement(db: Kysely<Database>, opts: UploadMeasurementOptions): Promise<{ id: string }> {
	const { text, samples, summary, trace } = readTouchstoneUpload(opts.fileName, opts.bytes);
	const id = randomUUID();
	await measurementQueries.insertMeasurement(db, {
		id,
		revision_id: opts.revisionId,
		file_name: opts.fileName.trim(),
		file_sha256: createHash('sha256').update(opts.bytes).digest('hex'),
		touchstone: text,
		points: JSON.stringify(samples),
		summary: JSON.stringify(summary),
		trace: JSON.stringify(trace),
		uploaded_by: opts.userId
	});
	return { id };
}
