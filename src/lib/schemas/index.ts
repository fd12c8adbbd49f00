// Public face of the schemas room.
export * from './design-input';
export * from './input-error';
export * from './fab-profile';
export * from './laminate';
// Account schemas are imported from './account' by server code only (they carry the common-password list);
// the browser gets the shared sizes and role names.
export * from './account-limits';
import { designInputSchema, type DesignInput } from './design-input';
import { parseWith } from './input-error';

/** Validates a design-input document (defaults filled) or throws InputError. */
export function parseDesignInput(raw: unknown): DesignInput {
	return parseWith(designInputSchema, raw);
}
