// One sweep download: the plan's sweep JSON built by formats/sweep from the revision, hashed, and recorded as a 'sweep-plan' export naming the plan.
import { buildSweepDocument, serializeSweep } from '../../formats/sweep';
import { createExportMeta, toSlug } from '../../formats/export-meta';
import type { ExportVia } from '../db/export-record.table';
import type { Design, Revision } from '../designs/design-model';
import { recordExport } from '../exports/record-export';
import { sha256Hex } from '../../formats/manifest';
import type { SavedSweepPlan } from './sweep-plan-model';

export interface DeliveredSweep {
	exportId: string;
	fileName: string;
	body: Uint8Array;
	sha256: string;
	pointCount: number;
}

/** "Lower εr band / 2" → "lower-r-band-2": the plan's part of the file name. */
const planSlug = (name: string): string => toSlug(name, 40, 'plan');

/** The bytes only (no record): the same plan on the same revision always gives the same bytes. */
export function buildSweepFile(design: Design, revision: Revision, plan: SavedSweepPlan): { fileName: string; body: Uint8Array; pointCount: number } {
	const meta = { ...createExportMeta({ designName: design.name, revisionLabel: revision.label, revisionDate: revision.createdAt.toISOString().slice(0, 10) }), designSlug: design.slug };
	const doc = buildSweepDocument(revision.input, plan.plan, meta);
	const body = new TextEncoder().encode(serializeSweep(doc));
	return { fileName: `${meta.designSlug}-${meta.revisionLabel}.sweep-${planSlug(plan.name)}.sweep.json`, body, pointCount: doc.pointCount };
}

export async function exportSweepPlan(
	opts: { design: Design; revision: Revision; plan: SavedSweepPlan; userId: string; via: ExportVia }
): Promise<DeliveredSweep> {
	const built = buildSweepFile(opts.design, opts.revision, opts.plan);
	const sha256 = await sha256Hex(built.body);
	const record = await recordExport({
		target: { design: opts.design, revision: opts.revision },
		userId: opts.userId,
		via: opts.via,
		kind: 'sweep-plan',
		sweepPlanId: opts.plan.id,
		files: [{ name: built.fileName, sizeBytes: built.body.byteLength, sha256 }],
		sha256
	});
	return { exportId: record.id, fileName: built.fileName, body: built.body, sha256, pointCount: built.pointCount };
}

/** The download as an HTTP answer (never cached: each download is recorded). */
export function sweepResponse(d: DeliveredSweep, disposition: 'attachment' | 'inline' = 'attachment'): Response {
	return new Response(d.body as Uint8Array<ArrayBuffer>, {
		status: 200,
		headers: {
			'content-type': 'application/json',
			'content-length': String(d.body.byteLength),
			'content-disposition': `${disposition}; filename="${d.fileName.replace(/["\\\r\n]/g, '_')}"`,
			'cache-control': 'private, no-store',
			'x-content-sha256': d.sha256,
			'x-export-id': d.exportId,
			'x-sweep-point-count': String(d.pointCount)
		}
	});
}
