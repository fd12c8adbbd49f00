// The check every revision sub-page (measurements, sweeps, tolerance) makes: the design, the revision and the caller's role.
import { error } from '@sveltejs/kit';
import { authorize, can, type Action } from '../access';
import { roleInTeam } from '../access/team-role';
import type { RequestIdentity } from '../auth/request-identity';
import { getDb } from '../db';
import type { TeamRole } from '../db/team.table';
import type { Design, Revision } from '../designs/design-model';
import { findDesign, findRevision } from '../designs/find-designs';

export interface RevisionAccess {
	design: Design;
	revision: Revision;
	role: TeamRole;
	/** May save sweep plans, upload measurements and confirm retunes. */
	canEdit: boolean;
}

/** 404 for a missing design or revision and for a non-member (no existence leak); 403 for a member lacking `action`. */
export async function requireRevision(identity: RequestIdentity, designId: string, label: string, action: Action): Promise<RevisionAccess> {
	const design = await findDesign(getDb(), designId);
	const role = design ? await roleInTeam(identity, design.teamId) : null;
	authorize(role, action, 'Design not found');
	const revision = await findRevision(getDb(), design!.id, label);
	if (!revision) error(404, `Revision ${label} not found`);
	return { design: design!, revision, role: role!, canEdit: can(role, 'revision.create') };
}
