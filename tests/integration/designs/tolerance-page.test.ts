// The tolerance page's etch default against the real PostgreSQL: it is the etch tolerance of the fab profile recorded
// with the revision, not the built-in profile's (a revision saved for a coarse fab starts its study with that fab's ±).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { saveRevision } from '../../../src/lib/server/designs/save-revision';
import { STANDARD_QUICK_TURN_PROFILE } from '../../../src/lib/schemas/fab-profile';
import * as tolerancePage from '../../../src/routes/(app)/designs/[designId]/r/[label]/tolerance/+page.server';
import { call } from '../accounts/helpers/route-event';
import { createWorkspace, demoInput, identityOf, type Workspace } from '../exports/workspace-fixture';

let ws: Workspace;
let coarse = 'B';
beforeAll(async () => {
	ws = await createWorkspace('tol');
	// demo data: a fab that holds copper edges to ±0.1 mm, twice the built-in's ±0.05 mm
	const fabProfile = { ...STANDARD_QUICK_TURN_PROFILE, name: `Coarse etch ${ws.suffix}`, etchToleranceMm: 0.1 };
	coarse = (await saveRevision(getDb(), { designId: ws.designId, parentLabel: 'A', userId: ws.people.editor.id, raw: demoInput(`Bench patch ${ws.suffix}`), note: 'coarse fab', fabProfile })).label;
});
afterAll(() => closeDb());

const load = async (label: string) =>
	call(tolerancePage.load as never, { identity: await identityOf(ws, 'viewer', 'session'), path: `/designs/${ws.designId}/r/${label}/tolerance`, params: { designId: ws.designId, label } });

describe('the tolerance page', () => {
	it('starts from the etch tolerance of the profile recorded with the revision', async () => {
		const r = await load(coarse);
		expect(r.outcome).toBe('ok');
		expect((r.data as { fabProfile: unknown }).fabProfile).toMatchObject({ name: `Coarse etch ${ws.suffix}`, etchToleranceMm: 0.1, switched: false });
	});

	it('starts from the built-in profile for a revision saved with it', async () => {
		const r = await load('A');
		expect((r.data as { fabProfile: unknown }).fabProfile).toMatchObject({ name: STANDARD_QUICK_TURN_PROFILE.name, etchToleranceMm: STANDARD_QUICK_TURN_PROFILE.etchToleranceMm, switched: false });
	});
});
