// GET /api/v1/designs/{designId}: the design with its revision history.
import { json } from '@sveltejs/kit';
import { authorize } from '$lib/server/access';
import { apiHandler } from '$lib/server/api/api-handler';
import { lookupDesign } from '$lib/server/designs/design-access';
import { getDesignWithRevisions } from '$lib/server/api/design-api';
import { parseParams } from '$lib/server/api/parse-request';
import { designParamsSchema } from '$lib/schemas/api';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = apiHandler(async ({ event, identity }) => {
	const { designId } = parseParams(designParamsSchema, event.params);
	const { design, role } = await lookupDesign(identity, designId);
	authorize(role, 'team.read', 'Design not found');
	return json(await getDesignWithRevisions(design!));
});
