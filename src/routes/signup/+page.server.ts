// Sign-up: the same answer whether or not the e-mail has an account ("check your inbox"); the mail then
// carries a confirmation link, or says that someone tried to sign up with a taken address.
import { redirect } from '@sveltejs/kit';
import { describeInvite, formFailure, formFields, registerAccount, withoutSecrets } from '$lib/server/accounts';
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
	default: async ({ request }) => {
		const values = await formFields(request);
		try {
			const next = values.invite ? `/invites/${encodeURIComponent(values.invite)}` : null;
			// delivery is not awaited: waiting for the mail server would tell an observer which mail went out.
			const { email } = await registerAccount({ displayName: values.displayName, email: values.email, password: values.password }, { next });
			return { form: 'signup', registered: true, email, next };
		} catch (err) {
			return formFailure(err, 'signup', withoutSecrets(values));
		}
	}
};
