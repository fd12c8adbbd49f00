// The export log through GET /api/v1/teams/{teamId}/exports: filter, sort, page, and the "matches earlier export" mark.
import type { RequestEvent } from '@sveltejs/kit';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, getDb } from '../../../src/lib/server/db';
import * as exportQueries from '../../../src/lib/server/db/export.queries';
import { createDesign } from '../../../src/lib/server/designs/create-design';
import { exportRevision, loadExportTarget } from '../../../src/lib/server/exports';
import * as teamExportsRoute from '../../../src/routes/api/v1/teams/[teamId]/exports/+server';
import { callRoute, createWorkspace, demoInput, identityOf, type Workspace } from './workspace-fixture';

type Entry = { id: string; createdAt: string; design: { id: string; name: string }; kind: string; via: string; user: { displayName: string }; sha256: string; sizeBytes: number; earlier: null | { exportId: string; matches: boolean } };
type Page = { items: Entry[]; total: number; page: number; pageSize: number };

let ws: Workspace;
let secondDesignId: string;
const made: string[] = [];

async function log(query: string, who: 'viewer' | 'non-member' = 'viewer'): Promise<{ status: number; body: Page }> {
	const identity = await identityOf(ws, who, 'session');
	const res = await callRoute(teamExportsRoute.GET as (e: RequestEvent) => Promise<Response>, { identity, path: `/api/v1/teams/${ws.teamId}/exports?${query}`, params: { teamId: ws.teamId } });
	return { status: res.status, body: await res.json() };
}

beforeAll(async () => {
	ws = await createWorkspace('log');
	secondDesignId = (await createDesign(getDb(), { teamId: ws.teamId, userId: ws.people.editor.id, raw: demoInput(`Zenith feed ${ws.suffix}`) })).design.id;
	const a = (await loadExportTarget(ws.designId, 'A'))!;
	const z = (await loadExportTarget(secondDesignId, 'A'))!;
	const plan: [typeof a, 'bundle' | 'dxf' | 'svg', 'viewer' | 'editor' | 'owner', 'ui' | 'api'][] = [
		[a, 'bundle', 'viewer', 'ui'],
		[a, 'dxf', 'editor', 'api'],
		[z, 'svg', 'owner', 'ui'],
		[a, 'bundle', 'owner', 'api'],
		[z, 'dxf', 'viewer', 'ui']
	];
	for (const [target, kind, who, via] of plan) made.push((await exportRevision(target, kind, { userId: ws.people[who].id, via })).exportId);
});
afterAll(() => closeDb());

describe('the export log', () => {
	it('lists the team’s exports newest first by default, with the total', async () => {
		const { status, body } = await log('');
		expect(status).toBe(200);
		expect(body.total).toBe(5);
		expect(body.items.map((i) => i.id)).toEqual([...made].reverse());
	});

	it('marks a re-export of the same revision and kind as matching the first one, and a first export as first', async () => {
		const { body } = await log('kind=bundle&sort=createdAt&order=asc');
		const [first, again] = body.items;
		expect(first.earlier).toBeNull();
		expect(again.earlier).toMatchObject({ exportId: first.id, matches: true });
		expect(again.sha256).toBe(first.sha256);
	});

	it('marks an export whose bytes differ from the earlier one as not matching', async () => {
		// A record as an older writer would have left it: same revision and kind, other bytes.
		const target = (await loadExportTarget(secondDesignId, 'A'))!;
		await exportQueries.insertExportRecord(getDb(), {
			id: `tampered-${ws.suffix}`,
			team_id: ws.teamId,
			design_id: secondDesignId,
			revision_id: target.revision.id,
			user_id: ws.people.owner.id,
			via: 'cli',
			kind: 'svg',
			files: [{ name: 'x.svg', sizeBytes: 3, sha256: '0'.repeat(64) }],
			sha256: '0'.repeat(64)
		});
		const { body } = await log(`designId=${secondDesignId}&kind=svg&sort=createdAt&order=asc`);
		expect(body.items.map((i) => i.earlier?.matches ?? null)).toEqual([null, false]);
		await getDb().deleteFrom('export_record').where('id', '=', `tampered-${ws.suffix}`).execute();
	});

	it('filters by design, kind, origin and text', async () => {
		expect((await log(`designId=${secondDesignId}`)).body.items.every((i) => i.design.id === secondDesignId)).toBe(true);
		expect((await log(`designId=${secondDesignId}`)).body.total).toBe(2);
		expect((await log('kind=dxf')).body.total).toBe(2);
		expect((await log('via=api')).body.items.map((i) => i.via)).toEqual(['api', 'api']);
		expect((await log('q=zenith')).body.total).toBe(2);
		expect((await log(`q=${encodeURIComponent(ws.people.owner.displayName)}`)).body.total).toBe(2);
		// LIKE wildcards in the text mean themselves.
		expect((await log('q=%25')).body.total).toBe(0);
		const one = (await log('')).body.items[0];
		expect((await log(`q=${one.sha256.slice(0, 16)}`)).body.items.map((i) => i.id)).toContain(one.id);
	});

	it('sorts by each key in both directions', async () => {
		const kinds = (await log('sort=kind&order=asc')).body.items.map((i) => i.kind);
		expect(kinds).toEqual([...kinds].sort());
		const kindsDesc = (await log('sort=kind&order=desc')).body.items.map((i) => i.kind);
		expect(kindsDesc).toEqual([...kinds].sort().reverse());
		const names = (await log('sort=design&order=asc')).body.items.map((i) => i.design.name.toLowerCase());
		expect(names).toEqual([...names].sort());
		const sizes = (await log('sort=sizeBytes&order=desc')).body.items.map((i) => i.sizeBytes);
		expect(sizes).toEqual([...sizes].sort((x, y) => y - x));
		const users = (await log('sort=user&order=asc')).body.items.map((i) => i.user.displayName.toLowerCase());
		expect(users).toEqual([...users].sort());
	});

	it('pages through every export once', async () => {
		const seen: string[] = [];
		for (let page = 1; page <= 3; page++) {
			const { body } = await log(`pageSize=2&page=${page}`);
			expect(body).toMatchObject({ total: 5, page, pageSize: 2 });
			seen.push(...body.items.map((i) => i.id));
		}
		expect(seen).toEqual([...made].reverse());
		expect((await log('pageSize=2&page=4')).body.items).toEqual([]);
	});

	it('is out of reach for a non-member (404) and shows no other team’s exports', async () => {
		expect((await log('', 'non-member')).status).toBe(404);
		const all = await getDb().selectFrom('export_record').select('team_id').where('id', 'in', made).execute();
		expect(all.every((r) => r.team_id === ws.teamId)).toBe(true);
	});
});
