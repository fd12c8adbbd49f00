// Artwork builds per download against the real PostgreSQL: the gate, the files, the companion files and the
// read-back of one download share one artwork, drawn inside the download's one worker-thread task (the task
// reports what it drew on its thread); the request thread draws none.
import type { RequestEvent } from '@sveltejs/kit';
import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import * as artworkModule from '../../../src/lib/artwork';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { saveRevision } from '../../../src/lib/server/designs/save-revision';
import type { WorkResult } from '../../../src/lib/server/work';
import * as apiExportRoute from '../../../src/routes/api/v1/designs/[designId]/revisions/[label]/export/[format=format]/+server';
import { callRoute, createWorkspace, demoInput, identityOf, type Workspace } from './workspace-fixture';

vi.mock('../../../src/lib/artwork', async (importOriginal) => {
	const actual = await importOriginal<typeof import('../../../src/lib/artwork')>();
	return { ...actual, buildArtwork: vi.fn(actual.buildArtwork) };
});
/** Every worker-thread task's answer, as the request thread received it. */
const answers: WorkResult[] = [];
vi.mock('../../../src/lib/server/work', async (importOriginal) => {
	const actual = await importOriginal<typeof import('../../../src/lib/server/work')>();
	const runBudgetedWork: typeof actual.runBudgetedWork = async (task, opts) => {
		const result = await actual.runBudgetedWork(task, opts);
		answers.push(result);
		return result;
	};
	return { ...actual, runBudgetedWork };
});
/** Artworks drawn on the request thread (the download's own thread must draw them all). */
const requestThreadBuilds = () => vi.mocked(artworkModule.buildArtwork).mock.calls.length;
/** The download tasks run since the last reset, each with the artwork builds it counted on its thread. */
const downloadTasks = () => answers.flatMap((a) => (a.type === 'export' ? [a.report.artworkBuilds] : []));
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
	answers.length = 0;
});

async function download(kind: string, label: string) {
	const identity = await identityOf(ws, 'editor', 'token');
	const res = await callRoute(apiExportRoute.GET as Handler, { identity, path: `/api/v1/designs/${ws.designId}/revisions/${label}/export/${kind}`, params: { designId: ws.designId, label, format: kind } });
	await res.arrayBuffer();
	return res.status;
}

describe('artwork builds per download', () => {
	it('is exactly one, in one worker task, for a Gerber download of a probe-fed revision (gate, files, drill companion, read-back)', async () => {
		expect(await download('gerber', probeLabel)).toBe(200);
		expect(downloadTasks()).toEqual([1]);
		expect(requestThreadBuilds()).toBe(0);
	});

	it('is exactly one for the bundle, and none for the same bundle downloaded again (the revision\'s outcome is shared)', async () => {
		expect(await download('bundle', probeLabel)).toBe(200);
		expect(downloadTasks()).toEqual([1]);
		answers.length = 0;
		expect(await download('bundle', probeLabel)).toBe(200);
		expect(downloadTasks()).toEqual([]);
		expect(requestThreadBuilds()).toBe(0);
	});

	it.each(['drill', 'dxf', 'svg', 'sweep', 'notes'])('is exactly one, in one worker task, for a %s download', async (kind) => {
		expect(await download(kind, probeLabel)).toBe(200);
		expect(downloadTasks()).toEqual([1]);
		expect(requestThreadBuilds()).toBe(0);
	});
});
