// A design with a connector launch through /api/v1 (against the real PostgreSQL) and through the CLI in a fresh tsx
// process: the launch is stored as sent (defaults filled), comes back unchanged, and its vias reach the drill file
// (read back with @tracespace/parser 5.0.0-next.0); a launch the feed cannot take is a 400 naming launch.kind.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { RequestEvent } from '@sveltejs/kit';
import { createParser } from '@tracespace/parser';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb } from '../../../src/lib/server/db';
import * as teamDesignsRoute from '../../../src/routes/api/v1/teams/[teamId]/designs/+server';
import * as revisionsRoute from '../../../src/routes/api/v1/designs/[designId]/revisions/+server';
import * as revisionRoute from '../../../src/routes/api/v1/designs/[designId]/revisions/[label]/+server';
import * as apiExportRoute from '../../../src/routes/api/v1/designs/[designId]/revisions/[label]/export/[format=format]/+server';
import { callRoute, createWorkspace, demoInput, identityOf, type Workspace } from '../exports/workspace-fixture';

type Handler = (event: RequestEvent) => Response | Promise<Response>;
let ws: Workspace;
beforeAll(async () => {
	ws = await createWorkspace('launch');
});
afterAll(() => closeDb());

async function call(handler: unknown, path: string, params: Record<string, string>, extra: { method?: string; body?: unknown } = {}) {
	const identity = await identityOf(ws, 'editor', 'token');
	return callRoute(handler as Handler, { identity, path, params, ...extra });
}

/** Drill hits of an Excellon text with their tool's aperture function, parsed by @tracespace/parser. */
function viaHits(text: string): { x: number; y: number; fn: string }[] {
	const p = createParser();
	p.feed(text);
	const tree = p.results();
	let fn = '';
	const fnOf = new Map<string, string>();
	let tool = '';
	const hits: { x: number; y: number; fn: string }[] = [];
	for (const n of tree.children) {
		if (n.type === 'comment' && n.comment.includes('TA.AperFunction')) fn = n.comment;
		if (n.type === 'toolDefinition') fnOf.set(n.code, fn);
		if (n.type === 'toolChange') tool = n.code;
		if (n.type === 'graphic') hits.push({ x: Number(n.coordinates.x), y: Number(n.coordinates.y), fn: fnOf.get(tool) ?? '' });
	}
	return hits;
}

const launch = { kind: 'edge', lengthMm: 3.5, viaRows: 2 } as const;

describe('a design with an edge launch through /api/v1', () => {
	let designId = '';

	it('is created with the launch stored as sent, defaults filled', async () => {
		const res = await call(teamDesignsRoute.POST, `/api/v1/teams/${ws.teamId}/designs`, { teamId: ws.teamId }, { method: 'POST', body: { input: { ...demoInput('Launch round trip'), launch } } });
		expect(res.status).toBe(201);
		designId = (await res.json()).id;
		const rev = await call(revisionRoute.GET, `/api/v1/designs/${designId}/revisions/A`, { designId, label: 'A' });
		expect(rev.status).toBe(200);
		const body = await rev.json();
		expect(body.input.launch).toEqual({ kind: 'edge', lengthMm: 3.5, groundWidthMm: 2, viaDrillMm: 0.3, viaPitchMm: 1, viaRows: 2, viaInsetMm: 0.5 });
	});

	it('exports a drill file whose via holes read back: 3 along × 2 rows × 2 pads, as via drills', async () => {
		const res = await call(apiExportRoute.GET, `/api/v1/designs/${designId}/revisions/A/export/drill`, { designId, label: 'A', format: 'drill' });
		expect(res.status).toBe(200);
		const text = new TextDecoder().decode(new Uint8Array(await res.arrayBuffer()));
		const hits = viaHits(text);
		expect(hits.length).toBe(12);
		expect(hits.every((h) => h.fn.includes('ViaDrill'))).toBe(true);
		// 3.5 mm of pad at 1 mm pitch: vias at 3.0, 2.0 and 1.0 mm from the edge
		expect([...new Set(hits.map((h) => h.y.toFixed(3)))].sort()).toEqual(['1.000', '2.000', '3.000']);
	});

	it('takes a new revision that drops the launch, and the drill file is then absent (no holes)', async () => {
		const res = await call(revisionsRoute.POST, `/api/v1/designs/${designId}/revisions`, { designId }, { method: 'POST', body: { parent: 'A', input: { ...demoInput('Launch round trip'), launch: { kind: 'none' } } } });
		expect(res.status).toBe(201);
		const label = (await res.json()).label;
		const drill = await call(apiExportRoute.GET, `/api/v1/designs/${designId}/revisions/${label}/export/drill`, { designId, label, format: 'drill' });
		expect(drill.status).toBe(404);
	});

	it('refuses a back-side launch on an inset feed with a 400 naming launch.kind, and stores nothing', async () => {
		const res = await call(revisionsRoute.POST, `/api/v1/designs/${designId}/revisions`, { designId }, { method: 'POST', body: { parent: 'A', input: { ...demoInput(), launch: { kind: 'back' } } } });
		expect(res.status).toBe(400);
		const body = await res.json();
		expect(body.issues.some((i: { path: string; message: string }) => i.path === 'input.launch.kind' || i.path === 'launch.kind')).toBe(true);
	});
});

describe('a design with a launch through the CLI', () => {
	const dir = mkdtempSync(join(tmpdir(), 'ff-launch-'));
	const design = join(dir, 'design.json');
	writeFileSync(design, JSON.stringify({ ...demoInput('CLI launch'), launch }));
	const cli = (args: string[]) => spawnSync('npx', ['tsx', 'src/cli/main.ts', ...args], { cwd: process.cwd(), encoding: 'utf8' });

	it('exports the same vias and the launch lines of the fab notes', () => {
		const out = join(dir, 'files');
		const r = cli(['export', design, '--out', out, '--formats', 'drill,notes', '--revision', 'A', '--date', '2026-12-02']);
		expect(r.stderr).toBe('');
		expect(r.status).toBe(0);
		const files = readdirSync(out);
		const drill = files.find((f) => f.endsWith('.drl'))!;
		expect(viaHits(readFileSync(join(out, drill), 'utf8')).length).toBe(12);
		const notes = readFileSync(join(out, files.find((f) => f.endsWith('fab-notes.txt'))!), 'utf8');
		expect(notes).toMatch(/Connector launch at the bottom board edge/);
		expect(notes).toMatch(/12 plated\s+vias of 0\.3 mm/);
	});

	it('checks it clean against the built-in profile (exit 0)', () => {
		const r = cli(['check', design]);
		expect(r.status).toBe(0);
		expect(JSON.parse(r.stdout).clean).toBe(true);
	});
});
