// Personal API tokens: made for the current team, shown once, listed by name and team, revoked by their owner.
import { error } from '@sveltejs/kit';
import { formFail } from '$lib/server/http/form-failure';
import { authorize, can, canAsAccount, CONFIRM_EMAIL_FIRST } from '$lib/server/access';
import { roleInTeam } from '$lib/server/access/team-role';
import { createApiToken, findOwnApiTokenTeam, formFailure, formFields, listApiTokens, requireSessionUser, revokeApiToken, type FormProblem } from '$lib/server/accounts';
import { currentTeam } from '$lib/server/teams/current-team';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals, url, parent }) => {
	const user = requireSessionUser(locals, url);
	const { team } = await parent();
	const confirmed = canAsAccount(user, 'token.create');
	return { tokens: await listApiTokens(user.id), canCreate: confirmed && can(team?.role, 'token.manage-own'), confirmNotice: confirmed ? null : CONFIRM_EMAIL_FIRST['token.create'] };
};

export const actions: Actions = {
	create: async ({ request, locals, url, cookies }) => {
		const user = requireSessionUser(locals, url);
		const values = await formFields(request);
		if (!canAsAccount(user, 'token.create')) return formFail(403, { action: 'create', message: CONFIRM_EMAIL_FIRST['token.create'], values, detail: { code: 'email-unconfirmed' } } satisfies FormProblem);
		const { current } = await currentTeam(locals.identity, cookies);
		if (!current) return formFail(400, { action: 'create', message: 'Make or join a team first: a token reaches exactly one team.', values } satisfies FormProblem);
		authorize(await roleInTeam(locals.identity, current.id), 'token.manage-own', 'Team not found');
		try {
			const token = await createApiToken(user.id, current.id, { name: values.name });
			return { form: 'create', created: { name: token.name, secret: token.secret, teamName: current.name } };
		} catch (err) {
			return formFailure(err, 'create', values);
		}
	},
	revoke: async ({ request, locals, url }) => {
		const user = requireSessionUser(locals, url);
		const { tokenId } = await formFields(request);
		const teamId = await findOwnApiTokenTeam(user.id, tokenId ?? '');
		if (!teamId) error(404, 'Token not found');
		authorize(await roleInTeam(locals.identity, teamId), 'token.manage-own', 'Token not found');
		try {
			await revokeApiToken(user.id, tokenId);
		} catch (err) {
			return formFailure(err, 'revoke');
		}
		return { form: 'revoke', revoked: true };
	}
};
