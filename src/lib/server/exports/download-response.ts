// A delivered export as an HTTP answer: the bytes, their sha256 and the export id in headers; never cached (each download is recorded).
import type { DeliveredExport } from './export-revision';

export function downloadResponse(d: DeliveredExport, disposition: 'attachment' | 'inline' = 'attachment'): Response {
	const name = d.fileName.replace(/["\\\r\n]/g, '_');
	return new Response(d.body as Uint8Array<ArrayBuffer>, {
		status: 200,
		headers: {
			'content-type': d.contentType,
			'content-length': String(d.body.byteLength),
			'content-disposition': `${disposition}; filename="${name}"`,
			'cache-control': 'private, no-store',
			'x-content-sha256': d.sha256,
			'x-export-id': d.exportId
		}
	});
}
