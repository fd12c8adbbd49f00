// Your teams: the list with your role in each, making a new team, and switching the current one.
import { redirect } from '@sveltejs/kit';
import { authorize } from '$lib/server/access';
import { roleInTeam } from '$lib/server/access/team-role';
import { createTeam, formFailure, formFields, requireSessionUser, requireUser, safeNextPath } from '$lib/server/accounts';
import { chooseTeam } from '$lib/server/teams/current-team';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals, url, parent }) => {
	requireUser(locals, url);
	const { teams } = await parent();
	const joinedId = url.searchParams.get('joined');
	return { joined: teams.find((t) => t.id === joinedId) ?? null, welcome: url.searchParams.has('welcome') };
};

export const actions: Actions = {
	create: async ({ request, locals, url, cookies }) => {
		const user = requireSessionUser(locals, url);
		const values = await formFields(request);
		let teamId: string;
		try {
			teamId = (await createTeam(user.id, { name: values.name })).id;
		} catch (err) {
			return formFailure(err, 'create', values);
		}
		chooseTeam(cookies, teamId);
		redirect(303, `/teams/${teamId}`);
	},
	switch: async ({ request, locals, url, cookies }) => {
		requireUser(locals, url);
		const values = await formFields(request);
		authorize(await roleInTeam(locals.identity, values.teamId ?? ''), 'team.read', 'Team not found');
		chooseTeam(cookies, values.teamId);
		redirect(303, safeNextPath(values.redirectTo));
	}
};
