// A revision's sweep plans: list them, save a new one (editors; at most 10 000 points), export one as the sweep JSON.
import { fieldErrorsOf, formFail } from '$lib/server/http/form-failure';
import { can } from '$lib/server/access';
import { getDb } from '$lib/server/db';
import { requireRevision } from '$lib/server/measurements/revision-access';
import { listSweepPlans, saveSweepPlan } from '$lib/server/sweeps';
import { InputError } from '$lib/schemas';
import { sweepDraftFromFields } from '$lib/schemas/sweep-plan';
import { displayUnitsOfFormData } from '$lib/design';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals, params }) => {
	const { design, revision, role } = await requireRevision(locals.identity, params.designId, params.label, 'team.read');
	return {
		design: { id: design.id, name: design.name, slug: design.slug },
		revision: { label: revision.label, input: revision.input },
		plans: await listSweepPlans(getDb(), revision.id),
		canSave: can(role, 'sweep.write'),
		canDownload: can(role, 'export.download')
	};
};

export const actions: Actions = {
	save: async ({ locals, params, request }) => {
		const { revision } = await requireRevision(locals.identity, params.designId, params.label, 'sweep.write');
		const form = await request.formData();
		const draft = sweepDraftFromFields((k) => form.get(k));
		// lengths typed in the unit the form names (lengthUnit); a post that names none is mm, as before
		const lengthUnit = displayUnitsOfFormData(form).length;
		try {
			const saved = await saveSweepPlan(getDb(), { revisionId: revision.id, userId: locals.user!.id, draft, base: revision.input, lengthUnit });
			return { saved };
		} catch (err) {
			if (err instanceof InputError) return formFail(400, { action: 'save', message: 'Please correct the marked fields.', fieldErrors: fieldErrorsOf(err.issues), values: draft });
			throw err;
		}
	}
};
