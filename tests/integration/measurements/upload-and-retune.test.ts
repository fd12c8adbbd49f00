// Measured S11 uploads against the real PostgreSQL: what is stored, what is refused (nothing stored), and the retune's linked revision.
import { readFileSync } from 'node:fs';
import { sql } from 'kysely';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { TouchstoneError } from '../../../src/lib/formats/touchstone';
import { InputError } from '../../../src/lib/schemas';
import { closeDb, getDb } from '../../../src/lib/server/db';
import * as measurementQueries from '../../../src/lib/server/db/measurement.queries';
import * as designQueries from '../../../src/lib/server/db/design.queries';
import { createDesign, findRevision } from '../../../src/lib/server/designs';
import { saveRevision } from '../../../src/lib/server/designs/save-revision';
import { revisionFabProfile } from '../../../src/lib/server/fab-profiles';
import { STANDARD_QUICK_TURN_PROFILE } from '../../../src/lib/schemas/fab-profile';
import * as measurements from '../../../src/lib/server/measurements';
import { createTestTeam, sampleInput, type TestTeam } from '../designs/test-team';

const db = getDb();
const fixture = (name: string) => new Uint8Array(readFileSync(new URL(`../../fixtures/touchstone-upload/${name}`, import.meta.url)));
let team: TestTeam;
let designId: string;
let revisionId: string;

beforeAll(async () => {
	team = await createTestTeam(db, 'meas');
	// εr 3.55 on 1.524 mm at 2.45 GHz: the fixture's board resonates low, at 2.41 GHz (demo data).
	const created = await createDesign(db, {
		teamId: team.teamId,
		userId: team.users.editor.id,
		raw: sampleInput({ name: `Bench ${team.suffix}`, substrate: { relativePermittivity: 3.55, heightMm: 1.524, lossTangent: 0.0027 } })
	});
	designId = created.design.id;
	revisionId = (await findRevision(db, designId, 'A'))!.id;
});
afterAll(async () => {
	await closeDb();
});

async function rejection(p: Promise<unknown>): Promise<InputError> {
	try {
		await p;
	} catch (err) {
		if (err instanceof InputError) return err;
		throw err;
	}
	throw new Error('expected an InputError');
}

const storedCount = () => measurementQueries.countMeasurementsByRevision(db, revisionId);

describe('refused uploads store nothing', () => {
	it('a malformed file is refused with the line number and what was expected, and no row is written', async () => {
		const before = await storedCount();
		const err = await rejection(measurements.uploadMeasurement(db, { revisionId, userId: team.users.editor.id, fileName: 'broken-line-7.s1p', bytes: fixture('broken-line-7.s1p') }));
		expect(err).toBeInstanceOf(TouchstoneError);
		expect((err as TouchstoneError).line).toBe(7);
		expect(err.message).toMatch(/line 7.*expected a number/);
		expect(await storedCount()).toBe(before);
	});

	it('a file over 5 MB is refused before it is read, and no row is written', async () => {
		const before = await storedCount();
		// A valid start followed by comment lines: only its size is wrong.
		const head = new TextEncoder().encode('# GHz S RI R 50\n2.4 0.1 0.1\n');
		const big = new Uint8Array(measurements.MAX_TOUCHSTONE_BYTES + 1).fill(0x21); // '!' lines are comments
		big.set(head, 0);
		const err = await rejection(measurements.uploadMeasurement(db, { revisionId, userId: team.users.editor.id, fileName: 'huge.s1p', bytes: big }));
		expect(err.first.message).toMatch(/larger than 5 MB/);
		expect(await storedCount()).toBe(before);
		// Exactly at the limit the size is fine (the content decides).
		const atLimit = big.slice(0, measurements.MAX_TOUCHSTONE_BYTES);
		expect(() => measurements.readTouchstoneUpload('edge.s1p', atLimit)).not.toThrow(/larger than 5 MB/);
	});

	it('a wrong extension or a binary file with a Touchstone name is refused', async () => {
		const before = await storedCount();
		const good = fixture('bench-2g4.s1p');
		const wrongName = await rejection(measurements.uploadMeasurement(db, { revisionId, userId: team.users.editor.id, fileName: 'bench.csv', bytes: good }));
		expect(wrongName.first.message).toMatch(/\.s1p, \*\.s2p or \*\.ts/);
		const binary = new Uint8Array([0x23, 0x20, 0x47, 0x48, 0x7a, 0x00, 0x01, 0x02]);
		const notText = await rejection(measurements.uploadMeasurement(db, { revisionId, userId: team.users.editor.id, fileName: 'bench.s1p', bytes: binary }));
		expect(notText.first.message).toMatch(/not a text file/);
		const invalidUtf8 = await rejection(measurements.uploadMeasurement(db, { revisionId, userId: team.users.editor.id, fileName: 'bench.s1p', bytes: new Uint8Array([0x23, 0xff, 0xfe, 0x0a]) }));
		expect(invalidUtf8.first.message).toMatch(/invalid UTF-8/);
		// A 2-port file named .s1p disagrees with its name (the reader checks the port count).
		const twoPort = new TextEncoder().encode('# GHz S RI R 50\n2.4 0.1 0 0.9 0 0.9 0 0.1 0\n');
		await rejection(measurements.uploadMeasurement(db, { revisionId, userId: team.users.editor.id, fileName: 'bench.s1p', bytes: twoPort }));
		expect(await storedCount()).toBe(before);
	});
});

describe('a good upload', () => {
	it('is stored with its revision, uploader, time, hash, samples and summary', async () => {
		const bytes = fixture('bench-2g4.s1p');
		const { id } = await measurements.uploadMeasurement(db, { revisionId, userId: team.users.editor.id, fileName: 'bench-2g4.s1p', bytes });
		const found = await measurements.findMeasurement(db, revisionId, id);
		expect(found).not.toBeNull();
		expect(found!.uploadedBy).toBe(team.users.editor.id);
		expect(Math.abs(found!.uploadedAt.getTime() - Date.now())).toBeLessThan(60_000);
		// sha256 of the fixture bytes, recomputed independently through PostgreSQL's own digest.
		const { rows } = await sql<{ h: string }>`select encode(sha256(convert_to(touchstone, 'UTF8')), 'hex') as h from measurement where id = ${id}`.execute(db);
		expect(found!.fileSha256).toBe(rows[0].h);
		expect(found!.samples).toHaveLength(101);
		expect(found!.summary.file).toMatchObject({ portCount: 1, frequencyUnit: 'GHz', format: 'RI', pointCount: 101 });
		// The fixture's minimum is at 2.41 GHz (4 MHz steps): found within one step.
		expect(Math.abs(found!.summary.resonance.frequencyHz - 2.41e9)).toBeLessThan(4e6);
		expect(found!.summary.band.reached).toBe(true);
		expect((await measurements.listMeasurements(db, revisionId)).map((m) => m.id)).toContain(id);
	});
});

describe('retune from a measurement', () => {
	it('proposes a higher apparent εr and, on confirmation, saves a child revision that links the measurement', async () => {
		const { id } = await measurements.uploadMeasurement(db, { revisionId, userId: team.users.editor.id, fileName: 'bench-2g4.s1p', bytes: fixture('bench-2g4.s1p') });
		const measurement = (await measurements.findMeasurement(db, revisionId, id))!;
		const revisionA = (await findRevision(db, designId, 'A'))!;
		const proposal = measurements.retuneProposal(revisionA, measurement);
		// A board resonating below the prediction shows a higher εr than designed, and the patch must get shorter.
		expect(proposal.apparentRelativePermittivity).toBeGreaterThan(3.55);
		const length = proposal.dimensions.find((d) => d.name === 'patch.lengthMm')!;
		expect(length.newMm).toBeLessThan(length.oldMm);

		const saved = await measurements.confirmRetune(db, { designId, revision: revisionA, measurement, userId: team.users.editor.id });
		const child = (await findRevision(db, designId, saved.label))!;
		expect(child.parentLabel).toBe('A');
		expect(child.input.substrate.relativePermittivity).toBe(proposal.apparentRelativePermittivity);
		expect(child.note).toMatch(/Retuned from measurement bench-2g4\.s1p of A/);
		const source = await measurements.findRetuneSource(db, child.id);
		expect(source).toMatchObject({ measurementId: id, measuredLabel: 'A', fileName: 'bench-2g4.s1p' });
		expect((await measurements.listRetunedRevisions(db, id)).map((r) => r.label)).toEqual([saved.label]);
		// A revision saved by hand links nothing.
		expect(await measurements.findRetuneSource(db, revisionA.id)).toBeNull();
	});

	it('checks the retuned revision against the fab profile its parent recorded, not the built-in', async () => {
		// the parent is saved against a team profile with wider minimums (demo values)
		const coarse = { ...STANDARD_QUICK_TURN_PROFILE, name: `Coarse ${team.suffix}`, minTraceWidthMm: 0.2, minSpacingMm: 0.2, minSlotWidthMm: 0.25 };
		const parent = await saveRevision(db, { designId, parentLabel: 'A', userId: team.users.editor.id, raw: (await findRevision(db, designId, 'A'))!.input, note: 'on the coarse fab', fabProfile: coarse });
		const parentRevision = (await findRevision(db, designId, parent.label))!;
		const { id } = await measurements.uploadMeasurement(db, { revisionId: parentRevision.id, userId: team.users.editor.id, fileName: 'bench-2g4.s1p', bytes: fixture('bench-2g4.s1p') });
		const measurement = (await measurements.findMeasurement(db, parentRevision.id, id))!;
		const saved = await measurements.confirmRetune(db, { designId, revision: parentRevision, measurement, userId: team.users.editor.id });
		const recorded = await revisionFabProfile(db, saved.id);
		expect(recorded.recorded).toBe(true);
		expect(recorded.profile).toEqual(coarse);
		expect(recorded.profile).not.toEqual(STANDARD_QUICK_TURN_PROFILE);
	});

	it('the link cannot be added to or changed on an existing revision (revisions are immutable)', async () => {
		const [m] = await measurements.listMeasurements(db, revisionId);
		await expect(sql`update revision set retuned_from_measurement_id = ${m.id} where id = ${revisionId}`.execute(db)).rejects.toThrow(/immutable/);
		expect(await measurements.findRetuneSource(db, revisionId)).toBeNull();
		expect((await designQueries.listRevisionsByDesign(db, designId)).length).toBeGreaterThanOrEqual(2);
	});
});
