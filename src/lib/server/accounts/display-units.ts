// A person's display units (mm or mil, µm or oz): read for every signed-in page, changed from the settings page.
import { getDb } from '../db';
import * as userQueries from '../db/user.queries';
import { parseDisplayUnits } from '$lib/schemas/display-units';
import { DEFAULT_DISPLAY_UNITS, isCopperUnit, isLengthUnit, type DisplayUnits } from '$lib/units';

/** The person's display units; mm and µm for anyone unknown (the database's check keeps other values out). */
export async function findDisplayUnits(userId: string): Promise<DisplayUnits> {
	const row = await userQueries.findDisplayUnitsById(getDb(), userId);
	if (!row) return DEFAULT_DISPLAY_UNITS;
	return { length: isLengthUnit(row.length_unit) ? row.length_unit : 'mm', copper: isCopperUnit(row.copper_unit) ? row.copper_unit : 'um' };
}

/** Sets the person's display units from a posted form; anything but mm/mil and um/oz is an InputError (nothing written). */
export async function setDisplayUnits(userId: string, raw: { length: unknown; copper: unknown }): Promise<DisplayUnits> {
	const units = parseDisplayUnits(raw);
	await userQueries.updateDisplayUnitsById(getDb(), userId, { length_unit: units.length, copper_unit: units.copper });
	return units;
}
