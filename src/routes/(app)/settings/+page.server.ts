// Settings: the person's display units (a plain form post, no script needed); API tokens have their own page.
import { findDisplayUnits, formFailure, formFields, requireSessionUser, setDisplayUnits } from '$lib/server/accounts';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals, url }) => {
	const user = requireSessionUser(locals, url);
	return { units: await findDisplayUnits(user.id) };
};

export const actions: Actions = {
	units: async ({ request, locals, url }) => {
		const user = requireSessionUser(locals, url);
		const values = await formFields(request);
		try {
			const units = await setDisplayUnits(user.id, { length: values.length, copper: values.copper });
			return { form: 'units', saved: units };
		} catch (err) {
			return formFailure(err, 'units', values);
		}
	}
};
