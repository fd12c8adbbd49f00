// Members and roles: changing and removing, with a team never left without an owner (also under concurrent changes).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AccountError, changeMemberRole, createApiToken, createTeam, listApiTokens, listTeamMembers, removeMember } from '../../../src/lib/server/accounts';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { findRoleByTeamAndUser } from '../../../src/lib/server/db/team.queries';
import { addMember, person, teamWithRoles, uniqueSuffix, type TeamFixture } from './helpers/people';

const suffix = uniqueSuffix('members');
let team: TeamFixture;

beforeAll(async () => {
	team = await teamWithRoles(suffix);
});
afterAll(closeDb);

const codeOf = (e: unknown) => (e instanceof AccountError ? e.code : String(e));
const roleOf = (teamId: string, userId: string) => findRoleByTeamAndUser(getDb(), teamId, userId);

describe('team members', () => {
	it('the creator of a team is its only owner', async () => {
		const founder = await person('founder', suffix);
		const { id } = await createTeam(founder.id, { name: `Founded ${suffix}` });
		expect(await listTeamMembers(id)).toEqual([expect.objectContaining({ userId: founder.id, role: 'owner' })]);
	});

	it('refuses a team name longer than 80 characters', async () => {
		const founder = await person('longname', suffix);
		await expect(createTeam(founder.id, { name: 'x'.repeat(81) })).rejects.toMatchObject({ name: 'InputError' });
		await expect(createTeam(founder.id, { name: 'x'.repeat(80) })).resolves.toMatchObject({ name: 'x'.repeat(80) });
	});

	it('changes a role', async () => {
		await changeMemberRole(team.teamId, { userId: team.viewer.id, role: 'editor' });
		expect(await roleOf(team.teamId, team.viewer.id)).toBe('editor');
		await changeMemberRole(team.teamId, { userId: team.viewer.id, role: 'viewer' });
		expect(await roleOf(team.teamId, team.viewer.id)).toBe('viewer');
	});

	it('will not demote or remove the last owner', async () => {
		expect(codeOf(await changeMemberRole(team.teamId, { userId: team.owner.id, role: 'editor' }).catch((e: unknown) => e))).toBe('last-owner');
		expect(codeOf(await removeMember(team.teamId, { userId: team.owner.id }).catch((e: unknown) => e))).toBe('last-owner');
		expect(await roleOf(team.teamId, team.owner.id)).toBe('owner');
	});

	it('lets one of two owners step down, and then protects the remaining one', async () => {
		const { id } = await createTeam(team.owner.id, { name: `Two owners ${suffix}` });
		await addMember(id, team.editor.id, 'owner');
		await changeMemberRole(id, { userId: team.owner.id, role: 'viewer' });
		expect(await roleOf(id, team.owner.id)).toBe('viewer');
		expect(codeOf(await changeMemberRole(id, { userId: team.editor.id, role: 'viewer' }).catch((e: unknown) => e))).toBe('last-owner');
	});

	it('of two owners demoting each other at the same moment, exactly one succeeds', async () => {
		const a = await person('twin-a', suffix);
		const b = await person('twin-b', suffix);
		const { id } = await createTeam(a.id, { name: `Twins ${suffix}` });
		await addMember(id, b.id, 'owner');
		const results = await Promise.allSettled([changeMemberRole(id, { userId: a.id, role: 'editor' }), changeMemberRole(id, { userId: b.id, role: 'editor' })]);
		expect(results.filter((r) => r.status === 'fulfilled')).toHaveLength(1);
		expect(results.filter((r) => r.status === 'rejected').map((r) => codeOf((r as PromiseRejectedResult).reason))).toEqual(['last-owner']);
		const owners = (await listTeamMembers(id)).filter((m) => m.role === 'owner');
		expect(owners).toHaveLength(1);
	});

	it('removing a member ends their membership and revokes their API tokens for that team only', async () => {
		const leaver = await person('leaver', suffix);
		await addMember(team.teamId, leaver.id, 'editor');
		const { id: ownTeam } = await createTeam(leaver.id, { name: `Leaver's own ${suffix}` });
		await createApiToken(leaver.id, team.teamId, { name: 'for the shared team' });
		await createApiToken(leaver.id, ownTeam, { name: 'for my own team' });
		await removeMember(team.teamId, { userId: leaver.id });
		expect(await roleOf(team.teamId, leaver.id)).toBeNull();
		expect((await listApiTokens(leaver.id)).map((t) => t.name)).toEqual(['for my own team']);
	});

	it('refuses to change or remove someone who is not a member', async () => {
		expect(codeOf(await changeMemberRole(team.teamId, { userId: team.outsider.id, role: 'viewer' }).catch((e: unknown) => e))).toBe('not-member');
		expect(codeOf(await removeMember(team.teamId, { userId: team.outsider.id }).catch((e: unknown) => e))).toBe('not-member');
		await expect(changeMemberRole(team.teamId, { userId: team.viewer.id, role: 'boss' })).rejects.toMatchObject({ name: 'InputError' });
	});
});
