// Asking for a password-reset link: the same answer whether or not the e-mail has an account.
import { formFailure, formFields, requestPasswordReset } from '$lib/server/accounts';
import type { Actions } from './$types';

export const actions: Actions = {
	default: async ({ request }) => {
		const values = await formFields(request);
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
