// Downloads against the real PostgreSQL: one export record per download with the right hashes; an old revision re-exports byte for byte.
import { createHash } from 'node:crypto';
import type { RequestEvent } from '@sveltejs/kit';
import JSZip from 'jszip';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { exportKinds } from '../../../src/lib/schemas/api';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { saveRevision } from '../../../src/lib/server/designs/save-revision';
import { match as formatMatcher } from '../../../src/params/format';
import * as uiExportRoute from '../../../src/routes/(app)/designs/[designId]/r/[label]/export/[format=format]/+server';
import * as apiExportRoute from '../../../src/routes/api/v1/designs/[designId]/revisions/[label]/export/[format=format]/+server';
import * as sweepRoute from '../../../src/routes/api/v1/designs/[designId]/revisions/[label]/sweep/+server';
import { callRoute, callerKinds, createWorkspace, demoInput, identityOf, type CallerKind, type Workspace } from './workspace-fixture';

type Handler = (event: RequestEvent) => Response | Promise<Response>;
const sha256 = (bytes: Uint8Array) => createHash('sha256').update(bytes).digest('hex');

let ws: Workspace;
beforeAll(async () => {
	ws = await createWorkspace('export');
});
afterAll(() => closeDb());

async function records(revisionLabel?: string) {
	let q = getDb().selectFrom('export_record').innerJoin('revision', 'revision.id', 'export_record.revision_id').selectAll('export_record').select('revision.label').where('export_record.design_id', '=', ws.designId);
	if (revisionLabel) q = q.where('revision.label', '=', revisionLabel);
	return q.orderBy('export_record.created_at').orderBy('export_record.id').execute();
}

async function download(kind: string, label = 'A', who: CallerKind = 'viewer', route: 'ui' | 'api' = 'ui') {
	const identity = await identityOf(ws, who, route === 'ui' ? 'session' : 'token');
	const handler = (route === 'ui' ? uiExportRoute.GET : apiExportRoute.GET) as Handler;
	const path = route === 'ui' ? `/designs/${ws.designId}/r/${label}/export/${kind}` : `/api/v1/designs/${ws.designId}/revisions/${label}/export/${kind}`;
	const res = await callRoute(handler, { identity, path, params: { designId: ws.designId, label, format: kind } });
	return { res, bytes: new Uint8Array(await res.arrayBuffer()) };
}

describe('a download', () => {
	it('of the bundle writes exactly one record whose hashes are those of the delivered bytes and of each zipped file', async () => {
		const before = (await records()).length;
		const { res, bytes } = await download('bundle');
		expect(res.status).toBe(200);
		expect(res.headers.get('content-type')).toBe('application/zip');
		const slug = (await getDb().selectFrom('design').select('slug').where('id', '=', ws.designId).executeTakeFirstOrThrow()).slug;
		// File name from the core's pattern: <slug>-<label>.zip (src/lib/formats/bundle/file-names.ts).
		expect(res.headers.get('content-disposition')).toBe(`attachment; filename="${slug}-A.zip"`);
		const after = await records();
		expect(after.length).toBe(before + 1);
		const rec = after.at(-1)!;
		expect(rec.id).toBe(res.headers.get('x-export-id'));
		expect(rec).toMatchObject({ kind: 'bundle', via: 'ui', user_id: ws.people.viewer.id, team_id: ws.teamId, label: 'A' });
		expect(rec.sha256).toBe(sha256(bytes));
		expect(res.headers.get('x-content-sha256')).toBe(sha256(bytes));

		// jszip reads the zip back; each entry's size and sha256 is what the record says.
		const zip = await JSZip.loadAsync(bytes);
		const names = Object.keys(zip.files).sort();
		expect(rec.files.map((f) => f.name).sort()).toEqual(names);
		for (const f of rec.files) {
			const entry = await zip.file(f.name)!.async('uint8array');
			expect({ name: f.name, sizeBytes: entry.byteLength, sha256: sha256(entry) }).toEqual(f);
		}
		expect(names).toEqual(expect.arrayContaining([`${slug}-A.copper-top.gbr`, `${slug}-A.drawing.dxf`, `${slug}-A.drawing.svg`, `${slug}-A.design.sweep.json`, `${slug}-A.fab-notes.txt`, `${slug}-A.manifest.json`]));
	});

	it.each(exportKinds.filter((k) => k !== 'bundle'))('of %s writes one record with the delivered file’s hash', async (kind) => {
		const before = (await records()).length;
		const { res, bytes } = await download(kind, 'A', 'editor', 'api');
		if (res.status === 404) {
			// A design with no holes has no drill file; nothing is recorded then.
			expect(kind).toBe('drill');
			expect((await records()).length).toBe(before);
			return;
		}
		expect(res.status).toBe(200);
		const after = await records();
		expect(after.length).toBe(before + 1);
		const rec = after.at(-1)!;
		expect(rec).toMatchObject({ kind, via: 'api', user_id: ws.people.editor.id });
		expect(rec.sha256).toBe(sha256(bytes));
		const disposition = res.headers.get('content-disposition')!;
		if (rec.files.length === 1) {
			expect(disposition).toBe(`attachment; filename="${rec.files[0].name}"`);
			expect(rec.files[0]).toEqual({ name: rec.files[0].name, sizeBytes: bytes.byteLength, sha256: sha256(bytes) });
		} else {
			expect(disposition).toMatch(new RegExp(`\\.${kind}\\.zip"$`));
		}
	});

	it('of an old revision after newer ones were saved gives byte-identical files and hashes', async () => {
		const first = await download('bundle', 'A');
		const second = await download('gerber', 'A');
		await saveRevision(getDb(), { designId: ws.designId, parentLabel: 'A', userId: ws.people.editor.id, raw: { ...demoInput(), frequencyHz: 2.41e9 }, note: 'retuned after measuring' });
		const newer = await download('bundle', 'B');
		const again = await download('bundle', 'A');
		const gerberAgain = await download('gerber', 'A');
		expect(sha256(again.bytes)).toBe(sha256(first.bytes));
		expect(sha256(gerberAgain.bytes)).toBe(sha256(second.bytes));
		// The newer revision is a different design, so different bytes.
		expect(sha256(newer.bytes)).not.toBe(sha256(first.bytes));
		const recs = (await records('A')).filter((r) => r.kind === 'bundle');
		expect(recs.length).toBeGreaterThanOrEqual(3);
		for (const r of recs) {
			expect(r.sha256).toBe(recs[0].sha256);
			expect(r.files).toEqual(recs[0].files);
		}
	});

	it('of the sweep definition through the API is recorded as a sweep export via the API', async () => {
		const before = (await records()).length;
		const identity = await identityOf(ws, 'viewer', 'token');
		const res = await callRoute(sweepRoute.GET as Handler, { identity, path: `/api/v1/designs/${ws.designId}/revisions/A/sweep`, params: { designId: ws.designId, label: 'A' } });
		expect(res.status).toBe(200);
		expect(res.headers.get('content-type')).toBe('application/json');
		const text = await res.text();
		const doc = JSON.parse(text);
		expect(doc.format).toBe('fringefield-sweep');
		expect(doc.design.revision).toBe('A');
		const after = await records();
		expect(after.length).toBe(before + 1);
		expect(after.at(-1)).toMatchObject({ kind: 'sweep', via: 'api', sha256: sha256(new TextEncoder().encode(text)) });
	});

	it('dates its files from the revision, never from the clock', async () => {
		const created = (await getDb().selectFrom('revision').select('created_at').where('design_id', '=', ws.designId).where('label', '=', 'A').executeTakeFirstOrThrow()).created_at;
		const { bytes } = await download('notes');
		const day = created.toISOString().slice(0, 10);
		expect(new TextDecoder().decode(bytes)).toContain(day);
		const zip = await JSZip.loadAsync((await download('bundle')).bytes);
		for (const entry of Object.values(zip.files)) expect(entry.date.toISOString().slice(0, 10)).toBe(day);
	});
});

describe('the download route in the app', () => {
	const expected: Record<CallerKind, number> = { anonymous: 303, 'non-member': 404, viewer: 200, editor: 200, owner: 200 };
	it.each(callerKinds.map((who) => [who, expected[who]] as const))('answers %s with %i', async (who, status) => {
		const before = (await records()).length;
		const { res } = await download('dxf', 'A', who);
		expect(res.status).toBe(status);
		if (who === 'anonymous') expect(res.headers.get('location')).toMatch(/^\/signin\?next=/);
		expect((await records()).length).toBe(before + (status === 200 ? 1 : 0));
	});

	it('answers a revision that does not exist with 404 and records nothing', async () => {
		const before = (await records()).length;
		const { res } = await download('bundle', 'Q');
		expect(res.status).toBe(404);
		expect((await records()).length).toBe(before);
	});

	it('accepts only the known formats (the param matcher turns the rest into 404)', () => {
		for (const kind of exportKinds) expect(formatMatcher(kind)).toBe(true);
		for (const bad of ['zip', 'GERBER', 'iges', '', 'bundle.zip']) expect(formatMatcher(bad)).toBe(false);
	});
});
