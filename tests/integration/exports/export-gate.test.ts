// The design-rule gate and the read-back self-check on real downloads against the real PostgreSQL: refused exports
// write no record, waived ones write one with the waiver (and the fab notes carry it), viewers may not waive, and a
// corrupted writer output is refused with a support id.
import type { RequestEvent } from '@sveltejs/kit';
import JSZip from 'jszip';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { saveRevision } from '../../../src/lib/server/designs/save-revision';
import { exportForRequest, exportRevision, ExportRefusedError, loadExportTarget, ReadBackFailedError, type ExportDependencies } from '../../../src/lib/server/exports';
import { STANDARD_MULTILAYER_PROFILE, STANDARD_QUICK_TURN_PROFILE } from '../../../src/lib/schemas/fab-profile';
import { resolveFabProfileChoice } from '../../../src/lib/server/fab-profiles';
import { layeredDocument, threeCopperStack } from '../../fixtures/designs/layered-cases';
import type { RequestIdentity, RequestUser } from '../../../src/lib/server/auth/request-identity';
import * as uiExportRoute from '../../../src/routes/(app)/designs/[designId]/r/[label]/export/[format=format]/+server';
import * as apiExportRoute from '../../../src/routes/api/v1/designs/[designId]/revisions/[label]/export/[format=format]/+server';
import * as refusedPage from '../../../src/routes/(app)/designs/[designId]/r/[label]/export/refused/+page.server';
import { call } from '../accounts/helpers/route-event';
import { callRoute, createWorkspace, demoInput, identityOf, type CallerKind, type Workspace } from './workspace-fixture';

type Handler = (event: RequestEvent) => Response | Promise<Response>;

let ws: Workspace;
/** Revision B: the demo patch with a 0.15 mm notch gap, under the built-in 0.2 mm minimum slot (two violations, one per side). */
let narrowNotch = 'B';
/** Revision C: clean geometry, but saved with a profile whose minimum trace is wider than its 50 Ω feed line. */
let wideTraceRule = 'C';

beforeAll(async () => {
	ws = await createWorkspace('gate');
	const db = getDb();
	const base = demoInput(`Bench patch ${ws.suffix}`);
	narrowNotch = (await saveRevision(db, { designId: ws.designId, parentLabel: 'A', userId: ws.people.editor.id, raw: { ...base, inset: { notchGapMm: 0.15 } }, note: 'narrow notch' })).label;
	wideTraceRule = (
		await saveRevision(db, { designId: ws.designId, parentLabel: 'A', userId: ws.people.editor.id, raw: base, note: 'coarse fab', fabProfile: { ...STANDARD_QUICK_TURN_PROFILE, name: `Coarse ${ws.suffix}`, minTraceWidthMm: 5 } })
	).label;
});
afterAll(() => closeDb());

async function recordsOf(label: string) {
	return getDb()
		.selectFrom('export_record')
		.innerJoin('revision', 'revision.id', 'export_record.revision_id')
		.selectAll('export_record')
		.where('export_record.design_id', '=', ws.designId)
		.where('revision.label', '=', label)
		.execute();
}

async function uiGet(label: string, kind: string, who: CallerKind = 'editor') {
	const identity = await identityOf(ws, who, 'session');
	return callRoute(uiExportRoute.GET as Handler, { identity, path: `/designs/${ws.designId}/r/${label}/export/${kind}`, params: { designId: ws.designId, label, format: kind } });
}

async function uiWaive(label: string, kind: string, who: CallerKind, waiver: string) {
	const identity = await identityOf(ws, who, 'session');
	const body = new URLSearchParams({ waiver }).toString();
	return callRoute(uiExportRoute.POST as Handler, { identity, path: `/designs/${ws.designId}/r/${label}/export/${kind}`, params: { designId: ws.designId, label, format: kind }, method: 'POST', rawBody: body, contentType: 'application/x-www-form-urlencoded' });
}

async function api(label: string, kind: string, who: CallerKind, body?: unknown) {
	const identity = await identityOf(ws, who, 'token');
	const handler = (body === undefined ? apiExportRoute.GET : apiExportRoute.POST) as Handler;
	return callRoute(handler, { identity, path: `/api/v1/designs/${ws.designId}/revisions/${label}/export/${kind}`, params: { designId: ws.designId, label, format: kind }, ...(body === undefined ? {} : { method: 'POST', body }) });
}

async function fabNotesOf(zipBytes: ArrayBuffer): Promise<string> {
	const zip = await JSZip.loadAsync(zipBytes);
	const name = Object.keys(zip.files).find((n) => n.endsWith('.fab-notes.txt'))!;
	return zip.file(name)!.async('string');
}

describe('the design-rule gate', () => {
	it('records the built-in profile on a revision saved without one, and the chosen values on one saved with one', async () => {
		const rows = await getDb().selectFrom('revision').select(['label', 'fab_profile']).where('design_id', '=', ws.designId).orderBy('seq').execute();
		expect(rows.find((r) => r.label === 'A')!.fab_profile).toEqual(STANDARD_QUICK_TURN_PROFILE);
		expect(rows.find((r) => r.label === wideTraceRule)!.fab_profile).toMatchObject({ name: `Coarse ${ws.suffix}`, minTraceWidthMm: 5 });
	});

	it('lets a clean revision download as before, with no waiver on its record', async () => {
		const res = await uiGet('A', 'bundle');
		expect(res.status).toBe(200);
		const rec = (await recordsOf('A')).find((r) => r.id === res.headers.get('x-export-id'))!;
		expect(rec.waiver).toBeNull();
	});

	it.each(['bundle', 'gerber', 'dxf', 'notes'])('refuses %s of a narrow-notch revision over the API with 422 and the violations, writing no record', async (kind) => {
		const before = (await recordsOf(narrowNotch)).length;
		const res = await api(narrowNotch, kind, 'owner');
		expect(res.status).toBe(422);
		const body = await res.json();
		expect(body.profile).toEqual(STANDARD_QUICK_TURN_PROFILE);
		// one slot-width violation on each side of the inset feed (the notch gaps), nothing else
		expect(body.violations.map((v: { ruleId: string }) => v.ruleId)).toEqual(['slot-width', 'slot-width']);
		for (const v of body.violations) expect(v).toMatchObject({ layerId: 'copper-top', requiredMm: 0.2, location: { xMm: expect.any(Number), yMm: expect.any(Number) } });
		expect(body.violations[0].measuredMm).toBeCloseTo(0.15, 6);
		expect((await recordsOf(narrowNotch)).length).toBe(before);
	});

	it('refuses against the profile the revision recorded: a min trace wider than the feed line fires trace-width', async () => {
		const res = await api(wideTraceRule, 'gerber', 'viewer');
		expect(res.status).toBe(422);
		const body = await res.json();
		expect(body.profile.minTraceWidthMm).toBe(5);
		expect(body.violations.length).toBeGreaterThan(0);
		expect(new Set(body.violations.map((v: { ruleId: string }) => v.ruleId))).toContain('trace-width');
		expect((await recordsOf(wideTraceRule)).length).toBe(0);
	});

	it('sends a refused UI download to the refusal page, writing no record', async () => {
		const before = (await recordsOf(narrowNotch)).length;
		const res = await uiGet(narrowNotch, 'bundle', 'viewer');
		expect(res.status).toBe(303);
		expect(res.headers.get('location')).toBe(`/designs/${encodeURIComponent(ws.designId)}/r/${narrowNotch}/export/refused?format=bundle`);
		expect((await recordsOf(narrowNotch)).length).toBe(before);
	});

	it('exports a waived revision (UI form) with one record carrying the waiver, printed in the fab notes with each violation', async () => {
		const before = (await recordsOf(narrowNotch)).length;
		const reason = 'Fab confirmed 0.15 mm gaps on this panel';
		const res = await uiWaive(narrowNotch, 'bundle', 'editor', `  ${reason}\n`);
		expect(res.status).toBe(200);
		const after = await recordsOf(narrowNotch);
		expect(after.length).toBe(before + 1);
		const rec = after.find((r) => r.id === res.headers.get('x-export-id'))!;
		expect(rec).toMatchObject({ waiver: reason, via: 'ui', user_id: ws.people.editor.id, kind: 'bundle' });
		const notes = await fabNotesOf(await res.arrayBuffer());
		expect(notes).toContain(`DESIGN-RULE WAIVER: 2 design-rule violations against the "${STANDARD_QUICK_TURN_PROFILE.name}" profile accepted by the design team. Reason: "${reason}"`);
		expect(notes.match(/ - Waived: /g)?.length).toBe(2);
	});

	it('exports a waived revision over the API (POST {waiver}) with the waiver on the record', async () => {
		const res = await api(wideTraceRule, 'notes', 'owner', { waiver: 'Coarse profile is only a drill' });
		expect(res.status).toBe(200);
		const rec = (await recordsOf(wideTraceRule)).find((r) => r.id === res.headers.get('x-export-id'))!;
		expect(rec).toMatchObject({ waiver: 'Coarse profile is only a drill', via: 'api', kind: 'notes' });
		expect(await res.text()).toContain('Reason: "Coarse profile is only a drill');
	});

	it.each([
		['ui', 'viewer'],
		['api', 'viewer']
	] as const)('answers a viewer’s waiver attempt (%s) with 403 and writes no record', async (route, who) => {
		const before = (await recordsOf(narrowNotch)).length;
		const res = route === 'ui' ? await uiWaive(narrowNotch, 'bundle', who, 'I would like it anyway') : await api(narrowNotch, 'bundle', who, { waiver: 'I would like it anyway' });
		expect(res.status).toBe(403);
		expect((await recordsOf(narrowNotch)).length).toBe(before);
	});

	it('answers a non-member’s waiver attempt with 404 (no existence leak)', async () => {
		const res = await api(narrowNotch, 'bundle', 'non-member', { waiver: 'not my team at all' });
		expect(res.status).toBe(404);
	});

	it('refuses a waiver without a real reason: 400 over the API, back to the form in the UI, no record', async () => {
		const before = (await recordsOf(narrowNotch)).length;
		const res = await api(narrowNotch, 'bundle', 'editor', { waiver: '  ' });
		expect(res.status).toBe(400);
		expect((await res.json()).issues[0].path).toBe('waiver');
		const ui = await uiWaive(narrowNotch, 'bundle', 'editor', 'ok');
		expect(ui.status).toBe(303);
		expect(ui.headers.get('location')).toMatch(/\/export\/refused\?format=bundle&issue=/);
		expect((await recordsOf(narrowNotch)).length).toBe(before);
	});

	it('does not record a waiver on a clean revision (nothing was waived)', async () => {
		const res = await api('A', 'dxf', 'editor', { waiver: 'belt and braces' });
		expect(res.status).toBe(200);
		const rec = (await recordsOf('A')).find((r) => r.id === res.headers.get('x-export-id'))!;
		expect(rec.waiver).toBeNull();
	});

	it('throws the typed refusal from the service itself, with the violations and the profile', async () => {
		const target = (await loadExportTarget(ws.designId, narrowNotch))!;
		const err = await exportRevision(target, 'svg', { userId: ws.people.owner.id, via: 'ui' }).catch((e) => e);
		expect(err).toBeInstanceOf(ExportRefusedError);
		expect((err as ExportRefusedError).violations).toHaveLength(2);
	});
});

describe('the gate and a stack of two different cores without a bonding film', () => {
	/** Aperture-coupled: εr 2.2 core, slot copper, εr 3.55 core, listed with no bonding film between them (demo data). */
	const twoCores = () => layeredDocument({ name: `Bench patch ${ws.suffix}`, feed: 'aperture-coupled', stack: [threeCopperStack[0], threeCopperStack[1], threeCopperStack[3], threeCopperStack[4], threeCopperStack[5]] });

	it('refuses it against a two-layer profile, saying in words that the house cannot build it', async () => {
		const label = (await saveRevision(getDb(), { designId: ws.designId, parentLabel: 'A', userId: ws.people.editor.id, raw: twoCores(), note: 'two cores, two-layer house', fabProfile: STANDARD_QUICK_TURN_PROFILE })).label;
		const res = await api(label, 'bundle', 'owner');
		expect(res.status).toBe(422);
		const body = await res.json();
		expect(body.profile.name).toBe(STANDARD_QUICK_TURN_PROFILE.name);
		const stack = body.violations.filter((v: { ruleId: string }) => v.ruleId === 'stack-build');
		expect(stack.map((v: { message: string }) => v.message)).toEqual([
			expect.stringMatching(/^the stack has 3 copper layers, and its 2 cores are listed with no bonding film between them .*builds at most 2: choose a fab profile of a multilayer process/),
			expect.stringMatching(/^the stack bonds cores of 2 different materials .*does not build mixed-material boards/)
		]);
		expect((await recordsOf(label)).length).toBe(0);
	});

	it('records the built-in multilayer profile for the built-in choice (and for no choice), which builds it; the notes name it', async () => {
		const chosen = await resolveFabProfileChoice(getDb(), ws.teamId, 'built-in', twoCores());
		expect(chosen).toEqual(STANDARD_MULTILAYER_PROFILE);
		const label = (await saveRevision(getDb(), { designId: ws.designId, parentLabel: 'A', userId: ws.people.editor.id, raw: twoCores(), note: 'two cores, no profile named' })).label;
		const row = await getDb().selectFrom('revision').select('fab_profile').where('design_id', '=', ws.designId).where('label', '=', label).executeTakeFirstOrThrow();
		expect(row.fab_profile).toEqual(STANDARD_MULTILAYER_PROFILE);
		const res = await api(label, 'notes', 'owner');
		expect(res.status).toBe(200);
		const notes = await res.text();
		expect(notes).toContain(`Fab profile: "${STANDARD_MULTILAYER_PROFILE.name}".`);
		expect(notes).toContain('[ ] Layer count: 3 copper layers (top side, 1 inner layer, bottom side)');
		expect(notes).toContain('The stack lists no bonding film between its 2 cores');
	});
});

describe('the refusal page', () => {
	it.each([
		['viewer', 'ok', false],
		['editor', 'ok', true],
		['owner', 'ok', true],
		['non-member', 404, false]
	] as const)('for a %s: %s, waiver form %s', async (who, outcome, canWaive) => {
		const r = await call(refusedPage.load as never, { identity: await identityOf(ws, who, 'session'), path: `/designs/${ws.designId}/r/${narrowNotch}/export/refused?format=gerber`, params: { designId: ws.designId, label: narrowNotch } });
		expect(r.outcome).toBe(outcome);
		if (outcome !== 'ok') return;
		const data = r.data as { canWaive: boolean; violations: { ruleId: string }[]; format: string; profile: { name: string } };
		expect(data.canWaive).toBe(canWaive);
		expect(data.format).toBe('gerber');
		expect(data.violations.map((v) => v.ruleId)).toEqual(['slot-width', 'slot-width']);
		expect(data.profile.name).toBe(STANDARD_QUICK_TURN_PROFILE.name);
	});

	it('lists nothing for a clean revision', async () => {
		const r = await call(refusedPage.load as never, { identity: await identityOf(ws, 'editor', 'session'), path: `/designs/${ws.designId}/r/A/export/refused`, params: { designId: ws.designId, label: 'A' } });
		expect((r.data as { violations: unknown[] }).violations).toEqual([]);
	});
});

describe('the read-back self-check', () => {
	const identity = async (who: CallerKind) => (await identityOf(ws, who, 'session')) as RequestIdentity & { user: RequestUser };
	/** Test-only: shifts every flash and move of the top copper by 1 mm in x (a writer bug a fab would build). */
	function shiftTopCopper(logs: string[]): ExportDependencies {
		return {
			logError: (line) => logs.push(line),
			corruptFiles: (files) =>
				files.map((f) => {
					if (!f.name.endsWith('.copper-top.gbr')) return f;
					const text = new TextDecoder().decode(f.bytes).replace(/^X(-?\d+)Y/gm, (_, x: string) => `X${BigInt(x) + 1_000_000n}Y`);
					return { name: f.name, bytes: new TextEncoder().encode(text) };
				})
		};
	}

	it.each(['bundle', 'gerber'] as const)('refuses a corrupted %s as an internal error with a support id, logs the mismatches, writes no record', async (kind) => {
		const before = (await recordsOf('A')).length;
		const logs: string[] = [];
		const err = await exportForRequest(await identity('editor'), { designId: ws.designId, label: 'A', kind }, 'ui', { deps: shiftTopCopper(logs) }).catch((e) => e);
		expect(err.status).toBe(500);
		const supportId = err.body.errorId as string;
		expect(supportId).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
		expect(err.body.message).toContain(supportId);
		expect(logs).toHaveLength(1);
		const logged = JSON.parse(logs[0]);
		expect(logged).toMatchObject({ event: 'export.read-back-mismatch', supportId, designId: ws.designId, revision: 'A', kind });
		expect(logged.mismatches.some((m: { layerKey: string }) => m.layerKey === 'copper-L1')).toBe(true);
		expect((await recordsOf('A')).length).toBe(before);
	});

	it('throws the typed failure from the service, and lets the same export through without the corruption', async () => {
		const target = (await loadExportTarget(ws.designId, 'A'))!;
		const logs: string[] = [];
		const err = await exportRevision(target, 'bundle', { userId: ws.people.owner.id, via: 'api' }, { deps: shiftTopCopper(logs) }).catch((e) => e);
		expect(err).toBeInstanceOf(ReadBackFailedError);
		expect((err as ReadBackFailedError).mismatches.length).toBeGreaterThan(0);
		const ok = await exportRevision(target, 'bundle', { userId: ws.people.owner.id, via: 'api' }, { deps: { logError: (l) => logs.push(l) } });
		expect(ok.exportId).toMatch(/-/);
		expect(logs).toHaveLength(1);
	});

	it('does not read back formats that hold no Gerber or drill file (a corrupted DXF hook changes nothing it checks)', async () => {
		const target = (await loadExportTarget(ws.designId, 'A'))!;
		const ok = await exportRevision(target, 'dxf', { userId: ws.people.owner.id, via: 'api' }, { deps: shiftTopCopper([]) });
		expect(ok.fileName).toMatch(/\.dxf$/);
	});
});
