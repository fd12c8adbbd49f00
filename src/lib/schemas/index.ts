// Public face of the schemas room.
export * from './design-input';
export * from './launch';
export * from './input-error';
export * from './fab-profile';
export * from './laminate';
export * from './account-limits';
export * from './plain-text';
export * from './revision-note';
export * from './waiver-reason';
export * from './reflection-sample';
export * from './display-units';
import { designInputSchema, type DesignInput } from './design-input';
import { parseWith } from './input-error';

/** Validates a design-input document (defaults filled) or throws InputError. */
export function parseDesignInput(raw: unknown): DesignInput {
	return parseWith(designInputSchema, raw);
}
