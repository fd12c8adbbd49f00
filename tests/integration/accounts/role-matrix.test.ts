// Every page load and form action of accounts and teams × {anonymous, non-member, viewer, editor, owner}:
// the route code is called the way SvelteKit calls it, with locals from the real identify().
// 'signin' = sent to sign in, 'ok' = allowed (data or a redirect elsewhere), a number = the refusal status.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { listApiTokens, listTeamMembers, createApiToken, inviteToTeam, listPendingInvites } from '../../../src/lib/server/accounts';
import { getLucia } from '../../../src/lib/server/auth/lucia';
import type { RequestIdentity } from '../../../src/lib/server/auth/request-identity';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { findTeamById } from '../../../src/lib/server/db/member.queries';
import { CURRENT_TEAM_COOKIE, currentTeam } from '../../../src/lib/server/teams/current-team';
import * as appLayout from '../../../src/routes/(app)/+layout.server';
import * as teamsPage from '../../../src/routes/(app)/teams/+page.server';
import * as teamPage from '../../../src/routes/(app)/teams/[teamId]/+page.server';
import * as tokensPage from '../../../src/routes/(app)/settings/tokens/+page.server';
import * as invitePage from '../../../src/routes/invites/[token]/+page.server';
import * as signoutPage from '../../../src/routes/signout/+page.server';
import { addMember, emailFor, forgetInviteAllowance, person, teamWithRoles, uniqueSuffix, type TeamFixture } from './helpers/people';
import { call, cookieJar, identityFor, sessionFor, type CallOptions, type Outcome } from './helpers/route-event';
import { startSmtpCatcher, tokenFromLink, type SmtpCatcher } from './helpers/smtp-catcher';

const callers = ['anonymous', 'non-member', 'viewer', 'editor', 'owner'] as const;
type Caller = (typeof callers)[number];
type Expected = Record<Caller, Outcome>;

const suffix = uniqueSuffix('matrix');
let smtp: SmtpCatcher;
let team: TeamFixture;
const identities = {} as Record<Caller, RequestIdentity>;

/** Fresh per cell, so that allowed cells do not change what later cells see. */
interface Cell {
	who: Caller;
	identity: RequestIdentity;
	userId: string | null;
}

interface RouteCase {
	name: string;
	run: (cell: Cell) => Promise<Outcome>;
	expected: Expected;
}

const signedInOnly: Expected = { anonymous: 'signin', 'non-member': 'ok', viewer: 'ok', editor: 'ok', owner: 'ok' };
const membersOnly: Expected = { anonymous: 'signin', 'non-member': 404, viewer: 'ok', editor: 'ok', owner: 'ok' };
const ownersOnly: Expected = { anonymous: 'signin', 'non-member': 404, viewer: 403, editor: 403, owner: 'ok' };

function userIdOf(who: Caller): string | null {
	return who === 'anonymous' ? null : { 'non-member': team.outsider, viewer: team.viewer, editor: team.editor, owner: team.owner }[who].id;
}

async function withParent(opts: CallOptions): Promise<CallOptions> {
	const user = opts.identity.user;
	const jar = opts.cookies ?? cookieJar();
	const layout = user ? await currentTeam(opts.identity, jar) : { current: null, teams: [] };
	return { ...opts, cookies: jar, parent: async () => ({ user, team: layout.current, teams: layout.teams }) };
}

async function outcome(fn: Parameters<typeof call>[0], opts: CallOptions): Promise<Outcome> {
	return (await call(fn, await withParent(opts))).outcome;
}

const teamPath = () => `/teams/${team.teamId}`;

async function freshInviteToken(email: string): Promise<string> {
	await forgetInviteAllowance(team.teamId, team.owner.id);
	await inviteToTeam(team.teamId, team.owner.id, { email, role: 'viewer' });
	return tokenFromLink((await smtp.waitFor(email)).links[0], '/invites/');
}

const cases: RouteCase[] = [
	{ name: 'load (app) layout', expected: signedInOnly, run: (c) => outcome(appLayout.load as never, { identity: c.identity, path: '/teams' }) },
	{ name: 'load /teams', expected: signedInOnly, run: (c) => outcome(teamsPage.load as never, { identity: c.identity, path: '/teams' }) },
	{
		name: 'action /teams ?/create',
		expected: signedInOnly,
		run: (c) => outcome(teamsPage.actions.create as never, { identity: c.identity, path: '/teams?/create', form: { name: `Matrix made ${suffix}` } })
	},
	{
		name: 'action /teams ?/switch (to the team)',
		expected: membersOnly,
		run: async (c) => {
			const jar = cookieJar();
			const result = await outcome(teamsPage.actions.switch as never, { identity: c.identity, path: '/teams?/switch', form: { teamId: team.teamId, redirectTo: '/teams' }, cookies: jar });
			if (result !== 'ok') expect(jar.values[CURRENT_TEAM_COOKIE]).toBeUndefined();
			else expect(jar.values[CURRENT_TEAM_COOKIE]).toBe(team.teamId);
			return result;
		}
	},
	{ name: 'load /teams/[teamId]', expected: membersOnly, run: (c) => outcome(teamPage.load as never, { identity: c.identity, path: teamPath(), params: { teamId: team.teamId } }) },
	{
		name: 'action /teams/[teamId] ?/rename',
		expected: ownersOnly,
		run: (c) => outcome(teamPage.actions.rename as never, { identity: c.identity, path: `${teamPath()}?/rename`, params: { teamId: team.teamId }, form: { name: `Accounts team ${suffix}` } })
	},
	{
		name: 'action /teams/[teamId] ?/invite',
		expected: ownersOnly,
		run: async (c) => {
			await forgetInviteAllowance(team.teamId, team.owner.id);
			return outcome(teamPage.actions.invite as never, { identity: c.identity, path: `${teamPath()}?/invite`, params: { teamId: team.teamId }, form: { email: emailFor(`invited-by-${c.who}`, suffix), role: 'viewer' } });
		}
	},
	{
		name: 'action /teams/[teamId] ?/withdraw',
		expected: ownersOnly,
		run: async (c) => {
			const email = emailFor(`withdraw-${c.who}`, suffix);
			await forgetInviteAllowance(team.teamId, team.owner.id);
			await inviteToTeam(team.teamId, team.owner.id, { email, role: 'viewer' });
			const inviteId = (await listPendingInvites(team.teamId)).find((i) => i.email === email)!.id;
			return outcome(teamPage.actions.withdraw as never, { identity: c.identity, path: `${teamPath()}?/withdraw`, params: { teamId: team.teamId }, form: { inviteId } });
		}
	},
	{
		name: 'action /teams/[teamId] ?/role',
		expected: ownersOnly,
		run: async (c) => {
			const target = await person(`promote-${c.who}`, suffix);
			await addMember(team.teamId, target.id, 'viewer');
			const result = await outcome(teamPage.actions.role as never, { identity: c.identity, path: `${teamPath()}?/role`, params: { teamId: team.teamId }, form: { userId: target.id, role: 'owner' } });
			const role = (await listTeamMembers(team.teamId)).find((m) => m.userId === target.id)?.role;
			expect(role).toBe(result === 'ok' ? 'owner' : 'viewer');
			return result;
		}
	},
	{
		name: 'action /teams/[teamId] ?/remove',
		expected: ownersOnly,
		run: async (c) => {
			const target = await person(`remove-${c.who}`, suffix);
			await addMember(team.teamId, target.id, 'viewer');
			const result = await outcome(teamPage.actions.remove as never, { identity: c.identity, path: `${teamPath()}?/remove`, params: { teamId: team.teamId }, form: { userId: target.id } });
			const still = (await listTeamMembers(team.teamId)).some((m) => m.userId === target.id);
			expect(still).toBe(result !== 'ok');
			return result;
		}
	},
	{ name: 'load /settings/tokens', expected: signedInOnly, run: (c) => outcome(tokensPage.load as never, { identity: c.identity, path: '/settings/tokens' }) },
	{
		name: 'action /settings/tokens ?/create (current team cookie = the team)',
		expected: signedInOnly,
		run: async (c) => {
			const jar = cookieJar({ [CURRENT_TEAM_COOKIE]: team.teamId });
			const result = await outcome(tokensPage.actions.create as never, { identity: c.identity, path: '/settings/tokens?/create', form: { name: `matrix ${c.who}` }, cookies: jar });
			if (c.userId) {
				const made = (await listApiTokens(c.userId)).find((t) => t.name === `matrix ${c.who}`)!;
				// The cookie cannot reach a team one is not a member of: the outsider's token is for a team of their own.
				if (c.who === 'non-member') expect(made.teamId).not.toBe(team.teamId);
				else expect(made.teamId).toBe(team.teamId);
			}
			return result;
		}
	},
	{
		name: "action /settings/tokens ?/revoke (the viewer's token)",
		expected: { anonymous: 'signin', 'non-member': 404, viewer: 'ok', editor: 404, owner: 404 },
		run: async (c) => {
			const { id } = await createApiToken(team.viewer.id, team.teamId, { name: `revoke-${c.who}` });
			const result = await outcome(tokensPage.actions.revoke as never, { identity: c.identity, path: '/settings/tokens?/revoke', form: { tokenId: id } });
			const live = (await listApiTokens(team.viewer.id)).some((t) => t.id === id);
			expect(live).toBe(result !== 'ok');
			return result;
		}
	},
	{
		name: 'load /invites/[token] (the link is the credential)',
		expected: { anonymous: 'ok', 'non-member': 'ok', viewer: 'ok', editor: 'ok', owner: 'ok' },
		run: async (c) => {
			const token = await freshInviteToken(emailFor(`look-${c.who}`, suffix));
			return outcome(invitePage.load as never, { identity: c.identity, path: `/invites/${token}`, params: { token } });
		}
	},
	{
		name: 'action /invites/[token] ?/accept',
		expected: signedInOnly,
		run: async (c) => {
			const token = await freshInviteToken(emailFor(`accept-${c.who}`, suffix));
			return outcome(invitePage.actions.accept as never, { identity: c.identity, path: `/invites/${token}?/accept`, params: { token } });
		}
	},
	{ name: 'load /signout', expected: signedInOnly, run: (c) => outcome(signoutPage.load as never, { identity: c.identity, path: '/signout' }) }
];

beforeAll(async () => {
	smtp = await startSmtpCatcher();
	team = await teamWithRoles(suffix);
	for (const who of callers) identities[who] = await identityFor(who === 'anonymous' ? null : await sessionFor(userIdOf(who)!));
});
afterAll(async () => {
	await smtp.close();
	await closeDb();
});

describe('the role matrix of accounts and teams pages', () => {
	for (const route of cases) {
		it(`${route.name}: ${callers.map((w) => `${w} → ${route.expected[w]}`).join(', ')}`, async () => {
			const got = {} as Expected;
			for (const who of callers) got[who] = await route.run({ who, identity: identities[who], userId: userIdOf(who) });
			expect(got).toEqual(route.expected);
		});
	}

	it('after the matrix the team keeps its name and its original three members with their roles', async () => {
		expect((await findTeamById(getDb(), team.teamId))?.name).toBe(`Accounts team ${suffix}`);
		const members = await listTeamMembers(team.teamId);
		for (const [who, role] of [['owner', 'owner'], ['editor', 'editor'], ['viewer', 'viewer']] as const) {
			expect(members.find((m) => m.userId === userIdOf(who))?.role).toBe(role);
		}
	});

	it('an API token cannot manage accounts: team changes and token pages send it to sign in', async () => {
		const { secret } = await createApiToken(team.owner.id, team.teamId, { name: 'script' });
		const identity = await identityFor(null, secret);
		expect(await outcome(teamPage.actions.rename as never, { identity, path: `${teamPath()}?/rename`, params: { teamId: team.teamId }, form: { name: 'renamed by a script' } })).toBe('signin');
		expect(await outcome(tokensPage.actions.create as never, { identity, path: '/settings/tokens?/create', form: { name: 'a token minting tokens' } })).toBe('signin');
		expect((await findTeamById(getDb(), team.teamId))?.name).toBe(`Accounts team ${suffix}`);
	});

	it('signing out ends the session in the database and clears the cookie', async () => {
		const sessionId = await sessionFor(team.viewer.id);
		const identity = await identityFor(sessionId);
		const jar = cookieJar({ [getLucia().sessionCookieName]: sessionId });
		const res = await call(signoutPage.actions.default as never, { identity, path: '/signout', form: {}, cookies: jar });
		expect(res.location).toBe('/signin?notice=signed-out');
		expect(jar.values[getLucia().sessionCookieName]).toBeUndefined();
		expect((await getLucia().validateSession(sessionId)).session).toBeNull();
	});
});
