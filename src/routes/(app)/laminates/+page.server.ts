// The current team's laminate library: built-in presets and the team's own; editors add entries.
import { fieldErrorsOf, formFail } from '$lib/server/http/form-failure';
import { authorize, can } from '$lib/server/access';
import { getDb } from '$lib/server/db';
import { addLaminate, listLaminates } from '$lib/server/designs';
import { requireUser } from '$lib/server/accounts';
import { requireTeamRole } from '$lib/server/designs/design-access';
import { currentTeam } from '$lib/server/teams/current-team';
import { InputError } from '$lib/schemas';
import type { Actions, PageServerLoad } from './$types';

const propertyKeys = ['relativePermittivity', 'lossTangent', 'heightMm', 'copperThicknessUm', 'relativePermittivityTolerance', 'heightToleranceMm'] as const;

export const load: PageServerLoad = async (event) => {
	requireUser(event.locals, event.url);
	const { current } = await currentTeam(event.locals.identity, event.cookies);
	if (!current) return { team: null, laminates: [], canAdd: false };
	authorize(current.role, 'team.read');
	return { team: current, laminates: await listLaminates(getDb(), current.id), canAdd: can(current.role, 'laminate.write') };
};

export const actions: Actions = {
	add: async (event) => {
		const data = await event.request.formData();
		const teamId = String(data.get('teamId') ?? '');
		const { user } = await requireTeamRole(event, teamId, 'laminate.write');
		const values = Object.fromEntries(['name', ...propertyKeys].map((k) => [k, String(data.get(k) ?? '')]));
		const num = (t: string) => (t.trim() === '' ? undefined : Number(t));
		const raw = { name: values.name, properties: Object.fromEntries(propertyKeys.map((k) => [k, num(values[k])])) };
		try {
			await addLaminate(getDb(), { teamId, userId: user.id, raw });
			return { added: values.name };
		} catch (err) {
			if (err instanceof InputError) return formFail(400, { action: 'add', message: 'Please correct the marked fields.', fieldErrors: fieldErrorsOf(err.issues, (path) => path.replace(/^properties\./, '')), values });
			throw err;
		}
	}
};
