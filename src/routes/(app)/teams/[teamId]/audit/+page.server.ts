// A team's security events, for those who may manage the team (owners); non-members get 404, others 403.
import { error } from '@sveltejs/kit';
import { authorize } from '$lib/server/access';
import { roleInTeam } from '$lib/server/access/team-role';
import { findTeam, requireUser } from '$lib/server/accounts';
import { AUDIT_PAGE_SIZE, listTeamAuditEvents } from '$lib/server/audit';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ params, locals, url }) => {
	requireUser(locals, url);
	authorize(await roleInTeam(locals.identity, params.teamId), 'team.manage', 'Team not found');
	const team = await findTeam(params.teamId);
	if (!team) error(404, 'Team not found');
	return { team: { id: team.id, name: team.name }, events: await listTeamAuditEvents(team.id), pageSize: AUDIT_PAGE_SIZE };
};
