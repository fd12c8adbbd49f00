// The settings page's units action against the real PostgreSQL: a person's choice is stored on their row, read back for
// every page, and anything but mm/mil and um/oz is refused beside its field with nothing written.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { findDisplayUnits } from '../../../src/lib/server/accounts';
import { startAppMode } from '../../../src/lib/server/app-mode';
import { closeDb, getDb } from '../../../src/lib/server/db';
import * as settingsPage from '../../../src/routes/(app)/settings/+page.server';
import * as rootLayout from '../../../src/routes/+layout.server';
import { person, uniqueSuffix } from './helpers/people';
import { call, identityFor, sessionFor } from './helpers/route-event';

const suffix = uniqueSuffix('units');
// the root layout asks the app mode (for the demo banner): decide it as the demo would, without mail settings
beforeAll(() => void startAppMode({ FRINGEFIELD_MODE: 'demo' }));
afterAll(() => closeDb());

async function postUnits(sessionId: string | null, form: Record<string, string>) {
	return call(settingsPage.actions.units as never, { identity: await identityFor(sessionId), path: '/settings?/units', form });
}

describe('the display-units preference', () => {
	it('starts at mm and µm, and the root layout hands that to every page', async () => {
		const user = await person('fresh', suffix);
		expect(await findDisplayUnits(user.id)).toEqual({ length: 'mm', copper: 'um' });
		const layout = await call(rootLayout.load as never, { identity: await identityFor(await sessionFor(user.id)), path: '/designs' });
		expect(layout.data).toMatchObject({ units: { length: 'mm', copper: 'um' } });
	});

	it('stores mil and oz on the person’s row and every later page gets them', async () => {
		const user = await person('switcher', suffix);
		const session = await sessionFor(user.id);
		const res = await postUnits(session, { length: 'mil', copper: 'oz' });
		expect(res.outcome).toBe('ok');
		expect(res.data).toMatchObject({ form: 'units', saved: { length: 'mil', copper: 'oz' } });
		const row = await getDb().selectFrom('app_user').select(['length_unit', 'copper_unit']).where('id', '=', user.id).executeTakeFirstOrThrow();
		expect(row).toEqual({ length_unit: 'mil', copper_unit: 'oz' });
		const layout = await call(rootLayout.load as never, { identity: await identityFor(session), path: '/designs' });
		expect(layout.data).toMatchObject({ units: { length: 'mil', copper: 'oz' } });
		// and back again
		expect((await postUnits(session, { length: 'mm', copper: 'um' })).outcome).toBe('ok');
		expect(await findDisplayUnits(user.id)).toEqual({ length: 'mm', copper: 'um' });
	});

	it('touches only the person who posted', async () => {
		const [a, b] = await Promise.all([person('alone-a', suffix), person('alone-b', suffix)]);
		expect((await postUnits(await sessionFor(a.id), { length: 'mil', copper: 'um' })).outcome).toBe('ok');
		expect(await findDisplayUnits(a.id)).toEqual({ length: 'mil', copper: 'um' });
		expect(await findDisplayUnits(b.id)).toEqual({ length: 'mm', copper: 'um' });
	});

	it.each([
		[{ length: 'inch', copper: 'um' }, 'length'],
		[{ length: 'MM', copper: 'um' }, 'length'],
		[{ length: 'mm', copper: 'grams' }, 'copper'],
		[{ copper: 'oz' }, 'length']
	])('refuses %j with 400 beside the %s field and writes nothing', async (form, field) => {
		const user = await person(`bad-${field}-${Object.values(form).join('')}`, suffix);
		const res = await postUnits(await sessionFor(user.id), form as Record<string, string>);
		expect(res.outcome).toBe(400);
		expect((res.data as { fieldErrors: { field: string; message: string }[] }).fieldErrors.find((e) => e.field === field)?.message).toMatch(/must be one of/);
		expect(await findDisplayUnits(user.id)).toEqual({ length: 'mm', copper: 'um' });
	});

	it('sends a visitor who is not signed in to sign in', async () => {
		expect((await postUnits(null, { length: 'mil', copper: 'oz' })).outcome).toBe('signin');
	});

	it('is refused by the database itself for a value outside the lists', async () => {
		const user = await person('check', suffix);
		await expect(getDb().updateTable('app_user').set({ length_unit: 'furlong' }).where('id', '=', user.id).execute()).rejects.toThrow(/check constraint/);
	});
});
