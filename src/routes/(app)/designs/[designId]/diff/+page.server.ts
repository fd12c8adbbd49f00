// Two revisions side by side: ?a=A&b=B (default: the latest and its parent).
import { error } from '@sveltejs/kit';
import { getDb } from '$lib/server/db';
import { diffRevisions, findDesignWithRevisions } from '$lib/server/designs';
import { requireDesign } from '$lib/server/designs/design-access';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const { design } = await requireDesign(event, event.params.designId, 'team.read');
	const found = await findDesignWithRevisions(getDb(), design.id);
	const revisions = found?.revisions ?? [];
	const latest = revisions.at(-1);
	const b = revisions.find((r) => r.label === (event.url.searchParams.get('b') ?? latest?.label));
	const a = revisions.find((r) => r.label === (event.url.searchParams.get('a') ?? b?.parentLabel ?? revisions[0]?.label));
	if (!a || !b) error(404, 'Revision not found');
	// lengths and foil in the person's units (the root layout's); the stored revisions stay in mm
	const { units } = await event.parent();
	return { design, labels: revisions.map((r) => r.label), diff: diffRevisions(a, b, units), notes: { a: a.note, b: b.note } };
};
