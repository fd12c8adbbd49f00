// The editor: starts from exactly the revision named by ?from= (never a guess: without it, the design's history to pick
// from); saving makes a new revision from it and goes there.
import { error, fail, redirect } from '@sveltejs/kit';
import { documentFromFormValues, fieldIssues, formValuesFromFormData } from '$lib/design';
import { getDb } from '$lib/server/db';
import { findDesignWithRevisions, listLaminates, saveRevision } from '$lib/server/designs';
import { requireDesign } from '$lib/server/designs/design-access';
import { listFabProfiles, matchingFabProfileId, resolveFabProfileChoice, revisionFabProfile } from '$lib/server/fab-profiles';
import { copperLayerCountOf, InputError } from '$lib/schemas';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const { design } = await requireDesign(event, event.params.designId, 'revision.create');
	const found = await findDesignWithRevisions(getDb(), design.id);
	const from = event.url.searchParams.get('from');
	if (from === null) redirect(303, `/designs/${design.id}#history-heading`);
	const parent = found?.revisions.find((r) => r.label === from);
	if (!parent) error(404, 'Revision not found');
	const laminates = await listLaminates(getDb(), design.teamId);
	// The fab profile the new revision is checked against: the parent's pick unless the form picks another.
	const fabProfiles = await listFabProfiles(getDb(), design.teamId);
	const parentFabProfileId = matchingFabProfileId(fabProfiles, (await revisionFabProfile(getDb(), parent.id, copperLayerCountOf(parent.input))).profile);
	return { design, parent: { label: parent.label, input: parent.input, results: parent.results }, laminates, fabProfiles, parentFabProfileId };
};

export const actions: Actions = {
	save: async (event) => {
		const { design, user } = await requireDesign(event, event.params.designId, 'revision.create');
		const data = await event.request.formData();
		const values = formValuesFromFormData(data);
		const note = String(data.get('note') ?? '');
		const from = String(data.get('from') ?? '');
		try {
			const raw = documentFromFormValues(values);
			const fabProfile = await resolveFabProfileChoice(getDb(), design.teamId, String(data.get('fabProfileId') ?? '') || null, raw);
			const saved = await saveRevision(getDb(), { designId: design.id, parentLabel: from, userId: user.id, raw, note, fabProfile });
			redirect(303, `/designs/${design.id}/r/${saved.label}`);
		} catch (err) {
			if (err instanceof InputError) return fail(400, { values, note, issues: fieldIssues(err.issues) });
			throw err;
		}
	}
};
