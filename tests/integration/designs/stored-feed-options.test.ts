// A revision stored before the design input became a union on its feed (every stored input then held an inset and a
// probe object, whatever its feed; written straight into the database here, past every schema) still reads through
// the server's parse path, answers the API and downloads the same files as the same design stored today.
import { randomUUID } from 'node:crypto';
import type { RequestEvent } from '@sveltejs/kit';
import JSZip from 'jszip';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { createDesign } from '../../../src/lib/server/designs/create-design';
import { findDesignWithRevisions } from '../../../src/lib/server/designs';
import * as revisionRoute from '../../../src/routes/api/v1/designs/[designId]/revisions/[label]/+server';
import * as exportRoute from '../../../src/routes/api/v1/designs/[designId]/revisions/[label]/export/[format=format]/+server';
import { callRoute, createWorkspace, demoInput, identityOf, type Workspace } from '../exports/workspace-fixture';

type Handler = (event: RequestEvent) => Response | Promise<Response>;

/** The option objects the parser before the union filled in on every document (its defaults: inset {}, probe 1.3/4.1 mm). */
const OLDER_DEFAULTS = { inset: {}, probe: { drillDiameterMm: 1.3, clearanceDiameterMm: 4.1 } };

let ws: Workspace;
const today = { designId: '', slug: '' };
const older = { designId: '', slug: '' };

beforeAll(async () => {
	ws = await createWorkspace('feedopt');
	const { design } = await createDesign(getDb(), { teamId: ws.teamId, userId: ws.people.owner.id, raw: { ...demoInput('Edge fed bench patch'), feed: 'edge' } });
	Object.assign(today, { designId: design.id, slug: design.slug });
	const row = await getDb().selectFrom('revision').selectAll().where('design_id', '=', design.id).executeTakeFirstOrThrow();
	const results = row.results as { input: object };
	older.designId = randomUUID();
	older.slug = `edge-fed-older-${ws.suffix}`;
	await getDb().insertInto('design').values({ id: older.designId, team_id: ws.teamId, slug: older.slug, name: design.name, created_by: ws.people.owner.id }).execute();
	await getDb()
		.insertInto('revision')
		.values({
			id: randomUUID(),
			design_id: older.designId,
			label: 'A',
			seq: 1,
			parent_id: null,
			input: JSON.stringify({ ...OLDER_DEFAULTS, ...(row.input as object) }),
			results: JSON.stringify({ ...results, input: { ...OLDER_DEFAULTS, ...results.input } }),
			note: row.note,
			created_by: ws.people.owner.id
		})
		.execute();
});
afterAll(() => closeDb());

async function bundleFiles(designId: string, slug: string): Promise<Record<string, string>> {
	const identity = await identityOf(ws, 'viewer', 'token');
	const res = await callRoute(exportRoute.GET as Handler, { identity, path: `/api/v1/designs/${designId}/revisions/A/export/bundle`, params: { designId, label: 'A', format: 'bundle' } });
	expect(res.status, await res.clone().text()).toBe(200);
	const zip = await JSZip.loadAsync(new Uint8Array(await res.arrayBuffer()));
	const out: Record<string, string> = {};
	// the two designs differ only in id and slug, which the files name (file names, the Gerber X2 %TF.ProjectId line)
	for (const name of Object.keys(zip.files).sort()) out[name.replaceAll(slug, 'SLUG')] = (await zip.file(name)!.async('string')).replaceAll(slug, 'SLUG').replace(/^%TF\.ProjectId,.*$/gm, '%TF.ProjectId');
	return out;
}

describe('a revision stored with the option objects of other feeds', () => {
	it('parses through the server path to the input the same design stores today', async () => {
		const [then, now] = await Promise.all([findDesignWithRevisions(getDb(), older.designId), findDesignWithRevisions(getDb(), today.designId)]);
		const input = then!.revisions[0].input;
		expect(input.feed).toBe('edge');
		expect('inset' in input || 'probe' in input).toBe(false);
		expect(input).toEqual(now!.revisions[0].input);
	});

	it('answers GET /api/v1/…/revisions/A with 200, the input parsed and the stored results kept as they were', async () => {
		const identity = await identityOf(ws, 'viewer', 'token');
		const res = await callRoute(revisionRoute.GET as Handler, { identity, path: `/api/v1/designs/${older.designId}/revisions/A`, params: { designId: older.designId, label: 'A' } });
		expect(res.status).toBe(200);
		const body = (await res.json()) as { input: Record<string, unknown>; results: { input: Record<string, unknown>; patch: unknown; feed: unknown } };
		expect(body.input.feed).toBe('edge');
		expect(body.input).not.toHaveProperty('probe');
		expect(body.results.input.probe).toEqual(OLDER_DEFAULTS.probe);
		expect(body.results.feed).toMatchObject({ kind: 'edge' });
	});

	it('downloads a bundle whose files equal those of the same design stored today, file for file', async () => {
		const [then, now] = await Promise.all([bundleFiles(older.designId, older.slug), bundleFiles(today.designId, today.slug)]);
		expect(Object.keys(then).length).toBeGreaterThan(5);
		const fabFiles = Object.keys(now).filter((n) => /\.(gbr|drl|dxf|svg|sweep\.json)$/.test(n));
		expect(fabFiles.length).toBeGreaterThan(3);
		for (const name of fabFiles) expect(then[name], name).toBe(now[name]);
	});
});
