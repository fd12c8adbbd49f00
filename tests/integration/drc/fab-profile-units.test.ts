// The fab-profile form in the person's units against the real PostgreSQL: a bare number is in the unit the form was shown
// in, "8 mil" and "0.2 mm" say their own, the profile is stored in mm, and text the parser refuses is an error beside its field.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { setDisplayUnits } from '../../../src/lib/server/accounts';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { listFabProfiles } from '../../../src/lib/server/fab-profiles';
import { STANDARD_QUICK_TURN_PROFILE } from '../../../src/lib/schemas/fab-profile';
import * as page from '../../../src/routes/(app)/fab-profiles/+page.server';
import { call } from '../accounts/helpers/route-event';
import { createWorkspace, identityOf, type Workspace } from '../exports/workspace-fixture';

let ws: Workspace;
beforeAll(async () => {
	ws = await createWorkspace('fabunits');
});
afterAll(() => closeDb());

const lengthKeys = ['minTraceWidthMm', 'minSpacingMm', 'minDrillMm', 'minAnnularRingMm', 'copperToEdgeMm', 'minSlotWidthMm', 'etchToleranceMm', 'platedDrillToleranceMm', 'nonPlatedDrillToleranceMm'] as const;
/** The built-in's values as the form posts them in mm, with `over` on top. */
const form = (name: string, over: Record<string, string>) => ({
	teamId: ws.teamId,
	name,
	...Object.fromEntries(lengthKeys.map((k) => [k, String(STANDARD_QUICK_TURN_PROFILE[k])])),
	maxCopperLayers: '2',
	boardThicknessTolerancePercent: '10',
	finish: 'ENIG',
	...over
});
const add = async (f: Record<string, string>) => call(page.actions.add as never, { identity: await identityOf(ws, 'editor', 'session'), path: '/fab-profiles?/add', form: f });
const stored = async (name: string) => (await listFabProfiles(getDb(), ws.teamId)).find((p) => p.profile.name === name)?.profile;

describe('the fab-profile form with units', () => {
	// 8 mil × 0.0254 mm = 0.2032 mm, 0.008 in × 25.4 = 0.2032 mm (NIST SP 811 B.9).
	it('stores "8 mil" typed by a person in mm as 0.2032 mm, and "0.2 mm" from a form shown in mil as 0.2 mm', async () => {
		const name = `Explicit ${ws.suffix}`;
		const res = await add(form(name, { lengthUnit: 'mm', minTraceWidthMm: '8 mil', minSpacingMm: '0.008 in', minSlotWidthMm: '0.25 mm' }));
		expect(res.outcome).toBe('ok');
		expect(await stored(name)).toMatchObject({ minTraceWidthMm: 0.2032, minSpacingMm: 0.2032, minSlotWidthMm: 0.25 });
		const other = `Explicit mm ${ws.suffix}`;
		const again = await add(form(other, { lengthUnit: 'mil', ...Object.fromEntries(lengthKeys.map((k) => [k, `${STANDARD_QUICK_TURN_PROFILE[k]} mm`])), minTraceWidthMm: '0.2 mm' }));
		expect(again.outcome).toBe('ok');
		expect(await stored(other)).toMatchObject({ minTraceWidthMm: 0.2, minDrillMm: 0.3 });
	});

	it('reads bare numbers in mil when the form was shown in mil', async () => {
		const name = `Bare mil ${ws.suffix}`;
		// 6 mil trace and space, 12 mil drill (0.1524 mm, 0.3048 mm)
		const inMil = Object.fromEntries(lengthKeys.map((k) => [k, String(Number((STANDARD_QUICK_TURN_PROFILE[k] / 0.0254).toFixed(4)))]));
		const res = await add(form(name, { lengthUnit: 'mil', ...inMil, minTraceWidthMm: '6', minSpacingMm: '6', minDrillMm: '12', minSlotWidthMm: '8' }));
		expect(res.outcome).toBe('ok');
		const p = await stored(name);
		expect(p).toMatchObject({ minTraceWidthMm: 0.1524, minSpacingMm: 0.1524, minDrillMm: 0.3048, minSlotWidthMm: 0.2032 });
		// the built-in's other values came back through their mil text unchanged
		expect(p).toMatchObject({ minAnnularRingMm: 0.15, copperToEdgeMm: 0.3, etchToleranceMm: 0.05, platedDrillToleranceMm: 0.075 });
	});

	it('takes the person’s stored unit when the form did not say', async () => {
		await setDisplayUnits(ws.people.editor.id, { length: 'mil', copper: 'um' });
		try {
			const name = `Stored unit ${ws.suffix}`;
			const res = await add(form(name, { ...Object.fromEntries(lengthKeys.map((k) => [k, `${STANDARD_QUICK_TURN_PROFILE[k]}mm`])), minDrillMm: '12' }));
			expect(res.outcome).toBe('ok');
			expect((await stored(name))?.minDrillMm).toBe(0.3048);
		} finally {
			await setDisplayUnits(ws.people.editor.id, { length: 'mm', copper: 'um' });
		}
	});

	it.each([
		['8 furlongs', /unknown unit "furlongs"; use mm or mil; allowed range \[0.01, 10\] mm/],
		['0,2', /use a point for decimals.*allowed range \[0.01, 10\] mm/],
		['wide', /must be a number, optionally followed by a unit; allowed range/],
		['500 mil', /^allowed range \[0.01, 10\] mm$/] // 12.7 mm parses, then is out of range
	])('refuses %j beside its field, keeps the text, stores nothing', async (text, message) => {
		const name = `Refused ${text} ${ws.suffix}`;
		const res = await add(form(name, { lengthUnit: 'mm', minTraceWidthMm: text }));
		expect(res.outcome).toBe(400);
		const data = res.data as { values: Record<string, string>; fieldErrors: { field: string; message: string }[] };
		expect(data.fieldErrors).toEqual([{ field: 'minTraceWidthMm', message: expect.stringMatching(message) }]);
		expect(data.values.minTraceWidthMm).toBe(text);
		expect(await stored(name)).toBeUndefined();
	});
});
