// The page behind a confirmation link: one button confirms the address (a mail scanner opening the link changes nothing).
import { redirect } from '@sveltejs/kit';
import { confirmEmail, formFailure, safeNextPath } from '$lib/server/accounts';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ url }) => ({ next: safeNextPath(url.searchParams.get('next'), '/teams') });

export const actions: Actions = {
	default: async ({ params, url, locals }) => {
		try {
			await confirmEmail(params.token);
		} catch (err) {
			return formFailure(err, 'confirm');
		}
		const next = safeNextPath(url.searchParams.get('next'), '/teams');
		if (locals.user) redirect(303, next);
		redirect(303, `/signin?notice=email-confirmed&next=${encodeURIComponent(next)}`);
	}
};
