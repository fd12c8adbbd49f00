// Every page: who is signed in, and for them the current team and the teams they can switch to (the header needs both)
// and their display units (mm or mil, µm or oz); whether this server is the public demo (the banner).
import { appMode } from '$lib/server/app-mode';
import { findDisplayUnits } from '$lib/server/accounts';
import { currentTeam } from '$lib/server/teams/current-team';
import { DEFAULT_DISPLAY_UNITS } from '$lib/units';
import type { LayoutServerLoad } from './$types';

export const load: LayoutServerLoad = async ({ locals, cookies }) => {
	const demo = appMode().demoBanner;
	if (!locals.user) return { user: null, team: null, teams: [], demo, units: DEFAULT_DISPLAY_UNITS };
	const [{ current, teams }, units] = await Promise.all([currentTeam(locals.identity, cookies), findDisplayUnits(locals.user.id)]);
	return { user: locals.user, team: current, teams, demo, units };
};
