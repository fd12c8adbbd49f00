// Sign-in: one generic refusal; a fresh session id on success (the old one, if any, ends).
import { redirect } from '@sveltejs/kit';
import { checkCredentials, formFailure, formFields, safeNextPath, startSession, withoutSecrets } from '$lib/server/accounts';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals, url }) => {
	const next = safeNextPath(url.searchParams.get('next'));
	if (locals.user) redirect(303, next);
	return { next, notice: url.searchParams.get('notice') };
};

export const actions: Actions = {
	default: async ({ request, cookies, locals }) => {
		const values = await formFields(request);
		let userId: string;
		try {
			userId = (await checkCredentials({ email: values.email, password: values.password })).id;
		} catch (err) {
			return formFailure(err, 'signin', withoutSecrets(values));
		}
		const { cookie } = await startSession(userId, locals.sessionId);
		cookies.set(cookie.name, cookie.value, { ...cookie.attributes, path: '/' });
		redirect(303, safeNextPath(values.next));
	}
};
