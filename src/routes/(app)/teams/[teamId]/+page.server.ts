// One team: its members for every member to see; for owners also roles, removal, invitations and the name.
import { error, redirect } from '@sveltejs/kit';
import { authorize, can, CONFIRM_EMAIL_FIRST } from '$lib/server/access';
import { roleInTeam } from '$lib/server/access/team-role';
import * as accounts from '$lib/server/accounts';
import type { Actions, PageServerLoad, RequestEvent } from './$types';

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

/** Every change on this page needs team.manage; non-members get 404, other members 403. */
async function asOwner(event: RequestEvent) {
	const user = accounts.requireSessionUser(event.locals, event.url);
	authorize(await roleInTeam(event.locals.identity, event.params.teamId), 'team.manage', 'Team not found');
	return { user, teamId: event.params.teamId, values: await accounts.formFields(event.request) };
}

export const actions: Actions = {
	rename: async (event) => {
		const { teamId, values } = await asOwner(event);
		try {
			await accounts.renameTeam(teamId, { name: values.name });
		} catch (err) {
			return accounts.formFailure(err, 'rename', values);
		}
		return { form: 'rename', done: 'Team renamed.' };
	},
	invite: async (event) => {
		const { user, teamId, values } = await asOwner(event);
		try {
			await accounts.inviteToTeam(teamId, user.id, { email: values.email, role: values.role });
		} catch (err) {
			return accounts.formFailure(err, 'invite', values);
		}
		return { form: 'invite', done: `Invitation sent to ${values.email.trim().toLowerCase()}.` };
	},
	withdraw: async (event) => {
		const { user, teamId, values } = await asOwner(event);
		try {
			await accounts.withdrawInvite(teamId, values.inviteId ?? '', user.id);
		} catch (err) {
			return accounts.formFailure(err, 'withdraw', values);
		}
		return { form: 'withdraw', done: 'Invitation withdrawn.' };
	},
	role: async (event) => {
		const { user, teamId, values } = await asOwner(event);
		try {
			await accounts.changeMemberRole(teamId, { userId: values.userId, role: values.role }, user.id);
		} catch (err) {
			return accounts.formFailure(err, 'role', values);
		}
		return { form: 'role', done: 'Role changed.' };
	},
	remove: async (event) => {
		const { user, teamId, values } = await asOwner(event);
		try {
			await accounts.removeMember(teamId, { userId: values.userId }, new Date(), user.id);
		} catch (err) {
			return accounts.formFailure(err, 'remove', values);
		}
		if (values.userId === user.id) redirect(303, '/teams');
		return { form: 'remove', done: 'Member removed; their API tokens for this team are revoked.' };
	}
};
