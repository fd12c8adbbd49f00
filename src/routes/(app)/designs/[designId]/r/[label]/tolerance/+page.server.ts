// A revision's tolerance study: laminate εr and thickness tolerances (from the design input) and the etch tolerance (default
// from the fab profile the revision recorded, the one its fab notes print), editable; the page runs the seeded Monte Carlo
// itself (the pure core) as you type.
import { getDb } from '$lib/server/db';
import { revisionFabProfile } from '$lib/server/fab-profiles';
import { requireRevision } from '$lib/server/measurements/revision-access';
import { copperLayerCountOf } from '$lib/schemas';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals, params }) => {
	const { design, revision } = await requireRevision(locals.identity, params.designId, params.label, 'team.read');
	const { profile } = await revisionFabProfile(getDb(), revision.id, copperLayerCountOf(revision.input));
	return {
		design: { id: design.id, name: design.name, slug: design.slug },
		revision: { label: revision.label, input: revision.input },
		fabProfile: { name: profile.name, etchToleranceMm: profile.etchToleranceMm }
	};
};
