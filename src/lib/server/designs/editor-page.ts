// The editor's server side: it starts from exactly the revision named by ?from= (never a guess: without it, the design's
// history to pick from); saving the form makes a new revision of it and goes there.
import { error, redirect } from '@sveltejs/kit';
import { displayUnitsOfFormData, documentFromFormValues, fieldIssues, formValuesFromFormData, formValuesInStoredUnits, issuesInUnits } from '../../design';
import { copperLayerCountOf, InputError } from '../../schemas';
import { getDb } from '../db';
import { formFail } from '../http/form-failure';
import { listFabProfiles, matchingFabProfileId, resolveFabProfileChoice, revisionFabProfile } from '../fab-profiles';
import { requireDesign, type AccessEvent } from './design-access';
import { findDesignWithRevisions } from './find-designs';
import { listLaminates } from './laminates';
import { saveRevision } from './save-revision';

/** The editor's data: the design, the parent revision named by `from`, the team's laminates and fab profiles. */
export async function loadEditorPage(event: AccessEvent, designId: string) {
	const { design } = await requireDesign(event, designId, 'revision.create');
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
}

/** Saves the posted editor form as a new revision and goes there; bad input → 400 with the values, note and issues per field. */
export async function saveEditorForm(event: AccessEvent & { request: Request }, designId: string) {
	const { design, user } = await requireDesign(event, designId, 'revision.create');
	const data = await event.request.formData();
	const values = formValuesFromFormData(data);
	const note = String(data.get('note') ?? '');
	const from = String(data.get('from') ?? '');
	// the form's lengths and foil are in the units it was shown in (mm and µm unless it says otherwise)
	const units = displayUnitsOfFormData(data);
	const stored = formValuesInStoredUnits(values, units);
	try {
		const raw = documentFromFormValues(stored.values);
		const fabProfile = await resolveFabProfileChoice(getDb(), design.teamId, String(data.get('fabProfileId') ?? '') || null, raw);
		const saved = await saveRevision(getDb(), { designId: design.id, parentLabel: from, userId: user.id, raw, note, fabProfile });
		redirect(303, `/designs/${design.id}/r/${saved.label}`);
	} catch (err) {
		if (err instanceof InputError) {
			const unreadable = new Set(stored.issues.map((i) => i.field));
			const fieldErrors = [...stored.issues, ...issuesInUnits(fieldIssues(err.issues), units).filter((i) => !unreadable.has(i.field))];
			return formFail(400, { action: 'save', message: 'Please correct the marked fields.', fieldErrors, values, detail: { note } });
		}
		throw err;
	}
}
