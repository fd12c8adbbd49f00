// The check every field-check route makes: the check, its design, and the caller's role in the design's team.
import { error } from '@sveltejs/kit';
import { authorize, can, type Action } from '../access';
import { roleInTeam } from '../access/team-role';
import type { RequestIdentity } from '../auth/request-identity';
import { getDb } from '../db';
import type { TeamRole } from '../db/team.table';
import type { Design } from '../designs/design-model';
import { findDesign } from '../designs/find-designs';
import type { FieldCheckWithResult } from './field-check-model';
import { findFieldCheck } from './find-field-checks';

export interface FieldCheckAccess {
	check: FieldCheckWithResult;
	design: Design;
	role: TeamRole;
	canRun: boolean;
}

/** 404 for a missing check and for a non-member (no existence leak); 403 for a member lacking `action`. */
export async function requireFieldCheck(identity: RequestIdentity, id: string, action: Action): Promise<FieldCheckAccess> {
	const check = await findFieldCheck(getDb(), id);
	const role = check ? await roleInTeam(identity, check.teamId) : null;
	authorize(role, action, 'Field check not found');
	const design = await findDesign(getDb(), check!.designId);
	if (!design) error(404, 'Field check not found');
	return { check: check!, design, role: role!, canRun: can(role, 'field-check.start') };
}
