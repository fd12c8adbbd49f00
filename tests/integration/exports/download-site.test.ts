// Abuse review item 16: a download GET writes an export record only for the user's own request — Sec-Fetch-Site
// same-origin, same-site or none (Fetch Metadata Request Headers, W3C), or no such header (scripts) — or an API
// token. A signed-in session's cross-site GET (an <img> or link on another site) is refused with 403 and records nothing.
import type { RequestEvent } from '@sveltejs/kit';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { emptyAxisDraft } from '../../../src/lib/schemas/sweep-plan';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { findRevision } from '../../../src/lib/server/designs';
import { saveSweepPlan } from '../../../src/lib/server/sweeps';
import * as uiExportRoute from '../../../src/routes/(app)/designs/[designId]/r/[label]/export/[format=format]/+server';
import * as uiPlanRoute from '../../../src/routes/(app)/designs/[designId]/r/[label]/sweeps/[planId]/export/+server';
import * as apiExportRoute from '../../../src/routes/api/v1/designs/[designId]/revisions/[label]/export/[format=format]/+server';
import * as apiSweepRoute from '../../../src/routes/api/v1/designs/[designId]/revisions/[label]/sweep/+server';
import * as apiPlanRoute from '../../../src/routes/api/v1/designs/[designId]/revisions/[label]/sweep-plans/[planId]/sweep/+server';
import { callRoute, createWorkspace, identityOf, type Workspace } from './workspace-fixture';

type Handler = (event: RequestEvent) => Response | Promise<Response>;

let ws: Workspace;
let planId: string;
beforeAll(async () => {
	ws = await createWorkspace('fetchsite');
	const revision = (await findRevision(getDb(), ws.designId, 'A'))!;
	planId = (await saveSweepPlan(getDb(), { revisionId: revision.id, userId: ws.people.editor.id, draft: { name: 'Height study', combine: 'grid', axes: [{ ...emptyAxisDraft('substrate.heightMm'), from: '1.5', to: '1.6', step: '0.05' }] } })).id;
});
afterAll(() => closeDb());

const recordCount = async () => Number((await getDb().selectFrom('export_record').select((eb) => eb.fn.countAll<string>().as('n')).where('design_id', '=', ws.designId).executeTakeFirstOrThrow()).n);

/** Every GET that delivers (and records) a download. */
const downloads: { name: string; handler: Handler; path: () => string; params: () => Record<string, string> }[] = [
	{ name: 'the app’s DXF download', handler: uiExportRoute.GET as Handler, path: () => `/designs/${ws.designId}/r/A/export/dxf`, params: () => ({ designId: ws.designId, label: 'A', format: 'dxf' }) },
	{ name: 'the app’s sweep-plan download', handler: uiPlanRoute.GET as Handler, path: () => `/designs/${ws.designId}/r/A/sweeps/${planId}/export`, params: () => ({ designId: ws.designId, label: 'A', planId }) },
	{ name: 'the API’s DXF export', handler: apiExportRoute.GET as Handler, path: () => `/api/v1/designs/${ws.designId}/revisions/A/export/dxf`, params: () => ({ designId: ws.designId, label: 'A', format: 'dxf' }) },
	{ name: 'the API’s sweep definition', handler: apiSweepRoute.GET as Handler, path: () => `/api/v1/designs/${ws.designId}/revisions/A/sweep`, params: () => ({ designId: ws.designId, label: 'A' }) },
	{ name: 'the API’s sweep-plan sweep', handler: apiPlanRoute.GET as Handler, path: () => `/api/v1/designs/${ws.designId}/revisions/A/sweep-plans/${planId}/sweep`, params: () => ({ designId: ws.designId, label: 'A', planId }) }
];

/** Sec-Fetch-Site as a browser sends it (null: no header, as from curl or a script) → recorded or refused. */
const sessionCases: { site: string | null; status: number; recorded: number; outcome: string }[] = [
	{ site: 'same-origin', status: 200, recorded: 1, outcome: 'records one export' }, // a link or fetch on our own pages
	{ site: 'same-site', status: 200, recorded: 1, outcome: 'records one export' }, // a sibling subdomain of the same site
	{ site: 'none', status: 200, recorded: 1, outcome: 'records one export' }, // the user's own navigation: typed address, bookmark
	{ site: null, status: 200, recorded: 1, outcome: 'records one export' }, // no Fetch Metadata: a script with the cookie, or an old browser
	{ site: 'cross-site', status: 403, recorded: 0, outcome: 'records nothing' } // an <img>, a link or a form on another site
];

describe.each(downloads)('$name', ({ handler, path, params }) => {
	it.each(sessionCases)('with a session and Sec-Fetch-Site $site answers $status and $outcome', async ({ site, status, recorded }) => {
		const identity = await identityOf(ws, 'viewer', 'session');
		const before = await recordCount();
		const res = await callRoute(handler, { identity, path: path(), params: params(), headers: site === null ? {} : { 'sec-fetch-site': site } });
		expect(res.status).toBe(status);
		expect(await recordCount()).toBe(before + recorded);
		if (status === 403) expect(await res.text()).toMatch(/export log/);
	});

	it('with an API token is served and recorded even when the request says cross-site', async () => {
		const identity = await identityOf(ws, 'viewer', 'token');
		const before = await recordCount();
		const res = await callRoute(handler, { identity, path: path(), params: params(), headers: { 'sec-fetch-site': 'cross-site' } });
		expect(res.status).toBe(200);
		expect(await recordCount()).toBe(before + 1);
	});
});
