// GET /api/v1/simulations/{id}: a field check's status and progress, and its result once it succeeded.
import { json } from '@sveltejs/kit';
import { apiHandler } from '$lib/server/api/api-handler';
import { getFieldCheckStatus } from '$lib/server/api/field-check-api';
import { parseParams } from '$lib/server/api/parse-request';
import { fieldCheckParamsSchema } from '$lib/schemas/api';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = apiHandler(async ({ event, identity }) => {
	const { id } = parseParams(fieldCheckParamsSchema, event.params);
	return json(await getFieldCheckStatus(identity, id), { headers: { 'cache-control': 'private, no-store' } });
});
