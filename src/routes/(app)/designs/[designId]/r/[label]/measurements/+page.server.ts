// A revision's measured S11 files: upload (multipart, ≤ 5 MB, strict), the plot of one (its thinned trace, never the raw samples;
// against the revision's newest full-wave check when there is one), its retune proposal, confirming it, and deleting a file
// (editors and owners, after a confirm step; recorded in the security log).
import { error, redirect } from '@sveltejs/kit';
import { formFail } from '$lib/server/http/form-failure';
import { getDb } from '$lib/server/db';
import * as measurements from '$lib/server/measurements';
import { InputError } from '$lib/schemas';
import type { Actions, PageServerLoad } from './$types';

/** What a refusal on this page carries besides its message: the file line, or the measurement a deletion asks about. */
type MeasurementDetail = { line?: number | null; measurementId?: string; confirm?: boolean };
const refuse = (status: number, action: 'upload' | 'retune' | 'delete', message: string, detail: MeasurementDetail = {}) => formFail<Record<string, string>, MeasurementDetail>(status, { action, message, detail });

export const load: PageServerLoad = ({ locals, params, url }) => measurements.loadMeasurementsPage(locals.identity, params.designId, params.label, url.searchParams.get('m'));

export const actions: Actions = {
	upload: async ({ locals, params, request }) => {
		const { revision } = await measurements.requireRevision(locals.identity, params.designId, params.label, 'measurement.upload');
		const file = (await request.formData()).get('file');
		if (!(file instanceof File) || file.name === '') return refuse(400, 'upload', 'Choose a Touchstone file (.s1p, .s2p or .ts) to upload.', { line: null });
		// Refused on its declared size before a byte is read.
		if (file.size > measurements.MAX_TOUCHSTONE_BYTES) return refuse(413, 'upload', `${file.name} is larger than 5 MB.`, { line: null });
		let id: string;
		try {
			({ id } = await measurements.uploadMeasurement(getDb(), { revisionId: revision.id, userId: locals.user!.id, fileName: file.name, bytes: new Uint8Array(await file.arrayBuffer()) }));
		} catch (err) {
			const refusal = measurements.uploadRefusal(file.name, err);
			if (refusal) return refuse(400, 'upload', refusal.message, { line: refusal.line });
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
			if (err instanceof InputError) return refuse(422, 'retune', err.first.message);
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
		if (form.get('confirm') !== 'yes') return refuse(400, 'delete', 'Delete this measurement? The file and its analysis are removed for the whole team, and the security log records who deleted it.', { measurementId, confirm: true });
		try {
			if (!(await measurements.deleteMeasurement(getDb(), { design, revision, measurementId, userId: locals.user!.id }))) error(404, 'Measurement not found');
		} catch (err) {
			if (err instanceof measurements.MeasurementInUseError) return refuse(409, 'delete', err.message, { measurementId, confirm: false });
			throw err;
		}
		redirect(303, `/designs/${design.id}/r/${revision.label}/measurements`);
	}
};
