// Every /api/v1 route × {anonymous, non-member, viewer, editor, owner}, by session and by API token: the expected status for each cell.
import type { RequestEvent } from '@sveltejs/kit';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb } from '../../../src/lib/server/db';
import * as teamsRoute from '../../../src/routes/api/v1/teams/+server';
import * as teamDesignsRoute from '../../../src/routes/api/v1/teams/[teamId]/designs/+server';
import * as teamExportsRoute from '../../../src/routes/api/v1/teams/[teamId]/exports/+server';
import * as designRoute from '../../../src/routes/api/v1/designs/[designId]/+server';
import * as revisionsRoute from '../../../src/routes/api/v1/designs/[designId]/revisions/+server';
import * as revisionRoute from '../../../src/routes/api/v1/designs/[designId]/revisions/[label]/+server';
import * as sweepRoute from '../../../src/routes/api/v1/designs/[designId]/revisions/[label]/sweep/+server';
import * as exportRoute from '../../../src/routes/api/v1/designs/[designId]/revisions/[label]/export/[format=format]/+server';
import * as sizeRoute from '../../../src/routes/api/v1/size/+server';
import { callerKinds, callRoute, createWorkspace, demoInput, identityOf, type AuthVia, type CallerKind, type Workspace } from '../exports/workspace-fixture';

type Handler = (event: RequestEvent) => Response | Promise<Response>;
type Expected = Record<CallerKind, number>;

interface RouteCase {
	name: string;
	handler: Handler;
	method: 'GET' | 'POST';
	path: (ws: Workspace) => string;
	params: (ws: Workspace) => Record<string, string>;
	body?: (ws: Workspace, who: CallerKind) => unknown;
	expected: Expected;
}

const read: Expected = { anonymous: 401, 'non-member': 404, viewer: 200, editor: 200, owner: 200 };
const write: Expected = { anonymous: 401, 'non-member': 404, viewer: 403, editor: 201, owner: 201 };

const routes: RouteCase[] = [
	// Everyone signed in has a list of their own teams.
	{ name: 'GET /teams', handler: teamsRoute.GET as Handler, method: 'GET', path: () => '/api/v1/teams', params: () => ({}), expected: { ...read, 'non-member': 200 } },
	{ name: 'GET /teams/{teamId}/designs', handler: teamDesignsRoute.GET as Handler, method: 'GET', path: (ws) => `/api/v1/teams/${ws.teamId}/designs`, params: (ws) => ({ teamId: ws.teamId }), expected: read },
	{
		name: 'POST /teams/{teamId}/designs',
		handler: teamDesignsRoute.POST as Handler,
		method: 'POST',
		path: (ws) => `/api/v1/teams/${ws.teamId}/designs`,
		params: (ws) => ({ teamId: ws.teamId }),
		body: (ws, who) => ({ input: demoInput(`Matrix ${who} ${ws.suffix}`) }),
		expected: write
	},
	{ name: 'GET /designs/{designId}', handler: designRoute.GET as Handler, method: 'GET', path: (ws) => `/api/v1/designs/${ws.designId}`, params: (ws) => ({ designId: ws.designId }), expected: read },
	{
		name: 'POST /designs/{designId}/revisions',
		handler: revisionsRoute.POST as Handler,
		method: 'POST',
		path: (ws) => `/api/v1/designs/${ws.designId}/revisions`,
		params: (ws) => ({ designId: ws.designId }),
		body: () => ({ parent: 'A', input: { ...demoInput(), frequencyHz: 2.4e9 }, note: 'retuned' }),
		expected: write
	},
	{
		name: 'GET /designs/{designId}/revisions/{label}',
		handler: revisionRoute.GET as Handler,
		method: 'GET',
		path: (ws) => `/api/v1/designs/${ws.designId}/revisions/A`,
		params: (ws) => ({ designId: ws.designId, label: 'A' }),
		expected: read
	},
	{
		name: 'GET /designs/{designId}/revisions/{label}/sweep',
		handler: sweepRoute.GET as Handler,
		method: 'GET',
		path: (ws) => `/api/v1/designs/${ws.designId}/revisions/A/sweep`,
		params: (ws) => ({ designId: ws.designId, label: 'A' }),
		expected: read
	},
	{
		name: 'GET /designs/{designId}/revisions/{label}/export/{format}',
		handler: exportRoute.GET as Handler,
		method: 'GET',
		path: (ws) => `/api/v1/designs/${ws.designId}/revisions/A/export/bundle`,
		params: (ws) => ({ designId: ws.designId, label: 'A', format: 'bundle' }),
		expected: read
	},
	{ name: 'GET /teams/{teamId}/exports', handler: teamExportsRoute.GET as Handler, method: 'GET', path: (ws) => `/api/v1/teams/${ws.teamId}/exports`, params: (ws) => ({ teamId: ws.teamId }), expected: read },
	// Sizing is stateless: any signed-in caller may compute.
	{ name: 'POST /size', handler: sizeRoute.POST as Handler, method: 'POST', path: () => '/api/v1/size', params: () => ({}), body: () => demoInput(), expected: { ...read, 'non-member': 200 } }
];

let ws: Workspace;
beforeAll(async () => {
	ws = await createWorkspace('matrix');
});
afterAll(() => closeDb());

describe.each(['session', 'token'] as AuthVia[])('the /api/v1 role matrix by %s', (via) => {
	for (const route of routes) {
		it.each(callerKinds.map((who) => [who, route.expected[who]] as const))(`${route.name} as %s → %i`, async (who, status) => {
			const identity = await identityOf(ws, who, via);
			const res = await callRoute(route.handler, { identity, method: route.method, path: route.path(ws), params: route.params(ws), body: route.body?.(ws, who) });
			const text = await res.text();
			expect(res.status, text.slice(0, 300)).toBe(status);
			if (status >= 400) {
				// Denials are JSON problems with a message; a 404 never says whether the thing exists.
				const body = JSON.parse(text);
				expect(typeof body.error).toBe('string');
				if (status === 401) expect(res.headers.get('www-authenticate')).toMatch(/^Bearer/);
			}
		});
	}
});

describe('the reach of an API token', () => {
	it('lists only its own team even when its owner belongs to several', async () => {
		// The outsider joins the fixture team too; their token still reaches only the other team.
		const { getDb } = await import('../../../src/lib/server/db');
		await getDb().insertInto('team_member').values({ team_id: ws.teamId, user_id: ws.people['non-member'].id, role: 'editor' }).execute();
		try {
			const byToken = await callRoute(teamsRoute.GET as Handler, { identity: await identityOf(ws, 'non-member', 'token'), path: '/api/v1/teams', params: {} });
			expect((await byToken.json()).teams.map((t: { id: string }) => t.id)).toEqual([ws.otherTeamId]);
			const bySession = await callRoute(teamsRoute.GET as Handler, { identity: await identityOf(ws, 'non-member', 'session'), path: '/api/v1/teams', params: {} });
			expect((await bySession.json()).teams.map((t: { id: string }) => t.id).sort()).toEqual([ws.teamId, ws.otherTeamId].sort());
			// The fixture team's design is out of the token's reach: 404, as for a stranger.
			const design = await callRoute(designRoute.GET as Handler, { identity: await identityOf(ws, 'non-member', 'token'), path: `/api/v1/designs/${ws.designId}`, params: { designId: ws.designId } });
			expect(design.status).toBe(404);
		} finally {
			await getDb().deleteFrom('team_member').where('team_id', '=', ws.teamId).where('user_id', '=', ws.people['non-member'].id).execute();
		}
	});

	it('treats a revoked or made-up token as anonymous (401)', async () => {
		const { getDb } = await import('../../../src/lib/server/db');
		const { hashSecret } = await import('../../../src/lib/server/auth/api-token');
		await getDb().updateTable('api_token').set({ revoked_at: new Date() }).where('token_hash', '=', hashSecret(ws.people.viewer.token)).execute();
		const revoked = await identityOf(ws, 'viewer', 'token');
		expect(revoked.user).toBeNull();
		const res = await callRoute(teamsRoute.GET as Handler, { identity: revoked, path: '/api/v1/teams', params: {} });
		expect(res.status).toBe(401);
	});
});
