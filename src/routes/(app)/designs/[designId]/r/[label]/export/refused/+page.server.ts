// Where a refused download lands: the revision's violations against its fab profile, and for editors the waiver form.
import { error } from '@sveltejs/kit';
import { can } from '$lib/server/access';
import { requireDesign } from '$lib/server/designs/design-access';
import { checkExportTarget, loadExportTarget, WAIVER_MAX_CHARS, WAIVER_MIN_CHARS } from '$lib/server/exports';
import { loadRevisionDrawing } from '$lib/server/revision-view';
import { isExportKind } from '$lib/schemas/api';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const { design, role } = await requireDesign(event, event.params.designId, 'export.download');
	const target = await loadExportTarget(design.id, event.params.label);
	if (!target) error(404, 'Revision not found');
	const format = event.url.searchParams.get('format') ?? 'bundle';
	if (!isExportKind(format)) error(400, `format must be one of the export kinds, not "${format}"`);
	const gate = await checkExportTarget(target);
	// the board with its violations marked, drawn from an artwork built on a worker thread (none to mark: not built)
	const drawing =
		gate.violations.length > 0
			? await loadRevisionDrawing({
					sized: target.revision.results,
					label: target.revision.label,
					designName: target.design.name,
					revisionDate: new Date(target.revision.createdAt).toISOString().slice(0, 10),
					profile: gate.profile,
					recordedProfile: gate.profile
				})
			: { artwork: null, note: null };
	return {
		drawing,
		design,
		label: target.revision.label,
		format,
		profile: gate.profile,
		profileRecorded: gate.profileRecorded,
		violations: gate.violations,
		canWaive: can(role, 'export.waive'),
		issue: event.url.searchParams.get('issue'),
		waiverLength: { min: WAIVER_MIN_CHARS, max: WAIVER_MAX_CHARS }
	};
};
