// The revision page checks a revision against another of the team's fab profiles on request (?profile=<id>) without
// saving anything: the verdict follows the chosen profile, the recorded one stays the revision's (and its downloads').
import { isHttpError } from '@sveltejs/kit';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildArtwork } from '../../../src/lib/artwork';
import { checkArtwork } from '../../../src/lib/drc';
import type { SizedDesign } from '../../../src/lib/rf';
import { STANDARD_QUICK_TURN_PROFILE, type FabProfile } from '../../../src/lib/schemas/fab-profile';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { addFabProfile } from '../../../src/lib/server/fab-profiles';
import * as revisionPage from '../../../src/routes/(app)/designs/[designId]/r/[label]/+page.server';
import * as tolerancePage from '../../../src/routes/(app)/designs/[designId]/r/[label]/tolerance/+page.server';
import { createWorkspace, type Workspace } from '../exports/workspace-fixture';

let ws: Workspace;
let strictId: string;
// A house that cannot etch a line narrower than 6 mm: the 50 Ω feed of the demo patch (about 3.4 mm on εr 3.55,
// 1.524 mm) breaks it. Demo data, not a real board house; etch ±0.1 mm to tell its tolerance apart.
const strict = (name: string): FabProfile => ({ ...STANDARD_QUICK_TURN_PROFILE, name, minTraceWidthMm: 6, etchToleranceMm: 0.1 });

beforeAll(async () => {
	ws = await createWorkspace('pswitch');
	strictId = (await addFabProfile(getDb(), { teamId: ws.teamId, userId: ws.people.owner.id, raw: strict(`Wide lines only ${ws.suffix}`) })).id;
});
afterAll(() => closeDb());

function event(path: string, params: Record<string, string>) {
	const u = ws.people.viewer;
	const user = { id: u.id, email: u.email, displayName: u.displayName };
	const url = new URL(`http://127.0.0.1${path}`);
	return {
		locals: { user, sessionId: u.sessionId, apiToken: null, identity: { user, sessionId: u.sessionId, apiToken: null } },
		url,
		params,
		cookies: { get: () => undefined, set: () => undefined, getAll: () => [], delete: () => undefined, serialize: () => '' },
		request: new Request(url),
		parent: async () => ({}),
		depends: () => undefined
	} as never;
}

type Loaded = { revision: { results: SizedDesign }; fabCheck: { profile: FabProfile; recorded: FabProfile; switched: boolean; chosenId: string; choices: { id: string }[] } };
const load = async (query: string) => (await revisionPage.load(event(`/designs/${ws.designId}/r/A${query}`, { designId: ws.designId, label: 'A' }))) as unknown as Loaded;
const verdict = (d: Loaded) => checkArtwork(buildArtwork(d.revision.results), d.fabCheck.profile).map((v) => v.ruleId);

describe('switching the fab profile on the revision page', () => {
	it('checks against the recorded profile by default, and the demo patch passes it', async () => {
		const d = await load('');
		expect(d.fabCheck).toMatchObject({ profile: STANDARD_QUICK_TURN_PROFILE, recorded: STANDARD_QUICK_TURN_PROFILE, switched: false, chosenId: '' });
		expect(d.fabCheck.choices.map((c) => c.id)).toContain(strictId);
		expect(verdict(d)).toEqual([]);
	});

	it('checks the same revision against another of the team’s profiles, which it fails, and says so', async () => {
		const d = await load(`?profile=${strictId}`);
		expect(d.fabCheck).toMatchObject({ profile: strict(`Wide lines only ${ws.suffix}`), recorded: STANDARD_QUICK_TURN_PROFILE, switched: true, chosenId: strictId });
		expect(verdict(d)).toContain('trace-width');
	});

	it('saves nothing: the recorded profile is unchanged afterwards', async () => {
		await load(`?profile=${strictId}`);
		expect((await load('')).fabCheck.profile).toEqual(STANDARD_QUICK_TURN_PROFILE);
	});

	it('refuses a profile that is not the team’s with 400', async () => {
		const err = await load('?profile=no-such-profile').catch((e: unknown) => e);
		expect(isHttpError(err) && err.status).toBe(400);
	});

	it('gives the tolerance study the chosen profile’s etch tolerance, and the recorded one’s without a choice', async () => {
		const params = { designId: ws.designId, label: 'A' };
		const chosen = (await tolerancePage.load(event(`/designs/${ws.designId}/r/A/tolerance?profile=${strictId}`, params))) as unknown as { fabProfile: { etchToleranceMm: number } };
		const recorded = (await tolerancePage.load(event(`/designs/${ws.designId}/r/A/tolerance`, params))) as unknown as { fabProfile: { etchToleranceMm: number } };
		expect([chosen.fabProfile.etchToleranceMm, recorded.fabProfile.etchToleranceMm]).toEqual([0.1, STANDARD_QUICK_TURN_PROFILE.etchToleranceMm]);
	});
});
