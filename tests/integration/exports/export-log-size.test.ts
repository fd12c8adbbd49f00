// The export log's size is the length of the bytes its sha256 covers: the downloaded body itself (the zip for a bundle or a
// several-file format, the file for a single file), for every download route, and "—" (null) only for zips recorded
// before the length was stored (migration 2026-12-02T0945, which backfills the single-file rows it can prove).
import { createHash } from 'node:crypto';
import { mkdtempSync, readdirSync, rmSync, symlinkSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { RequestEvent } from '@sveltejs/kit';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { migrateToLatest } from '../../../scripts/lib/migrate';
import { emptyAxisDraft } from '../../../src/lib/schemas/sweep-plan';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { findRevision } from '../../../src/lib/server/designs';
import { saveSweepPlan } from '../../../src/lib/server/sweeps';
import * as uiExportRoute from '../../../src/routes/(app)/designs/[designId]/r/[label]/export/[format=format]/+server';
import * as uiPlanRoute from '../../../src/routes/(app)/designs/[designId]/r/[label]/sweeps/[planId]/export/+server';
import * as apiExportRoute from '../../../src/routes/api/v1/designs/[designId]/revisions/[label]/export/[format=format]/+server';
import * as teamExportsRoute from '../../../src/routes/api/v1/teams/[teamId]/exports/+server';
import { callRoute, createWorkspace, identityOf, type Workspace } from './workspace-fixture';

type Handler = (event: RequestEvent) => Response | Promise<Response>;
type Entry = { id: string; kind: string; files: { sizeBytes: number }[]; sizeBytes: number | null; sha256: string };

let ws: Workspace;
let planId: string;
beforeAll(async () => {
	ws = await createWorkspace('logsize');
	const revision = (await findRevision(getDb(), ws.designId, 'A'))!;
	planId = (await saveSweepPlan(getDb(), { revisionId: revision.id, userId: ws.people.editor.id, draft: { name: 'Height study', combine: 'grid', axes: [{ ...emptyAxisDraft('substrate.heightMm'), from: '1.5', to: '1.6', step: '0.05' }] } })).id;
});
afterAll(() => closeDb());

async function logEntry(exportId: string): Promise<Entry> {
	const identity = await identityOf(ws, 'viewer', 'session');
	const res = await callRoute(teamExportsRoute.GET as Handler, { identity, path: `/api/v1/teams/${ws.teamId}/exports?designId=${ws.designId}&pageSize=100`, params: { teamId: ws.teamId } });
	const entry = ((await res.json()) as { items: Entry[] }).items.find((i) => i.id === exportId);
	if (!entry) throw new Error(`export ${exportId} is not in the log`);
	return entry;
}

const downloads: { name: string; handler: Handler; path: () => string; params: () => Record<string, string>; zip: boolean }[] = [
	{ name: 'the bundle (a zip)', handler: uiExportRoute.GET as Handler, path: () => `/designs/${ws.designId}/r/A/export/bundle`, params: () => ({ designId: ws.designId, label: 'A', format: 'bundle' }), zip: true },
	{ name: 'the Gerber set (a zip of one file per layer)', handler: apiExportRoute.GET as Handler, path: () => `/api/v1/designs/${ws.designId}/revisions/A/export/gerber`, params: () => ({ designId: ws.designId, label: 'A', format: 'gerber' }), zip: true },
	{ name: 'the DXF (one file)', handler: uiExportRoute.GET as Handler, path: () => `/designs/${ws.designId}/r/A/export/dxf`, params: () => ({ designId: ws.designId, label: 'A', format: 'dxf' }), zip: false },
	{ name: 'a sweep plan’s sweep (one file, streamed from disk)', handler: uiPlanRoute.GET as Handler, path: () => `/designs/${ws.designId}/r/A/sweeps/${planId}/export`, params: () => ({ designId: ws.designId, label: 'A', planId }), zip: false }
];

describe.each(downloads)('the log row of $name', ({ handler, path, params, zip }) => {
	it('shows the length of the downloaded bytes, the ones its sha256 covers', async () => {
		const identity = await identityOf(ws, 'viewer', 'session');
		const res = await callRoute(handler, { identity, path: path(), params: params(), headers: { 'sec-fetch-site': 'same-origin' } });
		expect(res.status).toBe(200);
		const body = new Uint8Array(await res.arrayBuffer());
		const entry = await logEntry(res.headers.get('x-export-id')!);
		expect(createHash('sha256').update(body).digest('hex')).toBe(entry.sha256);
		expect(entry.sizeBytes).toBe(body.byteLength);
		// A zip is not the sum of its entries (the old Size column): the regression this row guards against.
		const sumOfFiles = entry.files.reduce((n, f) => n + f.sizeBytes, 0);
		if (zip) expect(entry.sizeBytes).not.toBe(sumOfFiles);
		else expect(entry.sizeBytes).toBe(sumOfFiles);
	});
});

describe('sorting by size', () => {
	it('orders by the delivered length', async () => {
		const identity = await identityOf(ws, 'viewer', 'session');
		const res = await callRoute(teamExportsRoute.GET as Handler, { identity, path: `/api/v1/teams/${ws.teamId}/exports?sort=sizeBytes&order=asc`, params: { teamId: ws.teamId } });
		const sizes = ((await res.json()) as { items: Entry[] }).items.map((i) => i.sizeBytes as number);
		expect(sizes.length).toBeGreaterThanOrEqual(4);
		expect(sizes).toEqual([...sizes].sort((a, b) => a - b));
	});
});

describe('migration 2026-12-02T0945 on rows recorded before it', () => {
	const MIGRATION = '2026-12-02T0945_add_export_delivered_size.ts';
	const migrationsDir = join(import.meta.dirname, '..', '..', '..', 'migrations');
	const baseUrl = process.env.DATABASE_URL!;
	const scratch = `ff_logsize_${process.pid}`;
	const scratchUrl = baseUrl.replace(/\/[^/]+$/, `/${scratch}`);
	const folder = mkdtempSync(join(tmpdir(), 'ff-migrations-'));

	async function client<T>(url: string, fn: (c: pg.Client) => Promise<T>): Promise<T> {
		const c = new pg.Client({ connectionString: url });
		await c.connect();
		try {
			return await fn(c);
		} finally {
			await c.end();
		}
	}

	beforeAll(async () => {
		await client(baseUrl, (c) => c.query(`create database "${scratch}"`));
		for (const f of readdirSync(migrationsDir).filter((f) => f.endsWith('.ts') && f < MIGRATION)) symlinkSync(join(migrationsDir, f), join(folder, f));
		await migrateToLatest(scratchUrl, () => undefined, folder);
		await client(scratchUrl, async (c) => {
			await c.query(`insert into app_user (id, email, display_name, password_hash) values ('u1', 'u1@x.test', 'U1', 'x')`);
			await c.query(`insert into team (id, name) values ('t1', 'T1')`);
			await c.query(`insert into design (id, team_id, slug, name, created_by) values ('d1', 't1', 'roof-gnss', 'Roof GNSS', 'u1')`);
			await c.query(`insert into revision (id, design_id, label, seq, input, results, created_by) values ('r1', 'd1', 'A', 1, '{}', '{}', 'u1')`);
			const record = (id: string, kind: string, files: { name: string; sizeBytes: number; sha256: string }[], sha256: string) =>
				c.query(`insert into export_record (id, team_id, design_id, revision_id, user_id, via, kind, files, sha256) values ($1, 't1', 'd1', 'r1', 'u1', 'ui', $2, $3, $4)`, [id, kind, JSON.stringify(files), sha256]);
			const a = 'a'.repeat(64);
			const b = 'b'.repeat(64);
			const z = 'c'.repeat(64);
			await record('e-dxf', 'dxf', [{ name: 'roof-gnss-A.drawing.dxf', sizeBytes: 4321, sha256: a }], a);
			await record('e-bundle', 'bundle', [{ name: 'roof-gnss-A.drawing.dxf', sizeBytes: 4321, sha256: a }, { name: 'roof-gnss-A.manifest.json', sizeBytes: 300, sha256: b }], z);
			// One entry whose hash is not the delivery's: what was delivered is not that file, so its length is unknown.
			await record('e-odd', 'svg', [{ name: 'roof-gnss-A.drawing.svg', sizeBytes: 999, sha256: b }], z);
		});
		symlinkSync(join(migrationsDir, MIGRATION), join(folder, MIGRATION));
		await migrateToLatest(scratchUrl, () => undefined, folder);
	});
	afterAll(async () => {
		await client(baseUrl, (c) => c.query(`drop database if exists "${scratch}" with (force)`));
		rmSync(folder, { recursive: true, force: true });
	});

	it('fills in a single file’s length and leaves zips and unprovable rows unknown', async () => {
		const rows = await client(scratchUrl, async (c) => (await c.query(`select id, size_bytes from export_record order by id`)).rows);
		expect(rows).toEqual([
			{ id: 'e-bundle', size_bytes: null },
			{ id: 'e-dxf', size_bytes: 4321 },
			{ id: 'e-odd', size_bytes: null }
		]);
	});
});
