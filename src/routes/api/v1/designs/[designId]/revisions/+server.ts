// POST /api/v1/designs/{designId}/revisions: a new revision from a parent (editors, owners); old revisions never change.
import { json } from '@sveltejs/kit';
import { authorize } from '$lib/server/access';
import { apiHandler } from '$lib/server/api/api-handler';
import { lookupDesign } from '$lib/server/designs/design-access';
import { createRevision } from '$lib/server/api/design-api';
import { parseJsonBody, parseParams } from '$lib/server/api/parse-request';
import { createRevisionBodySchema, designParamsSchema } from '$lib/schemas/api';
import type { RequestHandler } from './$types';

export const POST: RequestHandler = apiHandler(async ({ event, identity }) => {
	const { designId } = parseParams(designParamsSchema, event.params);
	const { design, role } = await lookupDesign(identity, designId);
	authorize(role, 'revision.create', 'Design not found');
	const body = await parseJsonBody(createRevisionBodySchema, event.request);
	return json(await createRevision(design!, identity.user.id, body), { status: 201 });
});
