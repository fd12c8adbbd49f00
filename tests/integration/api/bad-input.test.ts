// Bad input to /api/v1 is a 4xx naming the field (never a 5xx), and writes nothing.
import type { RequestEvent } from '@sveltejs/kit';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, getDb } from '../../../src/lib/server/db';
import * as teamDesignsRoute from '../../../src/routes/api/v1/teams/[teamId]/designs/+server';
import * as teamExportsRoute from '../../../src/routes/api/v1/teams/[teamId]/exports/+server';
import * as designRoute from '../../../src/routes/api/v1/designs/[designId]/+server';
import * as revisionsRoute from '../../../src/routes/api/v1/designs/[designId]/revisions/+server';
import * as revisionRoute from '../../../src/routes/api/v1/designs/[designId]/revisions/[label]/+server';
import * as sizeRoute from '../../../src/routes/api/v1/size/+server';
import { callRoute, createWorkspace, demoInput, identityOf, type Workspace } from '../exports/workspace-fixture';

type Handler = (event: RequestEvent) => Response | Promise<Response>;
let ws: Workspace;
beforeAll(async () => {
	ws = await createWorkspace('badin');
});
afterAll(() => closeDb());

async function call(handler: unknown, path: string, params: Record<string, string>, extra: { method?: string; body?: unknown; rawBody?: string; contentType?: string } = {}) {
	const identity = await identityOf(ws, 'editor', 'token');
	const res = await callRoute(handler as Handler, { identity, path, params, ...extra });
	return { status: res.status, body: await res.json() };
}

describe('bad input to /api/v1', () => {
	const cases: { name: string; run: () => ReturnType<typeof call>; status: number; path: string; message: RegExp }[] = [
		// Bounds from src/lib/schemas/design-input.ts: frequencyHz in [100e6, 100e9].
		{ name: 'a frequency out of range for sizing', run: () => call(sizeRoute.POST, '/api/v1/size', {}, { method: 'POST', body: { ...demoInput(), frequencyHz: 5 } }), status: 400, path: 'frequencyHz', message: /allowed range/ },
		{ name: 'a body that is not JSON', run: () => call(sizeRoute.POST, '/api/v1/size', {}, { method: 'POST', rawBody: '{"frequencyHz": 2.4e9,' }), status: 400, path: '', message: /not valid JSON/ },
		{ name: 'a body sent as text', run: () => call(sizeRoute.POST, '/api/v1/size', {}, { method: 'POST', rawBody: 'hello', contentType: 'text/plain' }), status: 400, path: '', message: /must be JSON/ },
		{ name: 'an unknown field in the document', run: () => call(sizeRoute.POST, '/api/v1/size', {}, { method: 'POST', body: { ...demoInput(), colour: 'red' } }), status: 400, path: '', message: /unknown field\(s\): colour/ },
		{ name: 'a page size over 100', run: () => call(teamExportsRoute.GET, `/api/v1/teams/${ws.teamId}/exports?pageSize=1000`, { teamId: ws.teamId }), status: 400, path: 'pageSize', message: /\[1, 100\]/ },
		{ name: 'a page that is not a number', run: () => call(teamExportsRoute.GET, `/api/v1/teams/${ws.teamId}/exports?page=two`, { teamId: ws.teamId }), status: 400, path: 'page', message: /whole number/ },
		{ name: 'an unknown sort key', run: () => call(teamExportsRoute.GET, `/api/v1/teams/${ws.teamId}/exports?sort=colour`, { teamId: ws.teamId }), status: 400, path: 'sort', message: /./ },
		{ name: 'an unknown query key', run: () => call(teamExportsRoute.GET, `/api/v1/teams/${ws.teamId}/exports?limit=3`, { teamId: ws.teamId }), status: 400, path: '', message: /limit/ },
		{ name: 'a design id with spaces', run: () => call(designRoute.GET, '/api/v1/designs/a%20b', { designId: 'a b' }), status: 400, path: 'designId', message: /letters, digits/ },
		{ name: 'a revision label that cannot be one', run: () => call(revisionRoute.GET, `/api/v1/designs/${ws.designId}/revisions/--`, { designId: ws.designId, label: '--' }), status: 400, path: 'label', message: /1–16/ },
		{
			name: 'a new design with a bad substrate',
			run: () => call(teamDesignsRoute.POST, `/api/v1/teams/${ws.teamId}/designs`, { teamId: ws.teamId }, { method: 'POST', body: { input: { ...demoInput(), substrate: { relativePermittivity: 0.5, heightMm: 1.5 } } } }),
			status: 400,
			path: 'input.substrate.relativePermittivity',
			message: /allowed range/
		},
		{
			name: 'a new revision from a parent that does not exist',
			run: () => call(revisionsRoute.POST, `/api/v1/designs/${ws.designId}/revisions`, { designId: ws.designId }, { method: 'POST', body: { parent: 'Q', input: demoInput() } }),
			status: 400,
			path: 'parent',
			message: /label of a revision/
		},
		{ name: 'a new revision without its input', run: () => call(revisionsRoute.POST, `/api/v1/designs/${ws.designId}/revisions`, { designId: ws.designId }, { method: 'POST', body: { parent: 'A' } }), status: 400, path: 'input', message: /./ }
	];

	it.each(cases)('answers $name with $status naming "$path"', async ({ run, status, path, message }) => {
		const res = await run();
		expect(res.status).toBe(status);
		expect(res.body.issues[0].path).toBe(path);
		expect(res.body.issues[0].message).toMatch(message);
	});

	it('writes no design and no revision for refused input', async () => {
		const count = async () =>
			Number((await getDb().selectFrom('design').select((eb) => eb.fn.countAll<string>().as('n')).where('team_id', '=', ws.teamId).executeTakeFirstOrThrow()).n);
		const revisions = async () => Number((await getDb().selectFrom('revision').select((eb) => eb.fn.countAll<string>().as('n')).where('design_id', '=', ws.designId).executeTakeFirstOrThrow()).n);
		const before = [await count(), await revisions()];
		for (const c of cases) await c.run();
		expect([await count(), await revisions()]).toEqual(before);
	});

	it('answers a revision that does not exist with 404', async () => {
		const res = await call(revisionRoute.GET, `/api/v1/designs/${ws.designId}/revisions/Z`, { designId: ws.designId, label: 'Z' });
		expect(res.status).toBe(404);
		expect(res.body.error).toMatch(/Revision Z not found/);
	});

	it('sizes a good document statelessly and returns the sized design', async () => {
		const res = await call(sizeRoute.POST, '/api/v1/size', {}, { method: 'POST', body: demoInput() });
		expect(res.status).toBe(200);
		expect(res.body.frequencyHz).toBe(2.45e9);
		expect(res.body.patch.kind).toBe('rectangular');
		// The transmission-line model puts a 2.45 GHz patch on εr 3.55 near λ0/(2√εr) ≈ 32.5 mm long (Balanis, Antenna Theory, §14.2); fringing makes it shorter.
		expect(res.body.patch.lengthMm).toBeGreaterThan(28);
		expect(res.body.patch.lengthMm).toBeLessThan(33);
	});
});
