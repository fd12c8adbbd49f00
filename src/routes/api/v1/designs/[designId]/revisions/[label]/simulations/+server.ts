// /api/v1/designs/{designId}/revisions/{label}/simulations: GET the revision's field checks; POST starts one (or Homing) — 202.
import { json } from '@sveltejs/kit';
import { apiHandler } from '$lib/server/api/api-handler';
import { listRevisionFieldChecks, startRevisionFieldCheck } from '$lib/server/api/field-check-api';
import { parseJsonBody, parseParams } from '$lib/server/api/parse-request';
import { revisionParamsSchema, startFieldCheckBodySchema } from '$lib/schemas/api';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = apiHandler(async ({ event, identity }) => {
	const { designId, label } = parseParams(revisionParamsSchema, event.params);
	return json(await listRevisionFieldChecks(identity, designId, label));
});

export const POST: RequestHandler = apiHandler(async ({ event, identity }) => {
	const { designId, label } = parseParams(revisionParamsSchema, event.params);
	const body = await parseJsonBody(startFieldCheckBodySchema, event.request);
	return startRevisionFieldCheck(identity, designId, label, body);
});
