// One team: its members for every member to see; for owners also roles, removal, invitations and the name.
import { error } from '@sveltejs/kit';
import { authorize, can, CONFIRM_EMAIL_FIRST } from '$lib/server/access';
import { roleInTeam } from '$lib/server/access/team-role';
import * as accounts from '$lib/server/accounts';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ params, locals, url }) => {
	const user = accounts.requireUser(locals, url);
	const role = await roleInTeam(locals.identity, params.teamId);
	authorize(role, 'team.read', 'Team not found');
	const team = await accounts.findTeam(params.teamId);
	if (!team) error(404, 'Team not found');
	const canManage = can(role, 'team.manage');
	return {
		team: { id: team.id, name: team.name },
		myRole: role,
		myId: user.id,
		confirmNotice: user.emailVerified ? null : CONFIRM_EMAIL_FIRST['invite.send'],
		canManage,
		members: await accounts.listTeamMembers(team.id),
		invites: canManage ? await accounts.listPendingInvites(team.id) : []
	};
};

// Every change on this page needs team.manage; runTeamChange authorises, runs and answers each one the same way.
export const actions: Actions = {
	rename: (event) => accounts.runTeamChange(event, 'rename'),
	invite: (event) => accounts.runTeamChange(event, 'invite'),
	withdraw: (event) => accounts.runTeamChange(event, 'withdraw'),
	role: (event) => accounts.runTeamChange(event, 'role'),
	remove: (event) => accounts.runTeamChange(event, 'remove')
};
