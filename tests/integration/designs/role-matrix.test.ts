// Every design and laminate page load and form action × {anonymous, non-member, viewer, editor, owner},
// called the way SvelteKit calls them, against the real PostgreSQL.
import { isHttpError, isRedirect } from '@sveltejs/kit';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { createDesign } from '../../../src/lib/server/designs';
import * as designsPage from '../../../src/routes/(app)/designs/+page.server';
import * as overviewPage from '../../../src/routes/(app)/designs/[designId]/+page.server';
import * as revisionPage from '../../../src/routes/(app)/designs/[designId]/r/[label]/+page.server';
import * as editPage from '../../../src/routes/(app)/designs/[designId]/edit/+page.server';
import * as diffPage from '../../../src/routes/(app)/designs/[designId]/diff/+page.server';
import * as laminatesPage from '../../../src/routes/(app)/laminates/+page.server';
import { formValuesFromInput } from '../../../src/lib/design/design-form-fields';
import { parseDesignInput } from '../../../src/lib/schemas';
import { createTestTeam, sampleInput, type TestTeam } from './test-team';

type Who = 'anonymous' | 'outsider' | 'viewer' | 'editor' | 'owner';
const everyone: Who[] = ['anonymous', 'outsider', 'viewer', 'editor', 'owner'];

const db = getDb();
let team: TestTeam;
let designId: string;

beforeAll(async () => {
	team = await createTestTeam(db, 'matrix');
	designId = (await createDesign(db, { teamId: team.teamId, userId: team.users.editor.id, raw: sampleInput({ name: 'Matrix patch' }) })).design.id;
});
afterAll(() => closeDb());

function event(who: Who, path: string, opts: { params?: Record<string, string>; form?: Record<string, string> } = {}) {
	const u = who === 'anonymous' ? null : team.users[who];
	const user = u ? { id: u.id, email: u.email, displayName: u.displayName } : null;
	const url = new URL(`http://127.0.0.1${path}`);
	const body = opts.form ? new URLSearchParams(opts.form) : undefined;
	const jar = new Map<string, string>([['ff_team', team.teamId]]);
	return {
		locals: { user, sessionId: user ? 'test' : null, apiToken: null, identity: { user, sessionId: user ? 'test' : null, apiToken: null } },
		url,
		params: opts.params ?? {},
		cookies: { get: (k: string) => jar.get(k), set: (k: string, v: string) => void jar.set(k, v), getAll: () => [...jar].map(([name, value]) => ({ name, value })), delete: (k: string) => void jar.delete(k), serialize: () => '' },
		request: new Request(url, body ? { method: 'POST', body, headers: { 'content-type': 'application/x-www-form-urlencoded' } } : undefined),
		parent: async () => ({}),
		depends: () => undefined
	} as never;
}

/** What the caller gets: 200, a status code, "signin" for the redirect to sign-in, "303" for another redirect, "fail 400". */
async function outcome(fn: () => Promise<unknown> | unknown): Promise<string> {
	try {
		const result = (await fn()) as { status?: number; data?: unknown } | undefined;
		if (result && typeof result === 'object' && 'status' in result && 'data' in result && typeof result.status === 'number') return `fail ${result.status}`;
		return '200';
	} catch (err) {
		if (isRedirect(err)) return err.location.startsWith('/signin') ? 'signin' : String(err.status);
		if (isHttpError(err)) return String(err.status);
		throw err;
	}
}

const read = { anonymous: 'signin', outsider: '404', viewer: '200', editor: '200', owner: '200' };
const write = (ok: string) => ({ anonymous: 'signin', outsider: '404', viewer: '403', editor: ok, owner: ok });

function saveForm(frequencyGHz: string) {
	const values = formValuesFromInput(parseDesignInput(sampleInput()));
	return { ...values, frequencyGHz, from: 'A', note: 'matrix save' };
}

const cells: { name: string; expected: Record<Who, string>; run: (who: Who) => Promise<unknown> | unknown }[] = [
	{ name: 'GET /designs', expected: { ...read, outsider: '200' }, run: (w) => designsPage.load(event(w, '/designs')) },
	{
		name: 'POST /designs ?/create',
		expected: write('303'),
		run: (w) => designsPage.actions.create(event(w, '/designs?/create', { form: { teamId: team.teamId, name: `Made by ${w}`, frequencyGHz: '2.45', shape: 'rectangular', laminateId: 'preset:glass-epoxy-1.6' } }))
	},
	{ name: 'GET /designs/[id]', expected: read, run: (w) => overviewPage.load(event(w, `/designs/${designId}`, { params: { designId } })) },
	{ name: 'GET /designs/[id]/r/A', expected: read, run: (w) => revisionPage.load(event(w, `/designs/${designId}/r/A`, { params: { designId, label: 'A' } })) },
	{ name: 'GET /designs/[id]/diff', expected: read, run: (w) => diffPage.load(event(w, `/designs/${designId}/diff?a=A&b=A`, { params: { designId } })) },
	{ name: 'GET /designs/[id]/edit', expected: write('200'), run: (w) => editPage.load(event(w, `/designs/${designId}/edit?from=A`, { params: { designId } })) },
	{ name: 'POST /designs/[id]/edit ?/save', expected: write('303'), run: (w) => editPage.actions.save(event(w, `/designs/${designId}/edit?/save`, { params: { designId }, form: saveForm('2.44') })) },
	{ name: 'GET /laminates', expected: { ...read, outsider: '200' }, run: (w) => laminatesPage.load(event(w, '/laminates')) },
	{
		name: 'POST /laminates ?/add',
		expected: write('200'),
		run: (w) =>
			laminatesPage.actions.add(
				event(w, '/laminates?/add', {
					form: { teamId: team.teamId, name: `Stock of ${w}`, relativePermittivity: '3.0', lossTangent: '0.003', heightMm: '0.76', copperThicknessUm: '35', relativePermittivityTolerance: '0.05', heightToleranceMm: '0.03' }
				})
			)
	}
];

describe('role matrix for design and laminate pages', () => {
	for (const cell of cells) {
		it(`${cell.name}: ${everyone.map((w) => `${w} → ${cell.expected[w]}`).join(', ')}`, async () => {
			const got: Record<string, string> = {};
			for (const who of everyone) got[who] = await outcome(() => cell.run(who));
			expect(got).toEqual(cell.expected);
		});
	}

	it('a non-member sees none of the team’s designs or laminates on the list pages', async () => {
		const designsData = (await designsPage.load(event('outsider', '/designs'))) as { team: unknown; designs: unknown[] };
		expect(designsData.team).toBeNull();
		expect(designsData.designs).toEqual([]);
		const lam = (await laminatesPage.load(event('outsider', '/laminates'))) as { laminates: unknown[] };
		expect(lam.laminates).toEqual([]);
	});

	it('a viewer is told they cannot edit; an editor is offered the editor', async () => {
		const asViewer = (await revisionPage.load(event('viewer', `/designs/${designId}/r/A`, { params: { designId, label: 'A' } }))) as { canEdit: boolean };
		const asEditor = (await revisionPage.load(event('editor', `/designs/${designId}/r/A`, { params: { designId, label: 'A' } }))) as { canEdit: boolean };
		expect([asViewer.canEdit, asEditor.canEdit]).toEqual([false, true]);
	});

	it('a bad save comes back as 400 with each issue beside its field and the typed text kept', async () => {
		const form = { ...saveForm('0.01'), 'substrate.heightMm': 'thick' };
		const result = (await editPage.actions.save(event('editor', `/designs/${designId}/edit?/save`, { params: { designId }, form }))) as unknown as {
			status: number;
			data: { action: string; values: Record<string, string>; fieldErrors: { field: string; message: string }[] };
		};
		expect([result.status, result.data.action]).toEqual([400, 'save']);
		expect(result.data.values.frequencyGHz).toBe('0.01');
		expect(result.data.values['substrate.heightMm']).toBe('thick');
		const fields = result.data.fieldErrors.map((i) => i.field).sort();
		expect(fields).toEqual(['frequencyGHz', 'substrate.heightMm']);
		// The range is restated in the field's own unit (GHz), not the document's Hz.
		expect(result.data.fieldErrors.find((i) => i.field === 'frequencyGHz')!.message).toMatch(/\[0\.1, 100\] GHz/);
	});
});
