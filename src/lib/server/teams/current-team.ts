// The team a signed-in person is working in: the `ff_team` cookie when they are still a member, else their first team.
import type { Cookies } from '@sveltejs/kit';
import { getDb } from '../db';
import * as teamQueries from '../db/team.queries';
import type { TeamRole } from '../db/team.table';

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

export async function currentTeam(userId: string, cookies: Cookies): Promise<CurrentTeam> {
	const teams = await teamQueries.listTeamsByUser(getDb(), userId);
	const wanted = cookies.get(CURRENT_TEAM_COOKIE);
	const current = teams.find((t) => t.id === wanted) ?? teams[0] ?? null;
	return { current, teams };
}

export function chooseTeam(cookies: Cookies, teamId: string): void {
	cookies.set(CURRENT_TEAM_COOKIE, teamId, { path: '/', httpOnly: true, sameSite: 'lax', secure: (process.env.ORIGIN ?? '').startsWith('https://'), maxAge: 60 * 60 * 24 * 365 });
}
