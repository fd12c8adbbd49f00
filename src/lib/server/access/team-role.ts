// The caller's role in a team: membership for a session, and only the token's own team for an API token.
import { getDb } from '../db';
import * as teamQueries from '../db/team.queries';
import type { TeamRole } from '../db/team.table';
import type { RequestIdentity } from '../auth/request-identity';

export async function roleInTeam(identity: RequestIdentity, teamId: string): Promise<TeamRole | null> {
	if (!identity.user) return null;
	if (identity.apiToken && identity.apiToken.teamId !== teamId) return null;
	return teamQueries.findRoleByTeamAndUser(getDb(), teamId, identity.user.id);
}
