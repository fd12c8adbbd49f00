// GET …/sweeps/{planId}/export: the plan's sweep JSON as a download from the page, recorded as a 'sweep-plan' export (with the plan id) via 'ui'.
import { error } from '@sveltejs/kit';
import { getDb } from '$lib/server/db';
import { requireRevision } from '$lib/server/measurements/revision-access';
import { exportSweepPlan, findSweepPlan, sweepResponse } from '$lib/server/sweeps';
import { refuseCrossSiteDownload } from '$lib/server/exports';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async ({ locals, params, request }) => {
	refuseCrossSiteDownload(request, locals.identity);
	const { design, revision } = await requireRevision(locals.identity, params.designId, params.label, 'export.download');
	const plan = await findSweepPlan(getDb(), revision.id, params.planId);
	if (!plan) error(404, 'Sweep plan not found');
	return sweepResponse(await exportSweepPlan({ design, revision, plan, userId: locals.user!.id, via: 'ui' }));
};
