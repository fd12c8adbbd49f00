// Another team's ids, from a member of team A (by session and by API token), on every id-taking page,
// action and /api/v1 route: always 404, never the other team's data, nothing changed.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb } from '../../../src/lib/server/db';
import { action, api } from './helpers/client';
import { startBuiltServer, type BuiltServer } from './helpers/built-server';
import { workspaceRowCounts } from './helpers/row-counts';
import { createHardeningWorkspace, type HardeningWorkspace } from './helpers/workspace';

let server: BuiltServer;
let ws: HardeningWorkspace;

beforeAll(async () => {
	[server, ws] = await Promise.all([startBuiltServer({ databaseUrl: process.env.DATABASE_URL! }), createHardeningWorkspace('iso')]);
}, 120_000);
afterAll(async () => {
	await server?.stop();
	await closeDb();
});

// Paths are built lazily: the workspace exists only after beforeAll.
const apiGets = (w: HardeningWorkspace) => {
	const b = w.b;
	const rev = `/api/v1/designs/${b.designId}/revisions/${b.label}`;
	return [
		`/api/v1/teams/${b.teamId}/designs`,
		`/api/v1/teams/${b.teamId}/exports`,
		`/api/v1/designs/${b.designId}`,
		rev,
		`${rev}/export/bundle`,
		`${rev}/export/gerber`,
		`${rev}/sweep`,
		`${rev}/sweep-plans`,
		`${rev}/sweep-plans/${b.planId}/sweep`,
		// Team A's own design with team B's plan id.
		`/api/v1/designs/${w.a.designId}/revisions/${w.a.label}/sweep-plans/${b.planId}/sweep`
	];
};
const apiPosts = (w: HardeningWorkspace) => [
	{ path: `/api/v1/teams/${w.b.teamId}/designs`, body: { input: { name: 'Intruder', frequencyHz: 2.45e9, substrate: { relativePermittivity: 4.3, heightMm: 1.6 } } } },
	{ path: `/api/v1/designs/${w.b.designId}/revisions`, body: { parent: w.b.label, input: { name: 'Intruder', frequencyHz: 2.45e9, substrate: { relativePermittivity: 4.3, heightMm: 1.6 } } } }
];
const pageGets = (w: HardeningWorkspace) => {
	const b = w.b;
	const r = `/designs/${b.designId}/r/${b.label}`;
	return [
		`/teams/${b.teamId}`,
		`/teams/${b.teamId}/audit`,
		`/designs/${b.designId}`,
		`/designs/${b.designId}/diff?from=${b.label}&to=${b.label}`,
		`/designs/${b.designId}/edit`,
		`/designs/${b.designId}/exports`,
		r,
		`${r}/export/bundle`,
		`${r}/export/dxf`,
		`${r}/measurements`,
		`${r}/sweeps`,
		`${r}/sweeps/${b.planId}/export`,
		`${r}/tolerance`,
		`/designs/${w.a.designId}/r/${w.a.label}/sweeps/${b.planId}/export`
	];
};
const pageActions = (w: HardeningWorkspace): { path: string; form: Record<string, string> }[] => {
	const b = w.b;
	const r = `/designs/${b.designId}/r/${b.label}`;
	return [
		{ path: `/teams/${b.teamId}?/rename`, form: { name: 'Taken over' } },
		{ path: `/teams/${b.teamId}?/invite`, form: { email: `intruder@${w.domain}`, role: 'owner' } },
		{ path: `/teams/${b.teamId}?/withdraw`, form: { inviteId: b.inviteId } },
		{ path: `/teams/${b.teamId}?/role`, form: { userId: w.outsider.id, role: 'viewer' } },
		{ path: `/teams/${b.teamId}?/remove`, form: { userId: w.outsider.id } },
		{ path: `/teams/${w.a.teamId}?/withdraw`, form: { inviteId: b.inviteId } },
		{ path: `/teams/${w.a.teamId}?/role`, form: { userId: w.outsider.id, role: 'viewer' } },
		{ path: `/teams/${w.a.teamId}?/remove`, form: { userId: w.outsider.id } },
		{ path: '/designs?/create', form: { teamId: b.teamId, name: 'Intruder', frequencyGHz: '2.45', shape: 'rectangular', laminateId: '' } },
		{ path: '/laminates?/add', form: { teamId: b.teamId, name: 'Intruder laminate', relativePermittivity: '4.3', lossTangent: '0.02', heightMm: '1.6' } },
		{ path: `/designs/${b.designId}/edit?/save`, form: { from: b.label, name: 'Intruder', frequencyGHz: '2.45' } },
		{ path: `${r}/sweeps?/save`, form: { name: 'Intruder', combine: 'grid', 'axes.0.field': 'substrate.heightMm', 'axes.0.from': '1', 'axes.0.to': '2', 'axes.0.step': '0.5' } },
		{ path: `${r}/measurements?/retune`, form: { measurementId: b.measurementId } },
		{ path: `/designs/${w.a.designId}/r/${w.a.label}/measurements?/retune`, form: { measurementId: b.measurementId } },
		{ path: `${r}/measurements?/delete`, form: { measurementId: b.measurementId, confirm: 'yes' } },
		{ path: `/designs/${w.a.designId}/r/${w.a.label}/measurements?/delete`, form: { measurementId: b.measurementId, confirm: 'yes' } },
		{ path: '/settings/tokens?/revoke', form: { tokenId: w.outsider.tokenId } }
	];
};

describe('cross-team isolation', () => {
	it('answers 404 on every /api/v1 route given team B ids, by session and by team A token', async () => {
		const before = await workspaceRowCounts(ws.teamIds, ws.userIds, ws.domain);
		const seen: string[] = [];
		for (const caller of [{ cookie: ws.owner.sessionId }, { token: ws.owner.token }]) {
			for (const path of apiGets(ws)) {
				const res = await api(server.origin, path, caller);
				seen.push(`${res.status} GET ${path}`);
				expect(res.text).not.toContain(`Hardening patch ${ws.suffix}-b`);
			}
			for (const { path, body } of apiPosts(ws)) seen.push(`${(await api(server.origin, path, caller, { body })).status} POST ${path}`);
		}
		expect(seen.filter((s) => !s.startsWith('404 '))).toEqual([]);
		expect(await workspaceRowCounts(ws.teamIds, ws.userIds, ws.domain)).toEqual(before);
	});

	it('answers 404 on every page given team B ids', async () => {
		const seen: string[] = [];
		for (const path of pageGets(ws)) {
			const res = await fetch(server.origin + path, { headers: { cookie: `ff_session=${ws.owner.sessionId}` }, redirect: 'manual' });
			const text = await res.text();
			seen.push(`${res.status} ${path}`);
			expect(text).not.toContain(`Hardening patch ${ws.suffix}-b`);
		}
		expect(seen.filter((s) => !s.startsWith('404 '))).toEqual([]);
	});

	it('answers 404 to every form action given team B ids and changes nothing', async () => {
		const before = await workspaceRowCounts(ws.teamIds, ws.userIds, ws.domain);
		const seen: string[] = [];
		for (const { path, form } of pageActions(ws)) {
			const res = await action(server.origin, path, { cookie: ws.owner.sessionId }, form);
			seen.push(`${res.actionStatus} ${path} ${res.message}`);
		}
		expect(seen.filter((s) => !s.startsWith('404 '))).toEqual([]);
		expect(await workspaceRowCounts(ws.teamIds, ws.userIds, ws.domain)).toEqual(before);
	});
});
