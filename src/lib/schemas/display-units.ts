// A person's display units as a form or an API posts them: lengths in mm or mil, copper foil in µm or oz.
import { z } from 'zod';
import { copperUnits, lengthUnits, type DisplayUnits } from '../units';
import { parseWith } from './input-error';

export const displayUnitsSchema = z.strictObject({
	length: z.enum(lengthUnits, { error: `must be one of: ${lengthUnits.join(', ')}` }),
	copper: z.enum(copperUnits, { error: `must be one of: ${copperUnits.join(', ')}` })
});

/** Validates display units or throws InputError (field path and the allowed values). */
export function parseDisplayUnits(raw: unknown): DisplayUnits {
	return parseWith(displayUnitsSchema, raw);
}
