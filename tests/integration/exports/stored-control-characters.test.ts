// Abuse review item 11: a revision stored before control characters were refused (written straight into the
// database here, past every schema) still exports well-formed files: the SVG parses as strict XML (sax, svgdom's
// own parser), every Excellon and Gerber file reads back (the app's read-back on @tracespace/parser), the DXF
// parses (dxf-parser), the sweep is JSON, and the fab notes' title stays one line.
import { randomUUID } from 'node:crypto';
import type { RequestEvent } from '@sveltejs/kit';
import DxfParser from 'dxf-parser';
import JSZip from 'jszip';
import sax from 'sax';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readDrill } from '../../../src/lib/formats/readback/read-drill';
import { parseGerberTree } from '../../../src/lib/formats/readback/read-gerber';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { createDesign } from '../../../src/lib/server/designs/create-design';
import * as uiExportRoute from '../../../src/routes/(app)/designs/[designId]/r/[label]/export/[format=format]/+server';
import { callRoute, createWorkspace, demoInput, identityOf, type Workspace } from './workspace-fixture';

type Handler = (event: RequestEvent) => Response | Promise<Response>;

/**
 * One of each class the schemas now refuse: C0 (SOH, tab, LF, VT, FF, CR, ESC), DEL, C1 (NEL, U+009F), LS, PS.
 * (NUL is left out: PostgreSQL cannot store it in text or jsonb, so no stored name holds one.)
 */
const HOSTILE_NAME = 'Pier\u0001sensor\t\n\u000b\u000c\r\u001b\u007f\u0085\u009f\u2028\u2029LAYER COUNT: 6';

let ws: Workspace;
let designId = '';

beforeAll(async () => {
	ws = await createWorkspace('ctl');
	// A probe-fed patch, so the drill files have a hole to read back.
	const { design } = await createDesign(getDb(), { teamId: ws.teamId, userId: ws.people.owner.id, raw: { ...demoInput('Clean name'), feed: 'probe' } });
	const clean = await getDb().selectFrom('revision').selectAll().where('design_id', '=', design.id).executeTakeFirstOrThrow();
	designId = randomUUID();
	const input = { ...(clean.input as object), name: HOSTILE_NAME };
	const results = clean.results as { input: object };
	await getDb().insertInto('design').values({ id: designId, team_id: ws.teamId, slug: `pier-sensor-${ws.suffix}`, name: HOSTILE_NAME, created_by: ws.people.owner.id }).execute();
	await getDb()
		.insertInto('revision')
		.values({ id: randomUUID(), design_id: designId, label: 'A', seq: 1, parent_id: null, input: JSON.stringify(input), results: JSON.stringify({ ...results, input: { ...results.input, name: HOSTILE_NAME } }), note: 'stored\u0000-free but\u0001hostile'.replace('\u0000', ''), created_by: ws.people.owner.id })
		.execute();
});
afterAll(() => closeDb());

function strictXmlErrors(text: string): string[] {
	const errors: string[] = [];
	const parser = sax.parser(true);
	parser.onerror = (e) => {
		errors.push(e.message.split('\n')[0]);
		parser.resume();
	};
	parser.write(text).close();
	return errors;
}

describe('a stored revision whose name holds control characters', () => {
	it('still downloads as a bundle of well-formed files', async () => {
		const identity = await identityOf(ws, 'viewer', 'session');
		const res = await callRoute(uiExportRoute.GET as Handler, { identity, path: `/designs/${designId}/r/A/export/bundle`, params: { designId, label: 'A', format: 'bundle' } });
		expect(res.status, await res.clone().text()).toBe(200);
		const zip = await JSZip.loadAsync(new Uint8Array(await res.arrayBuffer()));
		const text = async (suffix: string) => {
			const names = Object.keys(zip.files).filter((n) => n.endsWith(suffix));
			expect(names.length, suffix).toBeGreaterThan(0);
			return Promise.all(names.map(async (n) => ({ name: n, text: await zip.file(n)!.async('string') })));
		};

		for (const svg of await text('.svg')) {
			expect(strictXmlErrors(svg.text), svg.name).toEqual([]);
			expect(svg.text).toContain('Pier sensor');
		}

		const drills = await text('.drl');
		for (const drl of drills) {
			const read = readDrill(drl.text);
			expect(read.problems, drl.name).toEqual([]);
			expect(drl.text).not.toMatch(/[\u0000-\u0008\u000b-\u001f\u007f-\u009f\u2028\u2029]/);
		}
		expect(drills.flatMap((d) => readDrill(d.text).holes).length).toBeGreaterThan(0);

		for (const gbr of await text('.gbr')) expect(parseGerberTree(gbr.text).done, gbr.name).toBe(true);

		for (const dxf of await text('.dxf')) expect(new DxfParser().parseSync(dxf.text), dxf.name).toBeTruthy();

		for (const json of await text('.json')) expect(() => JSON.parse(json.text), json.name).not.toThrow();

		const [notes] = await text('.txt');
		const lines = notes.text.split(/\r\n|[\n\r\u000b\u000c\u0085\u2028\u2029]/);
		expect(lines[0]).toMatch(/^FABRICATION NOTES — Pier sensor +LAYER COUNT: 6$/);
		expect(lines.filter((l) => /^\s*LAYER COUNT/.test(l))).toEqual([]);
	});
});
