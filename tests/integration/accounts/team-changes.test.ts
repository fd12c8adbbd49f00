// The team page's changes through runTeamChange: one success shape, one failure shape, the self-removal redirect.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addMember, person, teamWithRoles, uniqueSuffix, type TeamFixture } from './helpers/people';
import { call, identityFor, sessionFor } from './helpers/route-event';
import { findTeam, listTeamMembers, teamChangeForms } from '../../../src/lib/server/accounts';
import { closeDb } from '../../../src/lib/server/db';
import * as teamPage from '../../../src/routes/(app)/teams/[teamId]/+page.server';

const suffix = uniqueSuffix('team-changes');
let team: TeamFixture;

beforeAll(async () => {
	team = await teamWithRoles(suffix);
});
afterAll(async () => {
	await closeDb();
});

const asOwner = async (form: string, fields: Record<string, string>) =>
	call(teamPage.actions[form as keyof typeof teamPage.actions] as never, {
		identity: await identityFor(await sessionFor(team.owner.id)),
		path: `/teams/${team.teamId}?/${form}`,
		params: { teamId: team.teamId },
		form: fields
	});

describe('team changes', () => {
	it('gives the page one action per change, one per change form', () => {
		expect(Object.keys(teamPage.actions).sort()).toEqual([...teamChangeForms].sort());
	});

	it('answers a change that went through with the form and its sentence, and makes the change', async () => {
		const result = await asOwner('rename', { name: `Renamed team ${suffix}` });
		expect(result).toMatchObject({ outcome: 'ok', data: { form: 'rename', done: 'Team renamed.' } });
		expect((await findTeam(team.teamId))?.name).toBe(`Renamed team ${suffix}`);
	});

	it('answers bad input with 400 and the one failure shape the page reads: action, message, fieldErrors, values', async () => {
		const result = await asOwner('rename', { name: '' });
		expect(result.outcome).toBe(400);
		expect(result.data).toMatchObject({ action: 'rename', message: 'Please correct the marked fields.', values: { name: '' } });
		expect((result.data as { fieldErrors: { field: string }[] }).fieldErrors.map((e) => e.field)).toContain('name');
	});

	it('sends an owner who removes themself (another owner stays) to the team list', async () => {
		const second = await person('second-owner', suffix);
		await addMember(team.teamId, second.id, 'owner');
		const result = await asOwner('remove', { userId: team.owner.id });
		expect(result).toMatchObject({ outcome: 'ok', location: '/teams' });
		expect((await listTeamMembers(team.teamId)).map((m) => m.userId)).not.toContain(team.owner.id);
	});
});
