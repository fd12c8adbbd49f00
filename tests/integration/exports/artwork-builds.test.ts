// Artwork builds per download against the real PostgreSQL: the gate, the files, the companion files and the
// read-back of one download share one artwork (it was four before the single pipeline).
import type { RequestEvent } from '@sveltejs/kit';
import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import * as artworkModule from '../../../src/lib/artwork';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { saveRevision } from '../../../src/lib/server/designs/save-revision';
import * as apiExportRoute from '../../../src/routes/api/v1/designs/[designId]/revisions/[label]/export/[format=format]/+server';
import { callRoute, createWorkspace, demoInput, identityOf, type Workspace } from './workspace-fixture';

vi.mock('../../../src/lib/artwork', async (importOriginal) => {
	const actual = await importOriginal<typeof import('../../../src/lib/artwork')>();
	return { ...actual, buildArtwork: vi.fn(actual.buildArtwork) };
});
const builds = () => vi.mocked(artworkModule.buildArtwork).mock.calls.length;
type Handler = (event: RequestEvent) => Response | Promise<Response>;

let ws: Workspace;
let probeLabel = 'B';
beforeAll(async () => {
	ws = await createWorkspace('builds');
	// a probe-fed revision: a Gerber download of it is read back together with its drill file
	probeLabel = (await saveRevision(getDb(), { designId: ws.designId, parentLabel: 'A', userId: ws.people.editor.id, raw: { ...demoInput(`Bench patch ${ws.suffix}`), feed: 'probe' }, note: 'probe' })).label;
});
afterAll(() => closeDb());
beforeEach(() => {
	vi.mocked(artworkModule.buildArtwork).mockClear();
});

async function download(kind: string, label: string) {
	const identity = await identityOf(ws, 'editor', 'token');
	const res = await callRoute(apiExportRoute.GET as Handler, { identity, path: `/api/v1/designs/${ws.designId}/revisions/${label}/export/${kind}`, params: { designId: ws.designId, label, format: kind } });
	await res.arrayBuffer();
	return res.status;
}

describe('artwork builds per download', () => {
	it('is exactly one for a Gerber download of a probe-fed revision (gate, files, drill companion, read-back)', async () => {
		expect(await download('gerber', probeLabel)).toBe(200);
		expect(builds()).toBe(1);
	});

	it('is exactly one for the bundle, and again one for the same bundle downloaded again', async () => {
		expect(await download('bundle', probeLabel)).toBe(200);
		expect(builds()).toBe(1);
		vi.mocked(artworkModule.buildArtwork).mockClear();
		expect(await download('bundle', probeLabel)).toBe(200);
		expect(builds()).toBe(1);
	});

	it.each(['drill', 'dxf', 'svg', 'sweep', 'notes'])('is exactly one for a %s download', async (kind) => {
		expect(await download(kind, probeLabel)).toBe(200);
		expect(builds()).toBe(1);
	});
});
