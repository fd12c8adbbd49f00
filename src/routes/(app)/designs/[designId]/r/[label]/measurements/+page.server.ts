// A revision's measured S11 files: upload (multipart, ≤ 5 MB, strict), the plot of one (its thinned trace, never the raw samples;
// against the revision's newest full-wave check when there is one), its retune proposal, confirming it, and deleting a file
// (editors and owners, after a confirm step; recorded in the security log).
import { error, fail, redirect } from '@sveltejs/kit';
import { can } from '$lib/server/access';
import { getDb } from '$lib/server/db';
import * as measurements from '$lib/server/measurements';
import { findLatestFieldCheckResult, thinSamples } from '$lib/server/field-checks';
import { InputError } from '$lib/schemas';
import { TouchstoneError } from '$lib/formats/touchstone';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals, params, url }) => {
	const { design, revision, role } = await measurements.requireRevision(locals.identity, params.designId, params.label, 'team.read');
	const db = getDb();
	const list = await measurements.listMeasurements(db, revision.id);
	const chosenId = url.searchParams.get('m') ?? list[0]?.id;
	const chosen = chosenId ? await measurements.findMeasurementView(db, revision.id, chosenId) : null;
	const fullWave = chosen ? ((await findLatestFieldCheckResult(db, revision.id))?.result ?? null) : null;
	let selected = null;
	if (chosen) {
		let proposal = null;
		let proposalError: string | null = null;
		try {
			proposal = measurements.retuneProposal(revision, chosen);
		} catch (err) {
			if (!(err instanceof InputError)) throw err;
			proposalError = err.first.message;
		}
		const { trace, ...facts } = chosen;
		selected = {
			...facts,
			points: trace,
			// complex samples, thinned, only to draw against a full-wave check (the Smith chart needs S11 itself)
			samples: fullWave ? thinSamples((await measurements.findMeasurement(db, revision.id, chosen.id))?.samples ?? []) : [],
			proposal,
			proposalError,
			retunedInto: await measurements.listRetunedRevisions(db, chosen.id)
		};
	}
	const half = (revision.results.estimates.bandwidthFraction / 2) * revision.results.frequencyHz;
	return {
		design: { id: design.id, name: design.name, slug: design.slug },
		revision: { label: revision.label, frequencyHz: revision.results.frequencyHz, parentLabel: revision.parentLabel },
		predictedBand: { lowHz: revision.results.frequencyHz - half, highHz: revision.results.frequencyHz + half },
		list,
		selected,
		retunedFrom: await measurements.findRetuneSource(db, revision.id),
		fullWave,
		canUpload: can(role, 'measurement.upload'),
		canRetune: can(role, 'revision.create'),
		canDelete: can(role, 'measurement.delete'),
		maxBytes: measurements.MAX_TOUCHSTONE_BYTES
	};
};

export const actions: Actions = {
	upload: async ({ locals, params, request }) => {
		const { revision } = await measurements.requireRevision(locals.identity, params.designId, params.label, 'measurement.upload');
		const file = (await request.formData()).get('file');
		if (!(file instanceof File) || file.name === '') return fail(400, { upload: { message: 'Choose a Touchstone file (.s1p, .s2p or .ts) to upload.', line: null } });
		// Refused on its declared size before a byte is read.
		if (file.size > measurements.MAX_TOUCHSTONE_BYTES) return fail(413, { upload: { message: `${file.name} is larger than 5 MB.`, line: null } });
		let id: string;
		try {
			({ id } = await measurements.uploadMeasurement(getDb(), { revisionId: revision.id, userId: locals.user!.id, fileName: file.name, bytes: new Uint8Array(await file.arrayBuffer()) }));
		} catch (err) {
			if (err instanceof TouchstoneError) return fail(400, { upload: { message: `${file.name}, line ${err.line}: expected ${err.expected}${err.found ? ` (found "${err.found.slice(0, 40)}")` : ''}. Nothing was stored.`, line: err.line } });
			if (err instanceof InputError) return fail(400, { upload: { message: `${file.name}: ${err.first.message}. Nothing was stored.`, line: null } });
			throw err;
		}
		redirect(303, `/designs/${params.designId}/r/${params.label}/measurements?m=${id}`);
	},
	retune: async ({ locals, params, request }) => {
		const { design, revision } = await measurements.requireRevision(locals.identity, params.designId, params.label, 'revision.create');
		const form = await request.formData();
		const measurement = await measurements.findMeasurementView(getDb(), revision.id, String(form.get('measurementId') ?? ''));
		if (!measurement) error(404, 'Measurement not found');
		let label: string;
		try {
			({ label } = await measurements.confirmRetune(getDb(), { designId: design.id, revision, measurement, userId: locals.user!.id, holdWidth: form.get('holdWidth') === 'on' }));
		} catch (err) {
			if (err instanceof InputError) return fail(422, { retune: { message: err.first.message } });
			throw err;
		}
		// The new revision's own page: its header names the measurement it was retuned from.
		redirect(303, `/designs/${design.id}/r/${label}`);
	},
	delete: async ({ locals, params, request }) => {
		const { design, revision } = await measurements.requireRevision(locals.identity, params.designId, params.label, 'measurement.delete');
		const form = await request.formData();
		const measurementId = String(form.get('measurementId') ?? '');
		// The confirm step: without it nothing is deleted and the page asks again.
		if (form.get('confirm') !== 'yes') return fail(400, { remove: { measurementId, confirm: true, message: 'Delete this measurement? The file and its analysis are removed for the whole team, and the security log records who deleted it.' } });
		try {
			if (!(await measurements.deleteMeasurement(getDb(), { design, revision, measurementId, userId: locals.user!.id }))) error(404, 'Measurement not found');
		} catch (err) {
			if (err instanceof measurements.MeasurementInUseError) return fail(409, { remove: { measurementId, confirm: false, message: err.message } });
			throw err;
		}
		redirect(303, `/designs/${design.id}/r/${revision.label}/measurements`);
	}
};
