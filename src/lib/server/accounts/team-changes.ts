// The changes an owner makes on a team's page: each one authorised the same way, run, and answered with one success or failure shape.
import { redirect } from '@sveltejs/kit';
import { authorize } from '../access';
import { roleInTeam } from '../access/team-role';
import type { RequestUser } from '../auth/request-identity';
import { changeMemberRole, removeMember } from './members';
import { inviteToTeam, withdrawInvite } from './invites';
import { requireSessionUser } from './request-user';
import { formFailure, formFields } from './form-failure';
import { renameTeam } from './teams';

export const teamChangeForms = ['rename', 'invite', 'withdraw', 'role', 'remove'] as const;
export type TeamChangeForm = (typeof teamChangeForms)[number];

/** What the page shows after a change went through. */
export interface TeamChangeDone {
	form: TeamChangeForm;
	done: string;
}

type Values = Record<string, string>;

/** Each form's change and the sentence that confirms it. */
const teamChanges: Record<TeamChangeForm, (teamId: string, user: RequestUser, values: Values) => Promise<string>> = {
	rename: async (teamId, _user, values) => {
		await renameTeam(teamId, { name: values.name });
		return 'Team renamed.';
	},
	invite: async (teamId, user, values) => {
		await inviteToTeam(teamId, user.id, { email: values.email, role: values.role });
		return `Invitation sent to ${values.email.trim().toLowerCase()}.`;
	},
	withdraw: async (teamId, user, values) => {
		await withdrawInvite(teamId, values.inviteId ?? '', user.id);
		return 'Invitation withdrawn.';
	},
	role: async (teamId, user, values) => {
		await changeMemberRole(teamId, { userId: values.userId, role: values.role }, user.id);
		return 'Role changed.';
	},
	remove: async (teamId, user, values) => {
		await removeMember(teamId, { userId: values.userId }, new Date(), user.id);
		return 'Member removed; their API tokens for this team are revoked.';
	}
};

export interface TeamChangeEvent {
	locals: App.Locals;
	url: URL;
	params: { teamId: string };
	request: Request;
}

/**
 * Runs one change of a team's page. Every change needs team.manage from a signed-in session: non-members
 * get 404, other members 403; bad input and expected refusals come back as `formFailure`. An owner who
 * removes themself goes to the team list.
 */
export async function runTeamChange(event: TeamChangeEvent, form: TeamChangeForm) {
	const user = requireSessionUser(event.locals, event.url);
	const teamId = event.params.teamId;
	authorize(await roleInTeam(event.locals.identity, teamId), 'team.manage', 'Team not found');
	const values = await formFields(event.request);
	let done: string;
	try {
		done = await teamChanges[form](teamId, user, values);
	} catch (err) {
		return formFailure(err, form, values);
	}
	if (form === 'remove' && values.userId === user.id) redirect(303, '/teams');
	return { form, done } satisfies TeamChangeDone;
}
