// One design: its revisions as a history, with links to each revision, the editor and diffs.
import { error } from '@sveltejs/kit';
import { getDb } from '$lib/server/db';
import { findDesignWithRevisions } from '$lib/server/designs';
import { requireDesign } from '$lib/server/designs/design-access';
import { revisionSummary } from '$lib/design';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const { design, canEdit, role } = await requireDesign(event, event.params.designId, 'team.read');
	const found = await findDesignWithRevisions(getDb(), design.id);
	if (!found) error(404, 'Design not found');
	const revisions = found.revisions.map((r) => ({
		id: r.id,
		label: r.label,
		seq: r.seq,
		parentId: r.parentId,
		parentLabel: r.parentLabel,
		note: r.note,
		createdByName: r.createdByName,
		createdAt: r.createdAt,
		summary: revisionSummary(r.input, r.results)
	}));
	return { design, revisions, canEdit, role };
};
