// Fab profiles per team against the real PostgreSQL: the built-in for everyone without a row, team profiles validated by
// the schema, the /fab-profiles page by role, the revision column set at insert and never changed.
import { sql } from 'kysely';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { saveRevision } from '../../../src/lib/server/designs/save-revision';
import { addFabProfile, BUILT_IN_FAB_PROFILE_ID, listFabProfiles, matchingFabProfileId, resolveFabProfileChoice, revisionFabProfile } from '../../../src/lib/server/fab-profiles';
import { InputError } from '../../../src/lib/schemas';
import { STANDARD_QUICK_TURN_PROFILE } from '../../../src/lib/schemas/fab-profile';
import * as page from '../../../src/routes/(app)/fab-profiles/+page.server';
import * as tolerancePage from '../../../src/routes/(app)/designs/[designId]/r/[label]/tolerance/+page.server';
import { call } from '../accounts/helpers/route-event';
import { createWorkspace, demoInput, identityOf, type Workspace } from '../exports/workspace-fixture';

let ws: Workspace;
beforeAll(async () => {
	ws = await createWorkspace('fabp');
});
afterAll(() => closeDb());

const eightMil = (name: string) => ({ ...STANDARD_QUICK_TURN_PROFILE, name, minTraceWidthMm: 0.2, minSpacingMm: 0.2, minSlotWidthMm: 0.25 });

describe('a team’s fab profiles', () => {
	it('always start with the built-in profile, which needs no row', async () => {
		const list = await listFabProfiles(getDb(), ws.otherTeamId);
		expect(list).toEqual([{ id: BUILT_IN_FAB_PROFILE_ID, profile: STANDARD_QUICK_TURN_PROFILE, builtIn: true }]);
	});

	it('add a validated profile, listed for that team only, resolvable by id', async () => {
		const added = await addFabProfile(getDb(), { teamId: ws.teamId, userId: ws.people.editor.id, raw: eightMil(`8 mil ${ws.suffix}`) });
		const list = await listFabProfiles(getDb(), ws.teamId);
		expect(list.map((p) => p.profile.name)).toEqual([STANDARD_QUICK_TURN_PROFILE.name, `8 mil ${ws.suffix}`]);
		expect((await listFabProfiles(getDb(), ws.otherTeamId)).length).toBe(1);
		expect(await resolveFabProfileChoice(getDb(), ws.teamId, added.id)).toEqual(eightMil(`8 mil ${ws.suffix}`));
		expect(matchingFabProfileId(list, eightMil(`8 mil ${ws.suffix}`))).toBe(added.id);
		// another team cannot pick it
		await expect(resolveFabProfileChoice(getDb(), ws.otherTeamId, added.id)).rejects.toBeInstanceOf(InputError);
	});

	it.each([
		// a minimum below the schema's range (src/lib/schemas/fab-profile.ts)
		{ name: 'a trace under 0.01 mm', raw: { ...eightMil('tiny'), minTraceWidthMm: 0.001 }, path: 'minTraceWidthMm' },
		// a notch narrower than the spacing, refused by the schema's cross-check
		{ name: 'a slot narrower than the spacing', raw: { ...eightMil('slot'), minSlotWidthMm: 0.1 }, path: 'minSlotWidthMm' },
		// the built-in's name is taken by the built-in
		{ name: 'the built-in’s name', raw: { ...STANDARD_QUICK_TURN_PROFILE }, path: 'name' }
	])('refuse $name with an InputError on its field, writing nothing', async ({ raw, path }) => {
		const before = (await listFabProfiles(getDb(), ws.teamId)).length;
		const err = await addFabProfile(getDb(), { teamId: ws.teamId, userId: ws.people.editor.id, raw }).catch((e) => e);
		expect(err).toBeInstanceOf(InputError);
		expect((err as InputError).first.path).toBe(path);
		expect((await listFabProfiles(getDb(), ws.teamId)).length).toBe(before);
	});

	it('refuse a second profile of the same name in one team', async () => {
		await addFabProfile(getDb(), { teamId: ws.teamId, userId: ws.people.owner.id, raw: eightMil(`Twice ${ws.suffix}`) });
		const err = await addFabProfile(getDb(), { teamId: ws.teamId, userId: ws.people.owner.id, raw: eightMil(`Twice ${ws.suffix}`) }).catch((e) => e);
		expect((err as InputError).first.path).toBe('name');
	});
});

describe('the /fab-profiles page', () => {
	const form = (name: string) => ({ teamId: ws.teamId, name, ...Object.fromEntries(Object.entries(eightMil(name)).filter(([k]) => k !== 'name').map(([k, v]) => [k, String(v)])) });

	it.each([
		['viewer', false],
		['editor', true],
		['owner', true]
	] as const)('shows the list to a %s (may add: %s)', async (who, canAdd) => {
		const r = await call(page.load as never, { identity: await identityOf(ws, who, 'session'), path: '/fab-profiles' });
		expect(r.outcome).toBe('ok');
		const data = r.data as { profiles: { builtIn: boolean }[]; canAdd: boolean };
		expect(data.profiles[0].builtIn).toBe(true);
		expect(data.canAdd).toBe(canAdd);
	});

	it.each([
		['viewer', 403],
		['non-member', 404],
		['editor', 'ok']
	] as const)('add action for a %s: %s', async (who, outcome) => {
		const name = `Page ${who} ${ws.suffix}`;
		const r = await call(page.actions.add as never, { identity: await identityOf(ws, who, 'session'), path: '/fab-profiles?/add', form: form(name) });
		expect(r.outcome).toBe(outcome);
		const names = (await listFabProfiles(getDb(), ws.teamId)).map((p) => p.profile.name);
		expect(names.includes(name)).toBe(outcome === 'ok');
	});

	it('add action answers 400 with the field’s issue and keeps what was typed', async () => {
		const r = await call(page.actions.add as never, { identity: await identityOf(ws, 'editor', 'session'), path: '/fab-profiles?/add', form: { ...form(`Bad ${ws.suffix}`), minDrillMm: 'abc' } });
		expect(r.outcome).toBe(400);
		const data = r.data as { values: Record<string, string>; fieldErrors: { field: string; message: string }[] };
		expect(data.fieldErrors[0].field).toBe('minDrillMm');
		expect(data.fieldErrors[0].message).toMatch(/allowed range \[0.01, 10\] mm/);
		expect(data.values.minDrillMm).toBe('abc');
	});
});

describe('the legend rules on the /fab-profiles page', () => {
	const form = (name: string) => ({ teamId: ws.teamId, name, ...Object.fromEntries(Object.entries(eightMil(name)).filter(([k]) => k !== 'name').map(([k, v]) => [k, String(v)])) });

	it('stores the legend rules typed, leaves blank ones out (the defaults then apply) and refuses junk', async () => {
		const who = await identityOf(ws, 'editor', 'session');
		const name = `Legend ${ws.suffix}`;
		const ok = await call(page.actions.add as never, { identity: who, path: '/fab-profiles?/add', form: { ...form(name), minLegendWidthMm: '0.12', legendToOpeningMm: '', legendToEdgeMm: '0.3' } });
		expect(ok.outcome).toBe('ok');
		const stored = (await listFabProfiles(getDb(), ws.teamId)).find((p) => p.profile.name === name)!.profile;
		expect(stored.minLegendWidthMm).toBe(0.12);
		expect(stored.legendToEdgeMm).toBe(0.3);
		expect(stored).not.toHaveProperty('legendToOpeningMm');
		const bad = await call(page.actions.add as never, { identity: who, path: '/fab-profiles?/add', form: { ...form(`Legend bad ${ws.suffix}`), minLegendWidthMm: '9' } });
		expect(bad.outcome).toBe(400);
		expect((bad.data as { fieldErrors: { field: string }[] }).fieldErrors[0].field).toBe('minLegendWidthMm');
	});
});

describe('revision.fab_profile', () => {
	it('defaults to the code’s built-in profile (the migration’s copy has not drifted)', async () => {
		const row = await getDb().selectFrom('revision').select('fab_profile').where('design_id', '=', ws.designId).where('label', '=', 'A').executeTakeFirstOrThrow();
		expect(row.fab_profile).toEqual(STANDARD_QUICK_TURN_PROFILE);
	});

	it('records the chosen values at insert and refuses any later change (immutable revisions)', async () => {
		const saved = await saveRevision(getDb(), { designId: ws.designId, parentLabel: 'A', userId: ws.people.editor.id, raw: demoInput(`Bench patch ${ws.suffix}`), fabProfile: eightMil(`Recorded ${ws.suffix}`) });
		expect(await revisionFabProfile(getDb(), saved.id)).toEqual({ profile: eightMil(`Recorded ${ws.suffix}`), recorded: true });
		await expect(sql`update revision set fab_profile = null where id = ${saved.id}`.execute(getDb())).rejects.toThrow(/immutable/);
	});

	it('gives the tolerance study the etch tolerance of the profile the revision recorded (the one its fab notes print)', async () => {
		const house = { ...eightMil(`Etch ${ws.suffix}`), etchToleranceMm: 0.035 };
		const saved = await saveRevision(getDb(), { designId: ws.designId, parentLabel: 'A', userId: ws.people.editor.id, raw: demoInput(`Bench patch ${ws.suffix}`), fabProfile: house });
		const r = await call(tolerancePage.load as never, { identity: await identityOf(ws, 'viewer', 'session'), path: `/designs/${ws.designId}/r/${saved.label}/tolerance`, params: { designId: ws.designId, label: saved.label } });
		expect(r.outcome).toBe('ok');
		expect((r.data as { fabProfile: unknown }).fabProfile).toMatchObject({ name: house.name, etchToleranceMm: house.etchToleranceMm, switched: false });
	});

	it('reads a revision older than the gate (NULL) as the built-in, marked as not recorded', async () => {
		expect(await revisionFabProfile(getDb(), 'no-such-revision')).toEqual({ profile: STANDARD_QUICK_TURN_PROFILE, recorded: false });
	});
});
