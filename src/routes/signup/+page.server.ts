// Sign-up: make an account and sign in; arriving from an invitation link, also join that team.
import { redirect } from '@sveltejs/kit';
import { acceptInvite, AccountError, describeInvite, formFailure, formFields, signUp, startSession, withoutSecrets } from '$lib/server/accounts';
import { chooseTeam } from '$lib/server/teams/current-team';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals, url }) => {
	const inviteToken = url.searchParams.get('invite');
	if (locals.user) redirect(303, inviteToken ? `/invites/${encodeURIComponent(inviteToken)}` : '/teams');
	const invite = inviteToken ? await describeInvite(inviteToken) : null;
	return {
		inviteToken: invite?.state === 'live' ? inviteToken : null,
		invite: invite?.state === 'live' ? { teamName: invite.teamName, role: invite.role, email: invite.email, inviterName: invite.inviterName } : null
	};
};

export const actions: Actions = {
	default: async ({ request, cookies, locals }) => {
		const values = await formFields(request);
		let userId: string;
		try {
			userId = (await signUp({ displayName: values.displayName, email: values.email, password: values.password })).id;
		} catch (err) {
			return formFailure(err, 'signup', withoutSecrets(values));
		}
		const { cookie } = await startSession(userId, locals.sessionId);
		cookies.set(cookie.name, cookie.value, { ...cookie.attributes, path: '/' });
		if (!values.invite) redirect(303, '/teams?welcome=1');
		try {
			const { teamId } = await acceptInvite(values.invite, userId);
			chooseTeam(cookies, teamId);
			redirect(303, `/teams?joined=${encodeURIComponent(teamId)}`);
		} catch (err) {
			if (!(err instanceof AccountError)) throw err;
			redirect(303, `/invites/${encodeURIComponent(values.invite)}`);
		}
	}
};
