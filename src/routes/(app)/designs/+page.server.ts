// The current team's designs, and the "new design" form (editors and owners).
import { redirect } from '@sveltejs/kit';
import { fieldErrorsOf, formFail } from '$lib/server/http/form-failure';
import { authorize, can } from '$lib/server/access';
import { getDb } from '$lib/server/db';
import { listDesigns, listLaminates, startDesign } from '$lib/server/designs';
import { requireUser } from '$lib/server/accounts';
import { requireTeamRole } from '$lib/server/designs/design-access';
import { currentTeam } from '$lib/server/teams/current-team';
import { InputError } from '$lib/schemas';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	requireUser(event.locals, event.url);
	const { current } = await currentTeam(event.locals.identity, event.cookies);
	if (!current) return { team: null, designs: [], laminates: [], canCreate: false };
	authorize(current.role, 'team.read');
	const [designs, laminates] = await Promise.all([listDesigns(getDb(), current.id), listLaminates(getDb(), current.id)]);
	return { team: current, designs, laminates: laminates.map((l) => ({ id: l.id, name: l.name })), canCreate: can(current.role, 'design.create') };
};

export const actions: Actions = {
	create: async (event) => {
		const data = await event.request.formData();
		const values = Object.fromEntries(['name', 'frequencyGHz', 'shape', 'laminateId'].map((k) => [k, String(data.get(k) ?? '')]));
		const { user } = await requireTeamRole(event, String(data.get('teamId') ?? ''), 'design.create');
		try {
			const created = await startDesign(getDb(), { teamId: String(data.get('teamId')), userId: user.id, raw: values });
			redirect(303, `/designs/${created.design.id}/r/${created.revisionLabel}`);
		} catch (err) {
			if (err instanceof InputError) return formFail(400, { action: 'create', message: 'Please correct the marked fields.', fieldErrors: fieldErrorsOf(err.issues), values });
			throw err;
		}
	}
};
