// Designs and their immutable revisions against the real PostgreSQL: labels, forks, bad input, the trigger.
import { sql } from 'kysely';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, getDb } from '../../../src/lib/server/db';
import * as designQueries from '../../../src/lib/server/db/design.queries';
import * as designs from '../../../src/lib/server/designs';
import { InputError } from '../../../src/lib/schemas';
import { createTestTeam, sampleInput, type TestTeam } from './test-team';

const db = getDb();
let team: TestTeam;

beforeAll(async () => {
	team = await createTestTeam(db, 'rev');
});
afterAll(async () => {
	await closeDb();
});

const revisionCount = async (designId: string) => (await designQueries.listRevisionsByDesign(db, designId)).length;

async function catchInputError(p: Promise<unknown>): Promise<InputError> {
	try {
		await p;
	} catch (err) {
		if (err instanceof InputError) return err;
		throw err;
	}
	throw new Error('expected an InputError');
}

describe('revision labels', () => {
	it('count A … Z, then AA, AB …, like spreadsheet columns', () => {
		const cases: [number, string][] = [
			[1, 'A'],
			[2, 'B'],
			[26, 'Z'],
			[27, 'AA'],
			[28, 'AB'],
			[52, 'AZ'],
			[53, 'BA'],
			[702, 'ZZ'],
			[703, 'AAA']
		];
		for (const [seq, label] of cases) {
			expect(designs.revisionLabel(seq)).toBe(label);
			expect(designs.revisionSeq(label)).toBe(seq);
		}
		expect(() => designs.revisionLabel(0)).toThrow(RangeError);
		expect(designs.revisionSeq('a')).toBeNull();
	});
});

describe('creating a design', () => {
	it('writes the design with revision A holding the validated input and its sized results', async () => {
		const { design, revisionLabel } = await designs.createDesign(db, { teamId: team.teamId, userId: team.users.editor.id, raw: sampleInput({ name: 'Roof Patch 2.4 GHz' }) });
		expect(revisionLabel).toBe('A');
		expect(design.slug).toBe('roof-patch-2-4-ghz');
		const found = await designs.findDesignWithRevisions(db, design.id);
		expect(found!.revisions.map((r) => [r.label, r.parentLabel])).toEqual([['A', null]]);
		const a = found!.revisions[0];
		expect(a.input).toMatchObject({ feed: 'inset', inset: {}, targetImpedanceOhm: 50 }); // defaults filled by the schema
		expect(a.results.patch.kind).toBe('rectangular');
		expect(a.results.frequencyHz).toBe(2.45e9);
	});

	it('gives a second design of the same name its own slug in the team', async () => {
		const first = await designs.createDesign(db, { teamId: team.teamId, userId: team.users.editor.id, raw: sampleInput({ name: 'Twin name' }) });
		const second = await designs.createDesign(db, { teamId: team.teamId, userId: team.users.editor.id, raw: sampleInput({ name: 'Twin name' }) });
		expect(first.design.slug).toBe('twin-name');
		expect(second.design.slug).toBe('twin-name-2');
	});

	it('refuses bad input with the field path and writes nothing', async () => {
		const before = (await designs.listDesigns(db, team.teamId)).length;
		const err = await catchInputError(designs.createDesign(db, { teamId: team.teamId, userId: team.users.editor.id, raw: sampleInput({ frequencyHz: 5 }) }));
		expect(err.issues[0].path).toBe('frequencyHz');
		expect(err.issues[0].message).toMatch(/allowed range/);
		expect((await designs.listDesigns(db, team.teamId)).length).toBe(before);
	});
});

describe('saving revisions', () => {
	it('labels saves B, C, D in order, each with its parent', async () => {
		const { design } = await designs.createDesign(db, { teamId: team.teamId, userId: team.users.editor.id, raw: sampleInput({ name: 'Sequence' }) });
		const b = await designs.saveRevision(db, { designId: design.id, parentLabel: 'A', userId: team.users.editor.id, raw: sampleInput({ frequencyHz: 2.44e9 }) });
		const c = await designs.saveRevision(db, { designId: design.id, parentLabel: 'B', userId: team.users.owner.id, raw: sampleInput({ frequencyHz: 2.43e9 }) });
		const d = await designs.saveRevision(db, { designId: design.id, parentLabel: 'A', userId: team.users.owner.id, raw: sampleInput({ frequencyHz: 2.46e9 }), note: 'back to A, higher' });
		expect([b.label, c.label, d.label]).toEqual(['B', 'C', 'D']);
		const found = await designs.findDesignWithRevisions(db, design.id);
		expect(found!.revisions.map((r) => `${r.label}<${r.parentLabel ?? '-'}`)).toEqual(['A<-', 'B<A', 'C<B', 'D<A']);
		expect(found!.revisions[3].note).toBe('back to A, higher');
		const rev = await designs.findRevision(db, design.id, 'C');
		expect(rev!.parentLabel).toBe('B');
		expect(rev!.input.frequencyHz).toBe(2.43e9);
	});

	it('keeps both of two concurrent saves from one parent: same parent, distinct labels', async () => {
		const { design } = await designs.createDesign(db, { teamId: team.teamId, userId: team.users.editor.id, raw: sampleInput({ name: 'Fork' }) });
		const [x, y] = await Promise.all([
			designs.saveRevision(db, { designId: design.id, parentLabel: 'A', userId: team.users.editor.id, raw: sampleInput({ frequencyHz: 2.41e9 }) }),
			designs.saveRevision(db, { designId: design.id, parentLabel: 'A', userId: team.users.owner.id, raw: sampleInput({ frequencyHz: 2.48e9 }) })
		]);
		expect(new Set([x.label, y.label])).toEqual(new Set(['B', 'C']));
		const found = await designs.findDesignWithRevisions(db, design.id);
		const a = found!.revisions.find((r) => r.label === 'A')!;
		const children = found!.revisions.filter((r) => r.parentId === a.id);
		expect(children).toHaveLength(2);
		expect(children.map((r) => r.input.frequencyHz).sort()).toEqual([2.41e9, 2.48e9]);
	});

	it('refuses bad input with each field path and writes nothing', async () => {
		const { design } = await designs.createDesign(db, { teamId: team.teamId, userId: team.users.editor.id, raw: sampleInput({ name: 'Bad input' }) });
		const err = await catchInputError(
			designs.saveRevision(db, {
				designId: design.id,
				parentLabel: 'A',
				userId: team.users.editor.id,
				raw: sampleInput({ substrate: { relativePermittivity: 0.5, heightMm: 1.6 }, targetImpedanceOhm: 'fifty' })
			})
		);
		expect(err.issues.map((i) => i.path).sort()).toEqual(['substrate.relativePermittivity', 'targetImpedanceOhm']);
		expect(err.issues.find((i) => i.path === 'substrate.relativePermittivity')!.value).toBe(0.5);
		expect(await revisionCount(design.id)).toBe(1);
	});

	it('refuses an unknown parent label and writes nothing', async () => {
		const { design } = await designs.createDesign(db, { teamId: team.teamId, userId: team.users.editor.id, raw: sampleInput({ name: 'No parent' }) });
		const err = await catchInputError(designs.saveRevision(db, { designId: design.id, parentLabel: 'Q', userId: team.users.editor.id, raw: sampleInput() }));
		expect(err.issues[0].path).toBe('from');
		expect(await revisionCount(design.id)).toBe(1);
	});
});

describe('immutability', () => {
	it('has no update path in the services or the queries', () => {
		const names = [...Object.keys(designs), ...Object.keys(designQueries)];
		expect(names.filter((n) => /update|edit|overwrite|replace|delete/i.test(n))).toEqual([]);
	});

	it('the database refuses a direct UPDATE of a revision', async () => {
		const { design } = await designs.createDesign(db, { teamId: team.teamId, userId: team.users.editor.id, raw: sampleInput({ name: 'Frozen' }) });
		const before = await designs.findRevision(db, design.id, 'A');
		await expect(sql`update revision set note = 'changed' where design_id = ${design.id}`.execute(db)).rejects.toThrow(/immutable/);
		await expect(sql`update revision set input = jsonb_set(input, '{frequencyHz}', '1e9') where design_id = ${design.id}`.execute(db)).rejects.toThrow(/immutable/);
		const after = await designs.findRevision(db, design.id, 'A');
		expect(after).toEqual(before);
	});
});

describe('diffing two revisions', () => {
	it('shows the changed frequency and the dimensions that followed it', async () => {
		const { design } = await designs.createDesign(db, { teamId: team.teamId, userId: team.users.editor.id, raw: sampleInput({ name: 'Diff me' }) });
		await designs.saveRevision(db, { designId: design.id, parentLabel: 'A', userId: team.users.editor.id, raw: sampleInput({ frequencyHz: 2.4e9 }) });
		const a = (await designs.findRevision(db, design.id, 'A'))!;
		const b = (await designs.findRevision(db, design.id, 'B'))!;
		const diff = designs.diffRevisions(a, b);
		const freq = diff.inputs.find((r) => r.key === 'frequencyGHz')!;
		expect([freq.a, freq.b, freq.changed]).toEqual(['2.45', '2.4', true]);
		expect(diff.inputs.some((r) => r.key.startsWith('probe.'))).toBe(false); // inset-fed on both sides
		expect(diff.inputs.find((r) => r.key === 'substrate.heightMm')!.changed).toBe(false);
		// A lower frequency means a longer patch (L ∝ 1/f: transmission-line model, any patch handbook).
		const length = diff.derived.find((r) => r.key === 'patchLengthMm')!;
		expect(length.changed).toBe(true);
		expect(length.relativeChange!).toBeGreaterThan(0.015);
		expect(length.relativeChange!).toBeLessThan(0.03);
		expect(diff.changedCount).toBeGreaterThan(2);
	});

	it('compares an inset revision with a probe revision on the probe sizes it did not state as the defaults (unchanged)', async () => {
		const { design } = await designs.createDesign(db, { teamId: team.teamId, userId: team.users.editor.id, raw: sampleInput({ name: 'Diff feeds' }) });
		await designs.saveRevision(db, { designId: design.id, parentLabel: 'A', userId: team.users.editor.id, raw: sampleInput({ feed: 'probe', probe: { drillDiameterMm: 1.3, clearanceDiameterMm: 5 } }) });
		const diff = designs.diffRevisions((await designs.findRevision(db, design.id, 'A'))!, (await designs.findRevision(db, design.id, 'B'))!);
		const row = (key: string) => diff.inputs.find((r) => r.key === key)!;
		expect([row('feed').a, row('feed').b, row('feed').changed]).toEqual(['inset', 'probe', true]);
		// drill 1.3 mm is the schema's default, which an inset revision shows too
		expect([row('probe.drillDiameterMm').a, row('probe.drillDiameterMm').changed]).toEqual(['1.3', false]);
		expect([row('probe.clearanceDiameterMm').a, row('probe.clearanceDiameterMm').b, row('probe.clearanceDiameterMm').changed]).toEqual(['4.1', '5', true]);
	});
});
