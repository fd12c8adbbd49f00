// The revision diff page in the person's units, against the real PostgreSQL: lengths in mil (1.524 mm = 60 mil,
// 0.8128 mm = 32 mil; 1 mil = 0.0254 mm exactly, 1959 international yard and pound agreement), foil in oz (17.5 µm =
// 0.5 oz at 35 µm/oz, common practice, no source), εr unitless; what counts as changed does not depend on the unit;
// a page load without units (as before) stays in mm.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, getDb } from '../../../src/lib/server/db';
import type { RevisionDiff } from '../../../src/lib/server/designs';
import { saveRevision } from '../../../src/lib/server/designs/save-revision';
import * as diffPage from '../../../src/routes/(app)/designs/[designId]/diff/+page.server';
import { call } from '../accounts/helpers/route-event';
import { createWorkspace, demoInput, identityOf, type Workspace } from '../exports/workspace-fixture';

let ws: Workspace;
let thinner = 'B';
beforeAll(async () => {
	ws = await createWorkspace('diffunits');
	const raw = demoInput(`Bench patch ${ws.suffix}`);
	// demo data: the same patch on a 32 mil laminate with half-ounce foil
	thinner = (await saveRevision(getDb(), { designId: ws.designId, parentLabel: 'A', userId: ws.people.editor.id, raw: { ...raw, substrate: { ...raw.substrate, heightMm: 0.8128, copperThicknessUm: 17.5 } }, note: 'thinner' })).label;
});
afterAll(() => closeDb());

const load = async (units?: { length: 'mm' | 'mil'; copper: 'um' | 'oz' }) => {
	const r = await call(diffPage.load as never, {
		identity: await identityOf(ws, 'viewer', 'session'),
		path: `/designs/${ws.designId}/diff?a=A&b=${thinner}`,
		params: { designId: ws.designId },
		...(units ? { parent: async () => ({ units }) } : {})
	});
	expect(r.outcome).toBe('ok');
	return (r.data as { diff: RevisionDiff }).diff;
};
const inputRow = (d: RevisionDiff, key: string) => d.inputs.find((r) => r.key === key)!;

describe('the revision diff in the person’s units', () => {
	it('shows lengths in mil and foil in oz, εr as it is', async () => {
		const d = await load({ length: 'mil', copper: 'oz' });
		expect(inputRow(d, 'substrate.heightMm')).toMatchObject({ a: '60', b: '32', unit: 'mil', changed: true });
		expect(inputRow(d, 'substrate.heightMm').relativeChange).toBeCloseTo((0.8128 - 1.524) / 1.524, 12);
		expect(inputRow(d, 'substrate.copperThicknessUm')).toMatchObject({ b: '0.5', unit: 'oz', changed: true });
		expect(inputRow(d, 'substrate.relativePermittivity')).toMatchObject({ a: '3.55', b: '3.55', unit: '', changed: false });
		const lengths = d.derived.filter((r) => r.unit === 'mil');
		expect(lengths.length).toBeGreaterThan(0);
		expect(d.derived.some((r) => r.unit === 'mm')).toBe(false);
	});

	it('stays in mm without units, and counts the same changes in either unit', async () => {
		const mm = await load();
		const mil = await load({ length: 'mil', copper: 'oz' });
		expect(inputRow(mm, 'substrate.heightMm')).toMatchObject({ a: '1.524', b: '0.8128', unit: 'mm' });
		expect(inputRow(mm, 'substrate.copperThicknessUm')).toMatchObject({ b: '17.5', unit: 'µm' });
		expect(mil.changedCount).toBe(mm.changedCount);
		// a derived length shown in mm and in mil is the same length: mil × 0.0254 = mm, to the digits shown
		const width = mm.derived.find((r) => r.unit === 'mm')!;
		const widthMil = mil.derived.find((r) => r.key === width.key)!;
		expect(Number(widthMil.b) * 0.0254).toBeCloseTo(Number(width.b), 2);
	});
});
