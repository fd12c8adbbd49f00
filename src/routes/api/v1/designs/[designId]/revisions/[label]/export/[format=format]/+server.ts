// GET /api/v1/designs/{designId}/revisions/{label}/export/{format}: one format or the bundle, recorded with via 'api'.
import { apiHandler } from '$lib/server/api/api-handler';
import { parseParams } from '$lib/server/api/parse-request';
import { downloadResponse, exportForRequest } from '$lib/server/exports';
import { exportParamsSchema } from '$lib/schemas/api';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = apiHandler(async ({ event, identity }) => {
	const { designId, label, format } = parseParams(exportParamsSchema, event.params);
	return downloadResponse(await exportForRequest(identity, { designId, label, kind: format }, 'api'));
});
