// What a revision's tolerance study starts from: the laminate tolerances of its input, and the etch tolerance of the fab
// profile recorded with that revision (the built-in only for a revision older than recorded profiles).
import type { RequestIdentity } from '../auth/request-identity';
import { getDb } from '../db';
import { revisionFabProfile } from '../fab-profiles';
import { requireRevision } from '../measurements/revision-access';

export async function loadTolerancePage(identity: RequestIdentity, designId: string, label: string) {
	const { design, revision } = await requireRevision(identity, designId, label, 'team.read');
	const { profile } = await revisionFabProfile(getDb(), revision.id);
	return {
		design: { id: design.id, name: design.name, slug: design.slug },
		revision: { label: revision.label, input: revision.input },
		fabProfile: { name: profile.name, etchToleranceMm: profile.etchToleranceMm }
	};
}
