// A design started in the app gets solder mask and a legend; a document without those keys keeps its meaning (real PostgreSQL).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { prepareSized } from '../../../src/lib/design';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { createDesign, findRevision, laminatePresets, startDesign } from '../../../src/lib/server/designs';
import { createTestTeam, sampleInput, type TestTeam } from './test-team';

const db = getDb();
let team: TestTeam;

beforeAll(async () => {
	team = await createTestTeam(db, 'finish');
});
afterAll(async () => {
	await closeDb();
});

describe('new designs and the board finish', () => {
	it('starts a design from the form with mask layers over a bare patch and a top legend', async () => {
		const created = await startDesign(db, { teamId: team.teamId, userId: team.users.editor.id, raw: { name: `Started ${team.suffix}`, frequencyGHz: '2.45', shape: 'rectangular', laminateId: laminatePresets[0].id } });
		const revision = (await findRevision(db, created.design.id, 'A'))!;
		expect(revision.input).toMatchObject({ solderMask: true, maskCoverage: 'exposed', legend: {} });
		const layers = prepareSized(revision.results).artwork.layers.map((l) => l.id);
		expect(layers).toEqual(expect.arrayContaining(['mask-top', 'mask-bottom', 'legend-top']));
	});

	it('keeps a document without the keys as it always was: no mask, no legend', async () => {
		const created = await createDesign(db, { teamId: team.teamId, userId: team.users.editor.id, raw: sampleInput({ name: `Plain ${team.suffix}` }) });
		const revision = (await findRevision(db, created.design.id, 'A'))!;
		expect(revision.input.solderMask).toBe(false);
		expect(revision.input).not.toHaveProperty('legend');
		expect(revision.input).not.toHaveProperty('maskCoverage');
		expect(prepareSized(revision.results).artwork.layers.map((l) => l.id)).toEqual(['copper-top', 'copper-bottom', 'profile']);
	});
});
