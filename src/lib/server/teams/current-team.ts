// The team a signed-in person is working in: the `ff_team` cookie when they are still a member, else their first team.
// A request made with an API token sees only the token's own team: the cookie never widens what a token reaches.
import type { Cookies } from '@sveltejs/kit';
import { getDb } from '../db';
import * as teamQueries from '../db/team.queries';
import type { TeamRole } from '../db/team.table';
import type { RequestIdentity } from '../auth/request-identity';

export const CURRENT_TEAM_COOKIE = 'ff_team';

export interface TeamChoice {
	id: string;
	name: string;
	role: TeamRole;
}

export interface CurrentTeam {
	current: TeamChoice | null;
	teams: TeamChoice[];
}

/** The teams this request may work in: every membership for a session, only the token's team for an API token. */
export async function reachableTeams(identity: Pick<RequestIdentity, 'user' | 'apiToken'>): Promise<TeamChoice[]> {
	if (!identity.user) return [];
	const teams = await teamQueries.listTeamsByUser(getDb(), identity.user.id);
	const tokenTeam = identity.apiToken?.teamId;
	return identity.apiToken ? teams.filter((t) => t.id === tokenTeam) : teams;
}

export async function currentTeam(identity: Pick<RequestIdentity, 'user' | 'apiToken'>, cookies: Cookies): Promise<CurrentTeam> {
	const teams = await reachableTeams(identity);
	const wanted = cookies.get(CURRENT_TEAM_COOKIE);
	const current = teams.find((t) => t.id === wanted) ?? teams[0] ?? null;
	return { current, teams };
}

export function chooseTeam(cookies: Cookies, teamId: string): void {
	cookies.set(CURRENT_TEAM_COOKIE, teamId, { path: '/', httpOnly: true, sameSite: 'lax', secure: (process.env.ORIGIN ?? '').startsWith('https://'), maxAge: 60 * 60 * 24 * 365 });
}
