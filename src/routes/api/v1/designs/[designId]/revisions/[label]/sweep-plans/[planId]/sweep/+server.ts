// GET /api/v1/designs/{designId}/revisions/{label}/sweep-plans/{planId}/sweep: the plan's sweep JSON, recorded as a 'sweep-plan' export (with the plan id) via 'api'.
import { error } from '@sveltejs/kit';
import { apiHandler } from '$lib/server/api/api-handler';
import { parseParams } from '$lib/server/api/parse-request';
import { getDb } from '$lib/server/db';
import { requireRevision } from '$lib/server/measurements/revision-access';
import { exportSweepPlan, findSweepPlan, sweepResponse } from '$lib/server/sweeps';
import { refuseCrossSiteDownload } from '$lib/server/exports';
import { revisionParamsSchema } from '$lib/schemas/api';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = apiHandler(async ({ event, identity }) => {
	refuseCrossSiteDownload(event.request, identity);
	const { designId, label } = parseParams(revisionParamsSchema, event.params);
	const { design, revision } = await requireRevision(identity, designId, label, 'export.download');
	const plan = await findSweepPlan(getDb(), revision.id, event.params.planId);
	if (!plan) error(404, 'Sweep plan not found');
	return sweepResponse(await exportSweepPlan({ design, revision, plan, userId: identity.user.id, via: 'api' }), 'inline');
});
