// One design: its revisions as a history, with links to each revision, the editor and diffs.
import { error } from '@sveltejs/kit';
import { getDb } from '$lib/server/db';
import { findDesignWithRevisions } from '$lib/server/designs';
import { requireDesign } from '$lib/server/designs/design-access';
import { revisionSummary } from '$lib/design';
import { DEFAULT_DISPLAY_UNITS } from '$lib/units';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const { design, canEdit, role } = await requireDesign(event, event.params.designId, 'team.read');
	const found = await findDesignWithRevisions(getDb(), design.id);
	if (!found) error(404, 'Design not found');
	// the person's units, from the root layout (mm when a caller gives no parent data)
	const units = (await event.parent()).units ?? DEFAULT_DISPLAY_UNITS;
	const revisions = found.revisions.map((r) => ({
		id: r.id,
		label: r.label,
		seq: r.seq,
		parentId: r.parentId,
		parentLabel: r.parentLabel,
		note: r.note,
		createdByName: r.createdByName,
		createdAt: r.createdAt,
		summary: revisionSummary(r.input, r.results, units)
	}));
	return { design, revisions, canEdit, role };
};
