// A design and the caller's role in the team that owns it (role null when the design is missing or out of reach).
import { roleInTeam } from '../access/team-role';
import type { RequestIdentity } from '../auth/request-identity';
import { getDb } from '../db';
import type { TeamRole } from '../db/team.table';
import type { Design } from '../designs/design-model';
import { findDesign } from '../designs/find-designs';

export interface DesignAccess {
	design: Design | null;
	role: TeamRole | null;
}

export async function designAccess(identity: RequestIdentity, designId: string): Promise<DesignAccess> {
	const design = await findDesign(getDb(), designId);
	if (!design) return { design: null, role: null };
	return { design, role: await roleInTeam(identity, design.teamId) };
}
