// What a revision's tolerance study starts from: the laminate tolerances of its input, and the etch tolerance of the fab
// profile recorded with that revision (the built-in only for a revision older than recorded profiles), or of the team's
// profile that ?profile= names (the revision page's switch; nothing is saved).
import { error } from '@sveltejs/kit';
import { copperLayerCountOf, InputError } from '../../schemas';
import type { RequestIdentity } from '../auth/request-identity';
import { getDb } from '../db';
import { revisionFabCheck } from '../fab-profiles';
import { requireRevision } from '../measurements/revision-access';

export async function loadTolerancePage(identity: RequestIdentity, designId: string, label: string, profileId: string | null = null) {
	const { design, revision } = await requireRevision(identity, designId, label, 'team.read');
	let fab;
	try {
		fab = await revisionFabCheck(getDb(), { teamId: design.teamId, revisionId: revision.id, profileId, copperLayerCount: copperLayerCountOf(revision.input) });
	} catch (err) {
		if (err instanceof InputError) error(400, 'The fab profile named in the address is not one of the team’s fab profiles; choose one from the list on the revision page.');
		throw err;
	}
	return {
		design: { id: design.id, name: design.name, slug: design.slug },
		revision: { label: revision.label, input: revision.input },
		fabProfile: { id: fab.chosenId, name: fab.profile.name, etchToleranceMm: fab.profile.etchToleranceMm, switched: fab.switched }
	};
}
