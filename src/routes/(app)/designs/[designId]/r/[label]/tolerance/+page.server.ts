// A revision's tolerance study: laminate εr and thickness tolerances (from the design input) and the etch tolerance (default
// from the revision's recorded fab profile, or the one ?profile= names on the revision page), editable; the page runs the
// seeded Monte Carlo itself (the pure core) as you type.
import { error } from '@sveltejs/kit';
import { getDb } from '$lib/server/db';
import { revisionFabCheck } from '$lib/server/fab-profiles';
import { requireRevision } from '$lib/server/measurements/revision-access';
import { InputError } from '$lib/schemas';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals, params, url }) => {
	const { design, revision } = await requireRevision(locals.identity, params.designId, params.label, 'team.read');
	let fab;
	try {
		fab = await revisionFabCheck(getDb(), { teamId: design.teamId, revisionId: revision.id, profileId: url.searchParams.get('profile') });
	} catch (err) {
		if (err instanceof InputError) error(400, 'The fab profile named in the address is not one of the team’s fab profiles; choose one from the list on the revision page.');
		throw err;
	}
	return {
		design: { id: design.id, name: design.name, slug: design.slug },
		revision: { label: revision.label, input: revision.input },
		fabProfile: { id: fab.chosenId, name: fab.profile.name, etchToleranceMm: fab.profile.etchToleranceMm, switched: fab.switched }
	};
};
