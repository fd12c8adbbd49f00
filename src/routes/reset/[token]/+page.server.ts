// Using a reset link: a new password, then every session of that person ends and they sign in again.
import { redirect } from '@sveltejs/kit';
import { completePasswordReset, endSession, findPasswordResetLink, formFailure, formFields } from '$lib/server/accounts';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ params }) => {
	const link = await findPasswordResetLink(params.token);
	return { email: link?.email ?? null };
};

export const actions: Actions = {
	default: async ({ request, params, cookies }) => {
		const values = await formFields(request);
		try {
			await completePasswordReset(params.token, { password: values.password });
		} catch (err) {
			return formFailure(err, 'reset');
		}
		const blank = await endSession(null);
		cookies.set(blank.name, blank.value, { ...blank.attributes, path: '/' });
		redirect(303, '/signin?notice=password-set');
	}
};
