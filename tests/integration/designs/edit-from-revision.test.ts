// The editor starts from exactly the revision its link names, never from the newest one: on a design whose newest
// revision is a fork (A → B → C, and D from A), "Edit from C" loads C, saves a child of C, and a refused save keeps C.
import { isRedirect } from '@sveltejs/kit';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { formValuesFromInput } from '../../../src/lib/design/design-form-fields';
import { parseDesignInput } from '../../../src/lib/schemas';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { createDesign, saveRevision } from '../../../src/lib/server/designs';
import * as overviewPage from '../../../src/routes/(app)/designs/[designId]/+page.server';
import * as editPage from '../../../src/routes/(app)/designs/[designId]/edit/+page.server';
import { createTestTeam, sampleInput, type TestTeam } from './test-team';

const db = getDb();
let team: TestTeam;
let designId: string;

beforeAll(async () => {
	team = await createTestTeam(db, 'editfrom');
	designId = (await createDesign(db, { teamId: team.teamId, userId: team.users.editor.id, raw: sampleInput({ name: 'Fork patch' }) })).design.id;
	const save = (parentLabel: string, frequencyHz: number) => saveRevision(db, { designId, parentLabel, userId: team.users.editor.id, raw: sampleInput({ name: 'Fork patch', frequencyHz }) });
	await save('A', 2.44e9); // B
	await save('B', 2.43e9); // C
	await save('A', 2.47e9); // D: the newest revision is a fork of A
});
afterAll(() => closeDb());

function event(path: string, form?: Record<string, string>) {
	const u = team.users.editor;
	const user = { id: u.id, email: u.email, displayName: u.displayName };
	const url = new URL(`http://127.0.0.1${path}`);
	const jar = new Map<string, string>([['ff_team', team.teamId]]);
	return {
		locals: { user, sessionId: 'test', apiToken: null, identity: { user, sessionId: 'test', apiToken: null } },
		url,
		params: { designId },
		cookies: { get: (k: string) => jar.get(k), set: (k: string, v: string) => void jar.set(k, v), getAll: () => [...jar].map(([name, value]) => ({ name, value })), delete: (k: string) => void jar.delete(k), serialize: () => '' },
		request: new Request(url, form ? { method: 'POST', body: new URLSearchParams(form), headers: { 'content-type': 'application/x-www-form-urlencoded' } } : undefined),
		parent: async () => ({}),
		depends: () => undefined
	} as never;
}

async function redirectOf(fn: () => unknown): Promise<string> {
	try {
		await fn();
	} catch (err) {
		if (isRedirect(err)) return err.location;
		throw err;
	}
	throw new Error('expected a redirect');
}

const formFrom = (from: string, frequencyGHz: string) => ({ ...formValuesFromInput(parseDesignInput(sampleInput({ name: 'Fork patch' }))), frequencyGHz, from, note: `from ${from}` });
const parentOf = async (label: string) =>
	(await db.selectFrom('revision as r').innerJoin('revision as p', 'p.id', 'r.parent_id').select('p.label').where('r.design_id', '=', designId).where('r.label', '=', label).executeTakeFirstOrThrow()).label;

describe('editing from a named revision', () => {
	it('the design page offers every revision by name, so C can be edited while a fork of A is newest', async () => {
		const data = (await overviewPage.load(event(`/designs/${designId}`))) as { revisions: { label: string }[]; canEdit: boolean };
		expect(data.revisions.map((r) => r.label)).toEqual(['A', 'B', 'C', 'D']);
		expect(data.canEdit).toBe(true);
	});

	it('loads exactly the revision named by ?from=, not the newest', async () => {
		const data = (await editPage.load(event(`/designs/${designId}/edit?from=C`))) as { parent: { label: string; input: { frequencyHz: number } } };
		expect(data.parent.label).toBe('C');
		expect(data.parent.input.frequencyHz).toBe(2.43e9);
	});

	it('never guesses a revision: without ?from= it sends the editor to the design’s history', async () => {
		// The URL a refused no-script save used to come back on (`?/save`): the old code fell back to the newest, D.
		expect(await redirectOf(() => editPage.load(event(`/designs/${designId}/edit?/save`)))).toBe(`/designs/${designId}#history-heading`);
	});

	it('a refused save comes back on the same revision, and the next save is a child of C', async () => {
		const refused = (await editPage.actions.save(event(`/designs/${designId}/edit?from=C&/save`, formFrom('C', '0.01')))) as unknown as { status: number };
		expect(refused.status).toBe(400);
		// The page the browser shows after it is loaded from the action's own URL, which keeps ?from=C.
		const again = (await editPage.load(event(`/designs/${designId}/edit?from=C&/save`))) as { parent: { label: string } };
		expect(again.parent.label).toBe('C');
		const location = await redirectOf(() => editPage.actions.save(event(`/designs/${designId}/edit?from=C&/save`, formFrom('C', '2.42'))));
		expect(location).toBe(`/designs/${designId}/r/E`);
		expect(await parentOf('E')).toBe('C');
	});

	it('an edit of a tuned revision on a named laminate keeps the pinned dimensions and the laminate the fab notes order', async () => {
		// demo values: a revision Homing pinned (length, inset depth) on a laminate named in the team's library
		const tuned = sampleInput({
			name: 'Fork patch',
			substrate: { relativePermittivity: 4.31, lossTangent: 0.018, heightMm: 1.6 },
			laminate: { name: 'Team glass-epoxy 1.6', relativePermittivity: 4.4, lossTangent: 0.02 },
			overrides: { lengthMm: 28.73, insetDepthMm: 5.41 }
		});
		await saveRevision(db, { designId, parentLabel: 'A', userId: team.users.editor.id, raw: tuned }); // F
		const form = { ...formValuesFromInput(parseDesignInput(tuned)), from: 'F', note: 'note only' };
		expect(await redirectOf(() => editPage.actions.save(event(`/designs/${designId}/edit?from=F&/save`, form)))).toBe(`/designs/${designId}/r/G`);
		const saved = await db.selectFrom('revision').select('input').where('design_id', '=', designId).where('label', '=', 'G').executeTakeFirstOrThrow();
		const input = parseDesignInput(saved.input);
		expect(input.overrides).toEqual({ lengthMm: 28.73, insetDepthMm: 5.41 });
		expect(input.laminate).toEqual({ name: 'Team glass-epoxy 1.6', relativePermittivity: 4.4, lossTangent: 0.02 });
	});
});
