// The editor's save with a form typed in mil and oz, against the real PostgreSQL: the new revision is stored in mm and
// µm, untouched fields come back exactly, a form that names no units is read in mm as before, and text the unit parser
// refuses is a 400 beside its field with nothing saved.
import { isRedirect } from '@sveltejs/kit';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { formValuesFromInput, formValuesInUnits } from '../../../src/lib/design';
import { parseDesignInput, type DesignInput } from '../../../src/lib/schemas';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { createDesign } from '../../../src/lib/server/designs';
import * as editPage from '../../../src/routes/(app)/designs/[designId]/edit/+page.server';
import { createTestTeam, sampleInput, type TestTeam } from './test-team';

const db = getDb();
let team: TestTeam;
let designId: string;
const start = () => parseDesignInput(sampleInput({ name: 'Mil patch' }));

beforeAll(async () => {
	team = await createTestTeam(db, 'editunits');
	designId = (await createDesign(db, { teamId: team.teamId, userId: team.users.editor.id, raw: sampleInput({ name: 'Mil patch' }) })).design.id;
});
afterAll(() => closeDb());

function event(form: Record<string, string>) {
	const u = team.users.editor;
	const user = { id: u.id, email: u.email, displayName: u.displayName };
	const url = new URL(`http://127.0.0.1/designs/${designId}/edit?from=A`);
	return {
		locals: { user, sessionId: 'test', apiToken: null, identity: { user, sessionId: 'test', apiToken: null } },
		url,
		params: { designId },
		cookies: { get: () => undefined, set: () => undefined, getAll: () => [], delete: () => undefined, serialize: () => '' },
		request: new Request(url, { method: 'POST', body: new URLSearchParams(form), headers: { 'content-type': 'application/x-www-form-urlencoded' } }),
		parent: async () => ({}),
		depends: () => undefined
	} as never;
}

async function save(form: Record<string, string>): Promise<{ label?: string; failure?: { status: number; data: { fieldErrors: { field: string; message: string }[]; values: Record<string, string> } } }> {
	try {
		const r = (await editPage.actions.save(event({ from: 'A', note: 'units', ...form }))) as { status: number; data: never };
		return { failure: r };
	} catch (err) {
		if (isRedirect(err)) return { label: err.location.split('/').pop() };
		throw err;
	}
}
const stored = async (label: string) => (await db.selectFrom('revision').select('input').where('design_id', '=', designId).where('label', '=', label).executeTakeFirstOrThrow()).input as DesignInput;

describe('saving the editor form in the person’s units', () => {
	it('stores a form shown in mil and oz in mm and µm; 120 mil of margin is 3.048 mm (NIST SP 811 B.9), the rest unchanged', async () => {
		const shown = formValuesInUnits(formValuesFromInput(start()), { length: 'mil', copper: 'oz' });
		const { label } = await save({ ...shown, groundMarginMm: '120', lengthUnit: 'mil', copperUnit: 'oz' });
		expect(label).toBeDefined();
		const input = await stored(label!);
		expect(input.groundMarginMm).toBe(3.048);
		expect(input.substrate).toEqual(start().substrate);
	});

	it('reads a form that names no units in mm and µm, as forms did before', async () => {
		const { label } = await save({ ...formValuesFromInput(start()), groundMarginMm: '4' });
		expect((await stored(label!)).groundMarginMm).toBe(4);
	});

	it('takes an explicit unit whatever the form was shown in: "0.2 in" of margin is 5.08 mm', async () => {
		const shown = formValuesInUnits(formValuesFromInput(start()), { length: 'mil', copper: 'um' });
		const { label } = await save({ ...shown, groundMarginMm: '0.2 in', lengthUnit: 'mil', copperUnit: 'um' });
		expect((await stored(label!)).groundMarginMm).toBe(5.08);
	});

	it('refuses text the parser cannot read with 400 beside its field, keeps the text, saves nothing', async () => {
		const before = await db.selectFrom('revision').select((eb) => eb.fn.countAll<string>().as('n')).where('design_id', '=', designId).executeTakeFirstOrThrow();
		const { failure } = await save({ ...formValuesFromInput(start()), 'substrate.heightMm': '1.6 furlongs' });
		expect(failure?.status).toBe(400);
		expect(failure?.data.fieldErrors).toContainEqual({ field: 'substrate.heightMm', message: 'unknown unit "furlongs"; use mm or mil' });
		expect(failure?.data.fieldErrors.filter((i) => i.field === 'substrate.heightMm')).toHaveLength(1);
		expect(failure?.data.values['substrate.heightMm']).toBe('1.6 furlongs');
		const after = await db.selectFrom('revision').select((eb) => eb.fn.countAll<string>().as('n')).where('design_id', '=', designId).executeTakeFirstOrThrow();
		expect(after.n).toBe(before.n);
	});
});
