// Sign-in: one generic refusal, slowed down after repeated attempts (counted before the password is checked);
// a fresh session id on success (the old one, if any, ends).
import { redirect } from '@sveltejs/kit';
import { formFail } from '$lib/server/http/form-failure';
import {
	checkCredentials,
	formFailure,
	formFields,
	safeNextPath,
	settleSuccessfulSignIn,
	startSession,
	takeSignInAttempt,
	withoutSecrets,
	type FormProblem
} from '$lib/server/accounts';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals, url }) => {
	const next = safeNextPath(url.searchParams.get('next'));
	if (locals.user) redirect(303, next);
	return { next, notice: url.searchParams.get('notice') };
};

export const actions: Actions = {
	default: async ({ request, cookies, locals, getClientAddress }) => {
		const values = await formFields(request);
		const email = values.email ?? '';
		const address = getClientAddress();
		const { retryAfterSeconds } = await takeSignInAttempt(email, address);
		if (retryAfterSeconds > 0) {
			const message = `Too many failed attempts. Try again in ${Math.ceil(retryAfterSeconds / 60)} minute(s), or set a new password.`;
			return formFail(429, { action: 'signin', message, values: withoutSecrets(values) } satisfies FormProblem);
		}
		let userId: string;
		try {
			userId = (await checkCredentials({ email, password: values.password })).id;
		} catch (err) {
			return formFailure(err, 'signin', withoutSecrets(values));
		}
		await settleSuccessfulSignIn(email, address);
		const { cookie } = await startSession(userId, locals.sessionId);
		cookies.set(cookie.name, cookie.value, { ...cookie.attributes, path: '/' });
		redirect(303, safeNextPath(values.next));
	}
};
