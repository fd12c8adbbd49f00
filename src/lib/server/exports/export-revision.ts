// One download: build the revision's bytes, hash every file and the delivery, write exactly one export record.
import type { ExportKind } from '$lib/schemas/api';
import type { ExportedFile, ExportVia } from '../db/export-record.table';
import { buildExport } from './build-export';
import type { ExportTarget } from './export-target';
import { recordExport } from './record-export';
import { sha256Hex } from './sha256';

export interface DeliveredExport {
	exportId: string;
	kind: ExportKind;
	fileName: string;
	contentType: string;
	body: Uint8Array;
	sha256: string;
	files: ExportedFile[];
}

export async function exportRevision(target: ExportTarget, kind: ExportKind, by: { userId: string; via: ExportVia }): Promise<DeliveredExport> {
	const built = await buildExport(target, kind);
	const files = built.files.map((f) => ({ name: f.name, sizeBytes: f.bytes.byteLength, sha256: sha256Hex(f.bytes) }));
	const sha256 = sha256Hex(built.body);
	const record = await recordExport({ target, userId: by.userId, via: by.via, kind, files, sha256 });
	return { exportId: record.id, kind, fileName: built.fileName, contentType: built.contentType, body: built.body, sha256, files };
}
