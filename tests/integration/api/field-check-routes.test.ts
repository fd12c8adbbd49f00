// The field-check routes × {anonymous, non-member, viewer, editor, owner}, by session and by API token; their bad input;
// and what a started check looks like from the API (202, Location, a status that parses).
import type { RequestEvent } from '@sveltejs/kit';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { findDesign, findRevision } from '../../../src/lib/server/designs';
import { cancelOpenFieldChecks } from '../jobs/helpers/open-checks';
import { startFieldCheck } from '../../../src/lib/server/field-checks';
import { stopQueue } from '../../../src/lib/server/jobs';
import { fieldCheckStatusSchema } from '../../../src/lib/schemas/api';
import * as simulationsRoute from '../../../src/routes/api/v1/designs/[designId]/revisions/[label]/simulations/+server';
import * as statusRoute from '../../../src/routes/api/v1/simulations/[id]/+server';
import * as cancelRoute from '../../../src/routes/api/v1/simulations/[id]/cancel/+server';
import { callerKinds, callRoute, createWorkspace, identityOf, type AuthVia, type CallerKind, type Workspace } from '../exports/workspace-fixture';

type Handler = (event: RequestEvent) => Response | Promise<Response>;

let ws: Workspace;
let readableId: string;

async function queueCheck(): Promise<string> {
	const design = (await findDesign(getDb(), ws.designId))!;
	const revision = (await findRevision(getDb(), ws.designId, 'A'))!;
	return (await startFieldCheck(getDb(), { design, revision, userId: ws.people.owner.id, kind: 'check', mode: 'quick' })).id;
}

beforeAll(async () => {
	ws = await createWorkspace('fcroutes');
	readableId = await queueCheck();
});
afterAll(async () => {
	await cancelOpenFieldChecks(getDb(), ws.teamId);
	await stopQueue();
	await closeDb();
});

const read: Record<CallerKind, number> = { anonymous: 401, 'non-member': 404, viewer: 200, editor: 200, owner: 200 };

describe.each(['session', 'token'] as AuthVia[])('the field-check routes by %s', (via) => {
	it.each(callerKinds.map((who) => [who, read[who]] as const))('GET …/revisions/A/simulations as %s → %i', async (who, status) => {
		const res = await callRoute(simulationsRoute.GET as Handler, { identity: await identityOf(ws, who, via), path: `/api/v1/designs/${ws.designId}/revisions/A/simulations`, params: { designId: ws.designId, label: 'A' } });
		expect(res.status).toBe(status);
		if (status === 200) expect((await res.json()).items.map((c: { id: string }) => c.id)).toContain(readableId);
	});

	it.each(callerKinds.map((who) => [who, read[who]] as const))('GET /simulations/{id} as %s → %i', async (who, status) => {
		const res = await callRoute(statusRoute.GET as Handler, { identity: await identityOf(ws, who, via), path: `/api/v1/simulations/${readableId}`, params: { id: readableId } });
		expect(res.status).toBe(status);
		const body = await res.json();
		if (status === 200) expect(fieldCheckStatusSchema.parse(body).state).toBe('queued');
		// A non-member learns nothing: the same 404 as for an id that does not exist.
		if (who === 'non-member') expect(body.error).toBe('Field check not found');
	});

	const start: Record<CallerKind, number> = { anonymous: 401, 'non-member': 404, viewer: 403, editor: 202, owner: 202 };
	it.each(callerKinds.map((who) => [who, start[who]] as const))('POST …/revisions/A/simulations as %s → %i', async (who, status) => {
		const before = await getDb().selectFrom('field_check').select((eb) => eb.fn.countAll<string>().as('n')).executeTakeFirstOrThrow();
		const res = await callRoute(simulationsRoute.POST as Handler, {
			identity: await identityOf(ws, who, via),
			method: 'POST',
			path: `/api/v1/designs/${ws.designId}/revisions/A/simulations`,
			params: { designId: ws.designId, label: 'A' },
			body: { mode: 'quick', homing: who === 'owner' }
		});
		expect(res.status).toBe(status);
		const after = await getDb().selectFrom('field_check').select((eb) => eb.fn.countAll<string>().as('n')).executeTakeFirstOrThrow();
		expect(Number(after.n) - Number(before.n)).toBe(status === 202 ? 1 : 0);
		if (status === 202) {
			const body = fieldCheckStatusSchema.parse(await res.json());
			expect(res.headers.get('location')).toBe(`/api/v1/simulations/${body.id}`);
			expect(body.statusUrl).toBe(res.headers.get('location'));
			expect(body.kind).toBe(who === 'owner' ? 'homing' : 'check');
			expect(body.state).toBe('queued');
			// The job was sent in the same transaction.
			const job = await getDb().selectFrom('field_check').select('job_id').where('id', '=', body.id).executeTakeFirstOrThrow();
			const { rows } = await (await import('kysely')).sql<{ n: number }>`select count(*)::int as n from pgboss.job where id = ${job.job_id}::uuid`.execute(getDb());
			expect(rows[0].n).toBe(1);
		}
	});

	const cancel: Record<CallerKind, number> = { anonymous: 401, 'non-member': 404, viewer: 403, editor: 200, owner: 200 };
	it.each(callerKinds.map((who) => [who, cancel[who]] as const))('POST /simulations/{id}/cancel (queued) as %s → %i', async (who, status) => {
		const id = await queueCheck();
		const res = await callRoute(cancelRoute.POST as Handler, { identity: await identityOf(ws, who, via), method: 'POST', path: `/api/v1/simulations/${id}/cancel`, params: { id } });
		expect(res.status).toBe(status);
		const row = await getDb().selectFrom('field_check').select('state').where('id', '=', id).executeTakeFirstOrThrow();
		expect(row.state).toBe(status === 200 ? 'cancelled' : 'queued');
		if (status === 200) {
			const again = await callRoute(cancelRoute.POST as Handler, { identity: await identityOf(ws, who, via), method: 'POST', path: `/api/v1/simulations/${id}/cancel`, params: { id } });
			expect(again.status).toBe(409);
		} else {
			// Leave the team's queue short (the per-team limit counts queued checks).
			await getDb().updateTable('field_check').set({ state: 'cancelled', finished_at: new Date() }).where('id', '=', id).execute();
		}
	});
});

describe('bad input to the field-check routes', () => {
	it('refuses an unknown mode and unknown keys with 400, naming the field', async () => {
		const identity = await identityOf(ws, 'editor', 'token');
		for (const body of [{ mode: 'ultra' }, { mode: 'quick', budgetSeconds: 5 }]) {
			const res = await callRoute(simulationsRoute.POST as Handler, { identity, method: 'POST', path: `/api/v1/designs/${ws.designId}/revisions/A/simulations`, params: { designId: ws.designId, label: 'A' }, body });
			expect(res.status).toBe(400);
			expect((await res.json()).issues.length).toBeGreaterThan(0);
		}
	});
	it('refuses an id that is not a UUID with 400 and an unknown one with 404', async () => {
		const identity = await identityOf(ws, 'viewer', 'session');
		expect((await callRoute(statusRoute.GET as Handler, { identity, path: '/api/v1/simulations/nope', params: { id: 'nope' } })).status).toBe(400);
		const unknown = '00000000-0000-4000-8000-000000000000';
		expect((await callRoute(statusRoute.GET as Handler, { identity, path: `/api/v1/simulations/${unknown}`, params: { id: unknown } })).status).toBe(404);
	});
	it('answers 404 for a revision that does not exist', async () => {
		const identity = await identityOf(ws, 'editor', 'session');
		const res = await callRoute(simulationsRoute.POST as Handler, { identity, method: 'POST', path: `/api/v1/designs/${ws.designId}/revisions/Z/simulations`, params: { designId: ws.designId, label: 'Z' }, body: {} });
		expect(res.status).toBe(404);
	});
});
