// GET /api/v1/designs/{designId}/revisions/{label}: one revision's input document and results.
import { json } from '@sveltejs/kit';
import { authorize } from '$lib/server/access';
import { apiHandler } from '$lib/server/api/api-handler';
import { lookupDesign } from '$lib/server/designs/design-access';
import { getRevision } from '$lib/server/api/design-api';
import { parseParams } from '$lib/server/api/parse-request';
import { revisionParamsSchema } from '$lib/schemas/api';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = apiHandler(async ({ event, identity }) => {
	const { designId, label } = parseParams(revisionParamsSchema, event.params);
	const { design, role } = await lookupDesign(identity, designId);
	authorize(role, 'team.read', 'Design not found');
	return json(await getRevision(design!, label));
});
