// The export log shows the design-rule waiver: the reason on a waived export's entry, null on a clean one, in the published schema's shape.
import type { RequestEvent } from '@sveltejs/kit';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { exportLogSchema } from '../../../src/lib/schemas/api';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { saveRevision } from '../../../src/lib/server/designs/save-revision';
import { exportRevision, loadExportTarget } from '../../../src/lib/server/exports';
import * as teamExportsRoute from '../../../src/routes/api/v1/teams/[teamId]/exports/+server';
import { callRoute, createWorkspace, demoInput, identityOf, type Workspace } from './workspace-fixture';

let ws: Workspace;
let cleanId: string;
let waivedId: string;
const reason = 'Board house confirmed 0.15 mm notch gaps for this lot';

beforeAll(async () => {
	ws = await createWorkspace('logw');
	// revision B: a 0.15 mm notch gap, under the built-in profile's 0.2 mm minimum slot (src/lib/schemas/fab-profile.ts)
	const narrow = (await saveRevision(getDb(), { designId: ws.designId, parentLabel: 'A', userId: ws.people.editor.id, raw: { ...demoInput(`Waiver log ${ws.suffix}`), inset: { notchGapMm: 0.15 } }, note: 'narrow notch' })).label;
	cleanId = (await exportRevision((await loadExportTarget(ws.designId, 'A'))!, 'notes', { userId: ws.people.editor.id, via: 'api' })).exportId;
	waivedId = (await exportRevision((await loadExportTarget(ws.designId, narrow))!, 'notes', { userId: ws.people.editor.id, via: 'api' }, { waiver: reason })).exportId;
});
afterAll(() => closeDb());

describe('the export log and waivers', () => {
	it('carries the waiver reason on a waived export and null on a clean one, in the ExportLog schema', async () => {
		const identity = await identityOf(ws, 'viewer', 'session');
		const res = await callRoute(teamExportsRoute.GET as (e: RequestEvent) => Promise<Response>, { identity, path: `/api/v1/teams/${ws.teamId}/exports?designId=${ws.designId}`, params: { teamId: ws.teamId } });
		expect(res.status).toBe(200);
		const page = exportLogSchema.parse(await res.json());
		const byId = new Map(page.items.map((i) => [i.id, i]));
		expect(byId.get(waivedId)?.waiver).toBe(reason);
		expect(byId.get(cleanId)?.waiver).toBeNull();
	});
});
