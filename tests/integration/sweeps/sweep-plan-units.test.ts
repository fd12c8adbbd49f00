// The sweep page's save action with a form typed in mil, against the real PostgreSQL: the stored plan is in mm and equals
// the one the mm equivalent stores (1 mil = 0.0254 mm exactly, 1959 international yard and pound agreement); a post that
// names no unit is read in mm as before; text the unit parser refuses is a 400 beside its row with nothing stored.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { createDesign, findRevision } from '../../../src/lib/server/designs';
import * as sweepsPage from '../../../src/routes/(app)/designs/[designId]/r/[label]/sweeps/+page.server';
import { createTestTeam, sampleInput, type TestTeam } from '../designs/test-team';

const db = getDb();
let team: TestTeam;
let designId: string;
let revisionId: string;

beforeAll(async () => {
	team = await createTestTeam(db, 'sweepunits');
	designId = (await createDesign(db, { teamId: team.teamId, userId: team.users.editor.id, raw: sampleInput({ name: `Sweep units ${team.suffix}` }) })).design.id;
	revisionId = (await findRevision(db, designId, 'A'))!.id;
});
afterAll(() => closeDb());

function event(form: Record<string, string>) {
	const u = team.users.editor;
	const user = { id: u.id, email: u.email, displayName: u.displayName };
	const url = new URL(`http://127.0.0.1/designs/${designId}/r/A/sweeps?/save`);
	return {
		locals: { user, sessionId: 'test', apiToken: null, identity: { user, sessionId: 'test', apiToken: null } },
		url,
		params: { designId, label: 'A' },
		cookies: { get: () => undefined, set: () => undefined, getAll: () => [], delete: () => undefined, serialize: () => '' },
		request: new Request(url, { method: 'POST', body: new URLSearchParams(form), headers: { 'content-type': 'application/x-www-form-urlencoded' } })
	} as never;
}

type Result = { saved?: { id: string; pointCount: number }; status?: number; data?: { fieldErrors: { field: string; message: string }[]; values: { axes: { from: string }[] } } };
const save = async (form: Record<string, string>) => (await sweepsPage.actions.save(event({ name: 'Thickness', combine: 'grid', mode: 'resize', ...form }))) as Result;
const storedPlan = async (id: string) => (await db.selectFrom('sweep_plan').select('plan').where('id', '=', id).executeTakeFirstOrThrow()).plan as { axes: Record<string, unknown>[] };
const planCount = async () => (await db.selectFrom('sweep_plan').select(db.fn.countAll<string>().as('n')).where('revision_id', '=', revisionId).executeTakeFirstOrThrow()).n;

describe('saving a sweep plan typed in the person’s length unit', () => {
	it('stores a thickness range typed in mil as the same mm plan as its mm equivalent, εr rows untouched', async () => {
		const common = { 'axes.1.field': 'substrate.relativePermittivity', 'axes.1.from': '4.3', 'axes.1.to': '4.5', 'axes.1.step': '0.1' };
		const mil = await save({ lengthUnit: 'mil', 'axes.0.field': 'substrate.heightMm', 'axes.0.from': '31', 'axes.0.to': '62', 'axes.0.step': '31', ...common });
		const mm = await save({ lengthUnit: 'mm', 'axes.0.field': 'substrate.heightMm', 'axes.0.from': '0.7874', 'axes.0.to': '1.5748', 'axes.0.step': '0.7874', ...common });
		expect(mil.saved?.pointCount).toBe(6);
		expect(mm.saved?.pointCount).toBe(6);
		const [a, b] = [await storedPlan(mil.saved!.id), await storedPlan(mm.saved!.id)];
		expect(a).toEqual(b);
		expect(a.axes[0]).toEqual({ field: 'substrate.heightMm', from: 0.7874, to: 1.5748, step: 0.7874 });
		expect(a.axes[1]).toEqual({ field: 'substrate.relativePermittivity', from: 4.3, to: 4.5, step: 0.1 });
	});

	it('reads a post that names no unit in mm, as forms and scripts from before did', async () => {
		const r = await save({ 'axes.0.field': 'substrate.heightMm', 'axes.0.from': '0.8', 'axes.0.to': '1.6', 'axes.0.step': '0.4' });
		expect((await storedPlan(r.saved!.id)).axes[0]).toEqual({ field: 'substrate.heightMm', from: 0.8, to: 1.6, step: 0.4 });
	});

	it('lets "8 mil" win over the posted mm unit, and refuses an unknown unit with a 400 on its row, storing nothing', async () => {
		const r = await save({ lengthUnit: 'mm', 'axes.0.field': 'overrides.insetDepthMm', mode: 'hold-geometry', 'axes.0.mode': 'list', 'axes.0.values': '160 mil, 4 mm' });
		expect((await storedPlan(r.saved!.id)).axes[0]).toEqual({ field: 'overrides.insetDepthMm', values: [4.064, 4] });
		const before = await planCount();
		const bad = await save({ lengthUnit: 'mil', 'axes.0.field': 'substrate.heightMm', 'axes.0.from': '31 furlong', 'axes.0.to': '62', 'axes.0.step': '31' });
		expect(bad.status).toBe(400);
		expect(bad.data!.fieldErrors.some((e) => e.field.startsWith('axes.0'))).toBe(true);
		expect(bad.data!.values.axes[0].from).toBe('31 furlong');
		expect(await planCount()).toBe(before);
	});
});
