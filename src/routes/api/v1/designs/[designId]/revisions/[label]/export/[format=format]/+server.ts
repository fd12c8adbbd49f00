// GET /api/v1/designs/{designId}/revisions/{label}/export/{format}: one format or the bundle, recorded with via 'api'.
// A design that breaks its fab profile answers 422 with { error, profile, violations }; POST { "waiver": "reason" }
// exports it anyway (editors and owners; 403 for viewers) and records the waiver. A failed read-back is 500 with a supportId.
import { json } from '@sveltejs/kit';
import { apiHandler } from '$lib/server/api/api-handler';
import { parseJsonBody, parseParams } from '$lib/server/api/parse-request';
import { downloadResponse, exportForRequest, readBackSupportIdOf, refusalOf, refuseCrossSiteDownload } from '$lib/server/exports';
import { exportParamsSchema, waiverBodySchema } from '$lib/schemas/api';
import type { RequestHandler } from './$types';

async function answer(run: () => ReturnType<typeof exportForRequest>): Promise<Response> {
	try {
		return downloadResponse(await run());
	} catch (err) {
		const refusal = refusalOf(err);
		if (refusal) return json({ error: refusal.message, profile: refusal.profile, violations: refusal.violations, issues: [] }, { status: 422 });
		const supportId = readBackSupportIdOf(err);
		if (supportId) return json({ error: (err as { body: { message: string } }).body.message, supportId, issues: [] }, { status: 500 });
		throw err;
	}
}

export const GET: RequestHandler = apiHandler(async ({ event, identity }) => {
	refuseCrossSiteDownload(event.request, identity);
	const { designId, label, format } = parseParams(exportParamsSchema, event.params);
	return answer(() => exportForRequest(identity, { designId, label, kind: format }, 'api'));
});

export const POST: RequestHandler = apiHandler(async ({ event, identity }) => {
	const { designId, label, format } = parseParams(exportParamsSchema, event.params);
	const { waiver } = await parseJsonBody(waiverBodySchema, event.request);
	return answer(() => exportForRequest(identity, { designId, label, kind: format }, 'api', { waiver }));
});
