// One sweep download: the plan's sweep JSON (built once per plan and revision, kept on disk: see sweep-cache.ts),
// recorded as a 'sweep-plan' export naming the plan, and streamed from the file.
import { createReadStream } from 'node:fs';
import { Readable } from 'node:stream';
import type { ExportVia } from '../db/export-record.table';
import type { Design, Revision } from '../designs/design-model';
import { recordExport } from '../exports/record-export';
import { sweepFileFor } from './sweep-cache';
import type { SavedSweepPlan } from './sweep-plan-model';

export interface DeliveredSweep {
	exportId: string;
	fileName: string;
	/** The complete bytes on disk (never rewritten while they are read). */
	path: string;
	sizeBytes: number;
	sha256: string;
	pointCount: number;
}

export async function exportSweepPlan(opts: { design: Design; revision: Revision; plan: SavedSweepPlan; userId: string; via: ExportVia }): Promise<DeliveredSweep> {
	const file = await sweepFileFor(opts.design, opts.revision, opts.plan);
	const record = await recordExport({
		target: { design: opts.design, revision: opts.revision },
		userId: opts.userId,
		via: opts.via,
		kind: 'sweep-plan',
		sweepPlanId: opts.plan.id,
		files: [{ name: file.fileName, sizeBytes: file.sizeBytes, sha256: file.sha256 }],
		sha256: file.sha256,
		sizeBytes: file.sizeBytes
	});
	return { exportId: record.id, fileName: file.fileName, path: file.path, sizeBytes: file.sizeBytes, sha256: file.sha256, pointCount: file.pointCount };
}

/** The download as an HTTP answer, streamed from disk (never cached by the browser: each download is recorded). */
export function sweepResponse(d: DeliveredSweep, disposition: 'attachment' | 'inline' = 'attachment'): Response {
	const body = Readable.toWeb(createReadStream(d.path)) as unknown as ReadableStream<Uint8Array>;
	return new Response(body, {
		status: 200,
		headers: {
			'content-type': 'application/json',
			'content-length': String(d.sizeBytes),
			'content-disposition': `${disposition}; filename="${d.fileName.replace(/["\\\r\n]/g, '_')}"`,
			'cache-control': 'private, no-store',
			'x-content-sha256': d.sha256,
			'x-export-id': d.exportId,
			'x-sweep-point-count': String(d.pointCount)
		}
	});
}
