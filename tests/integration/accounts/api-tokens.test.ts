// Personal API tokens: the secret exists once, only its sha256 is stored, identify() accepts it and records its use, revoking ends it.
import { createHash } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AccountError, createApiToken, findOwnApiTokenTeam, listApiTokens, revokeApiToken } from '../../../src/lib/server/accounts';
import { closeDb } from '../../../src/lib/server/db';
import { roleInTeam } from '../../../src/lib/server/access/team-role';
import { findTokenRowById } from '../../../src/lib/server/db/token.queries';
import { getDb } from '../../../src/lib/server/db';
import { teamWithRoles, uniqueSuffix, type TeamFixture } from './helpers/people';
import { identityFor } from './helpers/route-event';

const suffix = uniqueSuffix('tokens');
let team: TeamFixture;

beforeAll(async () => {
	team = await teamWithRoles(suffix);
});
afterAll(closeDb);

describe('personal API tokens', () => {
	it('returns the secret once and stores only its sha256', async () => {
		const { id, secret } = await createApiToken(team.editor.id, team.teamId, { name: 'bench script' });
		expect(secret).toMatch(/^ff_[A-Za-z0-9_-]{32}$/);
		const row = await findTokenRowById(getDb(), id);
		// sha256 hex of the secret (FIPS 180-4 via node:crypto).
		expect(row?.token_hash).toBe(createHash('sha256').update(secret).digest('hex'));
		expect(JSON.stringify(row)).not.toContain(secret.slice(3));
		const listed = await listApiTokens(team.editor.id);
		expect(listed).toEqual([expect.objectContaining({ id, name: 'bench script', teamId: team.teamId, teamName: `Accounts team ${suffix}`, lastUsedAt: null })]);
		expect(JSON.stringify(listed)).not.toContain(secret.slice(3));
	});

	it('identify() accepts the token, scopes it to its team and records when it was last used', async () => {
		const { id, secret } = await createApiToken(team.viewer.id, team.teamId, { name: 'reader' });
		const before = Date.now();
		const identity = await identityFor(null, secret);
		expect(identity.user?.id).toBe(team.viewer.id);
		expect(identity.apiToken).toEqual({ id, teamId: team.teamId });
		expect(await roleInTeam(identity, team.teamId)).toBe('viewer');
		const used = (await listApiTokens(team.viewer.id)).find((t) => t.id === id)!;
		expect(used.lastUsedAt).not.toBeNull();
		expect(used.lastUsedAt!.getTime()).toBeGreaterThanOrEqual(before - 1000);
	});

	it('a token reaches only its own team, even when its owner belongs to another', async () => {
		const { secret } = await createApiToken(team.outsider.id, team.outsiderTeamId, { name: 'own team only' });
		const identity = await identityFor(null, secret);
		expect(await roleInTeam(identity, team.outsiderTeamId)).toBe('owner');
		expect(await roleInTeam(identity, team.teamId)).toBeNull();
	});

	it('revoking ends it at once; nobody else can revoke it', async () => {
		const { id, secret } = await createApiToken(team.owner.id, team.teamId, { name: 'to revoke' });
		expect(await findOwnApiTokenTeam(team.owner.id, id)).toBe(team.teamId);
		expect(await findOwnApiTokenTeam(team.editor.id, id)).toBeNull();
		await expect(revokeApiToken(team.editor.id, id)).rejects.toBeInstanceOf(AccountError);
		expect((await identityFor(null, secret)).user?.id).toBe(team.owner.id);
		await revokeApiToken(team.owner.id, id);
		expect((await identityFor(null, secret)).user).toBeNull();
		expect((await listApiTokens(team.owner.id)).map((t) => t.id)).not.toContain(id);
		expect(await findOwnApiTokenTeam(team.owner.id, id)).toBeNull();
	});

	it('refuses an empty or over-long name', async () => {
		await expect(createApiToken(team.owner.id, team.teamId, { name: '   ' })).rejects.toMatchObject({ name: 'InputError' });
		await expect(createApiToken(team.owner.id, team.teamId, { name: 'n'.repeat(61) })).rejects.toMatchObject({ name: 'InputError' });
	});
});
