// GET /api/v1/designs/{designId}/revisions/{label}/sweep-plans: the revision's saved sweep plans (id, name, point count, plan).
import { json } from '@sveltejs/kit';
import { apiHandler } from '$lib/server/api/api-handler';
import { parseParams } from '$lib/server/api/parse-request';
import { getDb } from '$lib/server/db';
import { requireRevision } from '$lib/server/measurements/revision-access';
import { listSweepPlans } from '$lib/server/sweeps';
import { revisionParamsSchema } from '$lib/schemas/api';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = apiHandler(async ({ event, identity }) => {
	const { designId, label } = parseParams(revisionParamsSchema, event.params);
	const { revision } = await requireRevision(identity, designId, label, 'team.read');
	const plans = await listSweepPlans(getDb(), revision.id);
	return json({
		plans: plans.map((p) => ({ id: p.id, name: p.name, pointCount: p.pointCount, createdAt: p.createdAt.toISOString(), createdBy: p.createdByName, plan: p.plan }))
	});
});
