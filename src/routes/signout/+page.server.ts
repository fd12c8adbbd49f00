// Sign-out: a POST ends the session and clears its cookie (a GET only shows the button).
import { redirect } from '@sveltejs/kit';
import { endSession } from '$lib/server/accounts';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals }) => {
	if (!locals.user) redirect(303, '/signin');
	return {};
};

export const actions: Actions = {
	default: async ({ cookies, locals }) => {
		const blank = await endSession(locals.sessionId);
		cookies.set(blank.name, blank.value, { ...blank.attributes, path: '/' });
		redirect(303, '/signin?notice=signed-out');
	}
};
