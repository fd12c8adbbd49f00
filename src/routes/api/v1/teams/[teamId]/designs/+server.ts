// GET: a team's designs (members); POST: create a design with revision A (editors, owners).
import { json } from '@sveltejs/kit';
import { authorize } from '$lib/server/access';
import { roleInTeam } from '$lib/server/access/team-role';
import { apiHandler } from '$lib/server/api/api-handler';
import { parseJsonBody, parseParams } from '$lib/server/api/parse-request';
import { createTeamDesign, listTeamDesigns } from '$lib/server/api/team-api';
import { createDesignBodySchema, teamParamsSchema } from '$lib/schemas/api';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = apiHandler(async ({ event, identity }) => {
	const { teamId } = parseParams(teamParamsSchema, event.params);
	authorize(await roleInTeam(identity, teamId), 'team.read', 'Team not found');
	return json(await listTeamDesigns(teamId));
});

export const POST: RequestHandler = apiHandler(async ({ event, identity }) => {
	const { teamId } = parseParams(teamParamsSchema, event.params);
	authorize(await roleInTeam(identity, teamId), 'design.create', 'Team not found');
	const body = await parseJsonBody(createDesignBodySchema, event.request);
	return json(await createTeamDesign(teamId, identity.user.id, body), { status: 201 });
});
