// A revision's tolerance study: laminate εr and thickness tolerances (from the design input) and the etch tolerance (default
// from the built-in fab profile), editable; the page runs the seeded Monte Carlo itself (the pure core) as you type.
import { requireRevision } from '$lib/server/measurements/revision-access';
import { STANDARD_QUICK_TURN_PROFILE } from '$lib/schemas/fab-profile';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals, params }) => {
	const { design, revision } = await requireRevision(locals.identity, params.designId, params.label, 'team.read');
	return {
		design: { id: design.id, name: design.name, slug: design.slug },
		revision: { label: revision.label, input: revision.input },
		fabProfile: { name: STANDARD_QUICK_TURN_PROFILE.name, etchToleranceMm: STANDARD_QUICK_TURN_PROFILE.etchToleranceMm }
	};
};
