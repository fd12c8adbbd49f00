// The current team's export log (the rows themselves are fetched by the browser from /api/v1).
import { authorize } from '$lib/server/access';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ parent }) => {
	const { team } = await parent();
	if (team) authorize(team.role, 'team.read');
	return { logTeam: team ? { id: team.id, name: team.name } : null };
};
