// "Send the link again": a signed-in person whose address is not confirmed gets a fresh confirmation link.
import { formFailure, requireSessionUser, resendEmailConfirmation } from '$lib/server/accounts';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals, url }) => {
	const user = requireSessionUser(locals, url);
	return { email: user.email, emailVerified: user.emailVerified };
};

export const actions: Actions = {
	resend: async ({ locals, url }) => {
		const user = requireSessionUser(locals, url);
		try {
			const { sent, alreadyConfirmed, email } = await resendEmailConfirmation(user.id);
			return { form: 'resend', sent, alreadyConfirmed, email };
		} catch (err) {
			return formFailure(err, 'resend');
		}
	}
};
