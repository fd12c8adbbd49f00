// Signed-in pages: anonymous visitors go to sign-in; every page gets the current team and the team list.
import { redirect } from '@sveltejs/kit';
import { currentTeam } from '$lib/server/teams/current-team';
import type { LayoutServerLoad } from './$types';

export const load: LayoutServerLoad = async ({ locals, cookies, url }) => {
	if (!locals.user) redirect(303, `/signin?next=${encodeURIComponent(url.pathname + url.search)}`);
	const { current, teams } = await currentTeam(locals.identity, cookies);
	return { user: locals.user, team: current, teams };
};
