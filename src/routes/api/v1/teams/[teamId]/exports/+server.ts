// GET /api/v1/teams/{teamId}/exports: the team's export log, filtered, sorted and paged.
import { json } from '@sveltejs/kit';
import { authorize } from '$lib/server/access';
import { roleInTeam } from '$lib/server/access/team-role';
import { apiHandler } from '$lib/server/api/api-handler';
import { parseParams, parseQuery } from '$lib/server/api/parse-request';
import { listExportLog } from '$lib/server/exports';
import { exportLogQuerySchema, teamParamsSchema } from '$lib/schemas/api';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = apiHandler(async ({ event, identity }) => {
	const { teamId } = parseParams(teamParamsSchema, event.params);
	authorize(await roleInTeam(identity, teamId), 'team.read', 'Team not found');
	const query = parseQuery(exportLogQuerySchema, event.url);
	return json(await listExportLog(teamId, query));
});
