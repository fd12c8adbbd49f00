// Every page: who is signed in, and for them the current team and the teams they can switch to (the header needs both);
// whether this server is the public demo (the banner).
import { appMode } from '$lib/server/app-mode';
import { currentTeam } from '$lib/server/teams/current-team';
import type { LayoutServerLoad } from './$types';

export const load: LayoutServerLoad = async ({ locals, cookies }) => {
	const demo = appMode().demoBanner;
	if (!locals.user) return { user: null, team: null, teams: [], demo };
	const { current, teams } = await currentTeam(locals.identity, cookies);
	return { user: locals.user, team: current, teams, demo };
};
