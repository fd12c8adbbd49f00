// The page behind an invitation link: who invites you to what; accept when signed in, or sign up from here.
import { error, redirect } from '@sveltejs/kit';
import { acceptInvite, describeInvite, formFailure, requireSessionUser } from '$lib/server/accounts';
import { chooseTeam } from '$lib/server/teams/current-team';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ params, locals }) => {
	const invite = await describeInvite(params.token);
	if (!invite) error(404, 'Invitation not found');
	return {
		token: params.token,
		invite: { teamName: invite.teamName, role: invite.role, email: invite.email, inviterName: invite.inviterName, expiresAt: invite.expiresAt.toISOString(), state: invite.state },
		user: locals.user
	};
};

export const actions: Actions = {
	accept: async ({ params, locals, url, cookies }) => {
		const user = requireSessionUser(locals, url);
		let teamId: string;
		try {
			teamId = (await acceptInvite(params.token, user.id)).teamId;
		} catch (err) {
			return formFailure(err, 'accept');
		}
		chooseTeam(cookies, teamId);
		redirect(303, `/teams?joined=${encodeURIComponent(teamId)}`);
	}
};
