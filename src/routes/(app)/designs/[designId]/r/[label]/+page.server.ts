// One revision: its stored input and results (the page draws the preview and the DXF from them).
import { error } from '@sveltejs/kit';
import { getDb } from '$lib/server/db';
import { findDesignWithRevisions } from '$lib/server/designs';
import { requireDesign } from '$lib/server/designs/design-access';
import { revisionFabProfile } from '$lib/server/fab-profiles';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const { design, canEdit } = await requireDesign(event, event.params.designId, 'team.read');
	const found = await findDesignWithRevisions(getDb(), design.id);
	const revision = found?.revisions.find((r) => r.label === event.params.label);
	if (!found || !revision) error(404, 'Revision not found');
	const children = found.revisions.filter((r) => r.parentId === revision.id).map((r) => r.label);
	return { design, revision, children, labels: found.revisions.map((r) => r.label), canEdit, fabCheck: await revisionFabProfile(getDb(), revision.id) };
};
