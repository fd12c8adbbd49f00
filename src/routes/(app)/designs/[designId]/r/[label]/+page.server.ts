// One revision: its stored input and results, the fab profile it is checked against (its recorded one, or ?profile=<id>
// of the team's others, without saving anything), the heavy panels (artwork, design-rule check, fab view read-back)
// built on worker threads within the page's work budget (issue 13: never on the request thread), and its Field check panel: start a check or Homing, cancel one, make a revision from a Homing study's tuned input.
import { error, isHttpError, redirect } from '@sveltejs/kit';
import { formFail } from '$lib/server/http/form-failure';
import { getDb } from '$lib/server/db';
import { findDesignWithRevisions } from '$lib/server/designs';
import { requireDesign } from '$lib/server/designs/design-access';
import { revisionFabCheck } from '$lib/server/fab-profiles';
import { loadRevisionView } from '$lib/server/revision-view';
import { cancelFieldCheck, loadFieldCheckPanel, requireFieldCheck, reviseFromHoming, startFieldCheck } from '$lib/server/field-checks';
import { findRetuneSource, requireRevision } from '$lib/server/measurements';
import { copperLayerCountOf, InputError, parseWith } from '$lib/schemas';
import { startFieldCheckBodySchema } from '$lib/schemas/api';
import { can } from '$lib/server/access';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const { design, canEdit, role } = await requireDesign(event, event.params.designId, 'team.read');
	const found = await findDesignWithRevisions(getDb(), design.id);
	const revision = found?.revisions.find((r) => r.label === event.params.label);
	if (!found || !revision) error(404, 'Revision not found');
	const children = found.revisions.filter((r) => r.parentId === revision.id).map((r) => r.label);
	let fabCheck;
	try {
		fabCheck = await revisionFabCheck(getDb(), { teamId: design.teamId, revisionId: revision.id, profileId: event.url.searchParams.get('profile'), copperLayerCount: copperLayerCountOf(revision.input) });
	} catch (err) {
		if (err instanceof InputError) error(400, 'The fab profile named in the address is not one of the team’s fab profiles; choose one from the list on the revision page.');
		throw err;
	}
	const [view, retunedFrom, fieldCheckPanel] = await Promise.all([
		loadRevisionView({
			sized: revision.results,
			label: revision.label,
			designName: design.name,
			revisionDate: new Date(revision.createdAt).toISOString().slice(0, 10),
			profile: fabCheck.profile,
			recordedProfile: fabCheck.recorded
		}),
		findRetuneSource(getDb(), revision.id),
		loadFieldCheckPanel(getDb(), revision, event.url.searchParams.get('check'))
	]);
	return {
		design,
		revision,
		view,
		children,
		labels: found.revisions.map((r) => r.label),
		canEdit,
		fabCheck,
		retunedFrom,
		fieldCheck: { ...fieldCheckPanel, canRun: can(role, 'field-check.start') }
	};
};

const back = (designId: string, label: string, checkId: string) => `/designs/${designId}/r/${label}?check=${checkId}#field-check`;

export const actions: Actions = {
	startFieldCheck: async ({ locals, params, request }) => {
		const { design, revision } = await requireRevision(locals.identity, params.designId, params.label, 'field-check.start');
		const form = await request.formData();
		let id: string;
		try {
			const body = parseWith(startFieldCheckBodySchema, { mode: String(form.get('mode') ?? 'standard'), homing: form.get('kind') === 'homing' });
			({ id } = await startFieldCheck(getDb(), { design, revision, userId: locals.user!.id, kind: body.homing ? 'homing' : 'check', mode: body.mode }));
		} catch (err) {
			if (err instanceof InputError) return formFail(400, { action: 'startFieldCheck', message: err.first.message });
			if (isHttpError(err) && err.status === 429) return formFail(429, { action: 'startFieldCheck', message: err.body.message });
			throw err;
		}
		redirect(303, back(design.id, revision.label, id));
	},
	cancelFieldCheck: async ({ locals, params, request }) => {
		const { check } = await requireFieldCheck(locals.identity, String((await request.formData()).get('checkId') ?? ''), 'field-check.cancel');
		if (check.designId !== params.designId) error(404, 'Field check not found');
		await cancelFieldCheck(getDb(), check.id, locals.user!.displayName);
		redirect(303, back(params.designId, params.label, check.id));
	},
	reviseFromHoming: async ({ locals, params, request }) => {
		const { check, design } = await requireFieldCheck(locals.identity, String((await request.formData()).get('studyId') ?? ''), 'revision.create');
		if (check.designId !== params.designId) error(404, 'Field check not found');
		let label: string;
		try {
			({ label } = await reviseFromHoming(getDb(), { design, study: check, userId: locals.user!.id }));
		} catch (err) {
			if (err instanceof InputError) return formFail(422, { action: 'reviseFromHoming', message: err.first.message });
			throw err;
		}
		redirect(303, `/designs/${design.id}/r/${label}`);
	}
};
