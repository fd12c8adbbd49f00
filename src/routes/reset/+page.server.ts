// Asking for a password-reset link: the same answer whether or not the e-mail has an account.
import { formFail } from '$lib/server/http/form-failure';
import { formFailure, formFields, requestPasswordReset, takeResetMailAllowance, type FormProblem } from '$lib/server/accounts';
import type { Actions } from './$types';

export const actions: Actions = {
	default: async ({ request, getClientAddress }) => {
		const values = await formFields(request);
		// The allowance counts every e-mail alike, so running out of it says nothing about an account.
		const { retryAfterSeconds } = await takeResetMailAllowance(values.email ?? '', getClientAddress());
		if (retryAfterSeconds > 0) {
			return formFail(429, { action: 'reset', message: `Several links were asked for already; try again in ${Math.ceil(retryAfterSeconds / 60)} minute(s).`, values } satisfies FormProblem);
		}
		try {
			const { delivery } = await requestPasswordReset({ email: values.email });
			// Not awaited: waiting for the mail server would tell an observer that the account exists.
			delivery.catch((err: unknown) => console.error(`password reset mail: ${err instanceof Error ? err.message : String(err)}`));
		} catch (err) {
			return formFailure(err, 'reset', values);
		}
		return { sent: true, email: values.email.trim().toLowerCase() };
	}
};
