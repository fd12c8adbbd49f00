// Abuse review item 9: deleting a measurement from its page — editors and owners after a confirm step, recorded in
// the team's security log; viewers refused (403), non-members told nothing (404), a retune's source kept (409).
import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, getDb } from '../../../src/lib/server/db';
import * as auditQueries from '../../../src/lib/server/db/audit-event.queries';
import { findRevision } from '../../../src/lib/server/designs';
import * as measurements from '../../../src/lib/server/measurements';
import { actions } from '../../../src/routes/(app)/designs/[designId]/r/[label]/measurements/+page.server';
import { createWorkspace, identityOf, type CallerKind, type Workspace } from '../exports/workspace-fixture';

const db = getDb();
const bench = new Uint8Array(readFileSync(new URL('../../fixtures/touchstone-upload/bench-2g4.s1p', import.meta.url)));
let ws: Workspace;
let revisionId: string;

beforeAll(async () => {
	ws = await createWorkspace('delmeas');
	revisionId = (await findRevision(db, ws.designId, 'A'))!.id;
});
afterAll(() => closeDb());

const upload = async (fileName = 'bench-2g4.s1p') => (await measurements.uploadMeasurement(db, { revisionId, userId: ws.people.editor.id, fileName, bytes: bench })).id;
const stillThere = async (id: string) => (await measurements.findMeasurementView(db, revisionId, id)) !== null;
const deletions = async () => (await auditQueries.listAuditEventsByTeam(db, ws.teamId, 200)).filter((e) => e.kind === 'measurement.deleted');

/** Posts the delete form as `who` (session); the status SvelteKit would answer and the failure's data, if any. */
async function postDelete(who: Exclude<CallerKind, 'anonymous'>, fields: Record<string, string>): Promise<{ status: number; data?: { action?: string; message?: string; detail?: { confirm?: boolean } } }> {
	const identity = await identityOf(ws, who, 'session');
	const body = new FormData();
	for (const [k, v] of Object.entries(fields)) body.set(k, v);
	const request = new Request(`http://127.0.0.1/designs/${ws.designId}/r/A/measurements?/delete`, { method: 'POST', body });
	try {
		const result = (await actions.delete({ locals: { identity, user: identity.user }, params: { designId: ws.designId, label: 'A' }, request } as never)) as { status: number; data: never };
		return { status: result.status, data: result.data };
	} catch (err) {
		const e = err as { status?: number };
		if (typeof e.status === 'number') return { status: e.status };
		throw err;
	}
}

describe('deleting a measurement', () => {
	it('an editor is asked to confirm first, and nothing is deleted until they do', async () => {
		const id = await upload();
		const asked = await postDelete('editor', { measurementId: id });
		expect(asked.status).toBe(400);
		expect([asked.data?.action, asked.data?.detail?.confirm]).toEqual(['delete', true]);
		expect(await stillThere(id)).toBe(true);
	});

	it('an editor who confirms deletes it, and the security log records who deleted which file', async () => {
		const id = await upload('to-delete.s1p');
		const before = (await deletions()).length;
		expect((await postDelete('editor', { measurementId: id, confirm: 'yes' })).status).toBe(303);
		expect(await stillThere(id)).toBe(false);
		const events = await deletions();
		expect(events).toHaveLength(before + 1);
		const event = events.find((e) => (e.details as { measurementId?: string }).measurementId === id)!;
		expect(event.actor_user_id).toBe(ws.people.editor.id);
		expect(event.details).toMatchObject({ fileName: 'to-delete.s1p', revisionLabel: 'A', designId: ws.designId });
	});

	it('an owner may delete too', async () => {
		const id = await upload();
		expect((await postDelete('owner', { measurementId: id, confirm: 'yes' })).status).toBe(303);
		expect(await stillThere(id)).toBe(false);
	});

	it('a viewer is refused (403) and nothing is deleted or logged', async () => {
		const id = await upload();
		const before = (await deletions()).length;
		expect((await postDelete('viewer', { measurementId: id, confirm: 'yes' })).status).toBe(403);
		expect(await stillThere(id)).toBe(true);
		expect(await deletions()).toHaveLength(before);
	});

	it('a non-member gets 404 (the design is not said to exist) and nothing is deleted', async () => {
		const id = await upload();
		expect((await postDelete('non-member', { measurementId: id, confirm: 'yes' })).status).toBe(404);
		expect(await stillThere(id)).toBe(true);
	});

	it('an unknown measurement is 404', async () => {
		expect((await postDelete('editor', { measurementId: '00000000-0000-4000-8000-000000000000', confirm: 'yes' })).status).toBe(404);
		expect((await postDelete('editor', { measurementId: 'not-an-id', confirm: 'yes' })).status).toBe(404);
	});

	it('a measurement a revision was retuned from is kept (409), since that revision names it in its history', async () => {
		const id = await upload('retune-source.s1p');
		const revision = (await findRevision(db, ws.designId, 'A'))!;
		const measurement = (await measurements.findMeasurementView(db, revisionId, id))!;
		const saved = await measurements.confirmRetune(db, { designId: ws.designId, revision, measurement, userId: ws.people.editor.id });
		const refused = await postDelete('editor', { measurementId: id, confirm: 'yes' });
		expect(refused.status).toBe(409);
		expect([refused.data?.action, refused.data?.detail?.confirm]).toEqual(['delete', false]);
		expect(refused.data?.message).toContain(`revision ${saved.label}`);
		expect(await stillThere(id)).toBe(true);
	});
});
