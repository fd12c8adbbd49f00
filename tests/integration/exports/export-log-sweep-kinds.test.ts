// Abuse review item 17: the design's sweep definition and a saved plan's sweep are different downloads. The log
// records a plan's as 'sweep-plan' with its plan, and "matches an earlier export" compares only like with like.
import type { RequestEvent } from '@sveltejs/kit';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { emptyAxisDraft } from '../../../src/lib/schemas/sweep-plan';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { findRevision } from '../../../src/lib/server/designs';
import type { ExportLogEntry } from '../../../src/lib/server/exports';
import { saveSweepPlan } from '../../../src/lib/server/sweeps';
import * as teamExportsRoute from '../../../src/routes/api/v1/teams/[teamId]/exports/+server';
import * as apiSweepRoute from '../../../src/routes/api/v1/designs/[designId]/revisions/[label]/sweep/+server';
import * as apiPlanRoute from '../../../src/routes/api/v1/designs/[designId]/revisions/[label]/sweep-plans/[planId]/sweep/+server';
import { callRoute, createWorkspace, identityOf, type Workspace } from './workspace-fixture';

type Handler = (event: RequestEvent) => Response | Promise<Response>;

let ws: Workspace;
const plans: Record<'height' | 'permittivity', string> = { height: '', permittivity: '' };

beforeAll(async () => {
	ws = await createWorkspace('sweepkind');
	const revisionId = (await findRevision(getDb(), ws.designId, 'A'))!.id;
	const save = (name: string, field: string, from: string, to: string, step: string) =>
		saveSweepPlan(getDb(), { revisionId, userId: ws.people.editor.id, draft: { name, combine: 'grid', axes: [{ ...emptyAxisDraft(field), from, to, step }] } });
	plans.height = (await save('Height study', 'substrate.heightMm', '1.5', '1.6', '0.05')).id;
	plans.permittivity = (await save('Permittivity study', 'substrate.relativePermittivity', '3.4', '3.6', '0.1')).id;
});
afterAll(() => closeDb());

async function get(handler: Handler, path: string, params: Record<string, string>): Promise<string> {
	const res = await callRoute(handler, { identity: await identityOf(ws, 'viewer', 'token'), path, params });
	expect(res.status).toBe(200);
	return res.headers.get('x-export-id')!;
}
const designSweep = () => get(apiSweepRoute.GET as Handler, `/api/v1/designs/${ws.designId}/revisions/A/sweep`, { designId: ws.designId, label: 'A' });
const planSweep = (planId: string) => get(apiPlanRoute.GET as Handler, `/api/v1/designs/${ws.designId}/revisions/A/sweep-plans/${planId}/sweep`, { designId: ws.designId, label: 'A', planId });

async function log(query = ''): Promise<ExportLogEntry[]> {
	const res = await callRoute(teamExportsRoute.GET as Handler, {
		identity: await identityOf(ws, 'viewer', 'token'),
		path: `/api/v1/teams/${ws.teamId}/exports?designId=${ws.designId}&pageSize=100${query}`,
		params: { teamId: ws.teamId }
	});
	expect(res.status).toBe(200);
	return ((await res.json()) as { items: ExportLogEntry[] }).items;
}
const entry = async (id: string) => (await log()).find((e) => e.id === id)!;

describe('sweep downloads in the export log', () => {
	it("records a plan's sweep as 'sweep-plan' with its plan, and does not compare it with the design's sweep", async () => {
		const design = await designSweep();
		const plan = await planSweep(plans.height);
		expect(await entry(design)).toMatchObject({ kind: 'sweep', sweepPlan: null, earlier: null });
		expect(await entry(plan)).toMatchObject({ kind: 'sweep-plan', sweepPlan: { id: plans.height, name: 'Height study' }, earlier: null });
	});

	it('marks a re-export of the same plan as matching the earlier one', async () => {
		const first = (await log()).find((e) => e.sweepPlan?.id === plans.height)!;
		const again = await planSweep(plans.height);
		expect((await entry(again)).earlier).toEqual({ exportId: first.id, createdAt: first.createdAt, matches: true });
	});

	it("does not compare one plan's sweep with another plan's", async () => {
		const other = await planSweep(plans.permittivity);
		expect(await entry(other)).toMatchObject({ kind: 'sweep-plan', sweepPlan: { id: plans.permittivity }, earlier: null });
	});

	it('marks a re-export of the design sweep as matching the design sweep, not a plan', async () => {
		const again = await designSweep();
		const earlier = (await entry(again)).earlier!;
		expect(earlier.matches).toBe(true);
		expect((await entry(earlier.exportId)).kind).toBe('sweep');
	});

	it("filters the log by kind: 'sweep-plan' and 'sweep' are apart", async () => {
		const planned = await log('&kind=sweep-plan');
		expect(planned.length).toBe(3);
		expect(planned.every((e) => e.kind === 'sweep-plan' && e.sweepPlan !== null)).toBe(true);
		const design = await log('&kind=sweep');
		expect(design.length).toBe(2);
		expect(design.every((e) => e.kind === 'sweep' && e.sweepPlan === null)).toBe(true);
	});
});
