// GET /api/v1/designs/{designId}/revisions/{label}/sweep: the revision's sweep definition (JSON), recorded as a 'sweep' export via 'api'.
import { apiHandler } from '$lib/server/api/api-handler';
import { parseParams } from '$lib/server/api/parse-request';
import { downloadResponse, exportForRequest, refuseCrossSiteDownload } from '$lib/server/exports';
import { revisionParamsSchema } from '$lib/schemas/api';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = apiHandler(async ({ event, identity }) => {
	refuseCrossSiteDownload(event.request, identity);
	const { designId, label } = parseParams(revisionParamsSchema, event.params);
	return downloadResponse(await exportForRequest(identity, { designId, label, kind: 'sweep' }, 'api'), 'inline');
});
