// POST /api/v1/simulations/{id}/cancel: cancel a queued or running field check (editors, owners).
import { apiHandler } from '$lib/server/api/api-handler';
import { cancelFieldCheckForRequest } from '$lib/server/api/field-check-api';
import { parseParams } from '$lib/server/api/parse-request';
import { fieldCheckParamsSchema } from '$lib/schemas/api';
import type { RequestHandler } from './$types';

export const POST: RequestHandler = apiHandler(async ({ event, identity }) => {
	const { id } = parseParams(fieldCheckParamsSchema, event.params);
	return cancelFieldCheckForRequest(identity, id);
});
