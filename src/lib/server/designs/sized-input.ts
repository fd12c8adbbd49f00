// Validates a design-input document and sizes it; anything the core cannot build becomes an InputError.
import { sizeDocument } from '$lib/design';
import type { SizedDesign } from '../../rf';
import { InputError, type DesignInput } from '../../schemas';

export interface SizedInput {
	input: DesignInput;
	sized: SizedDesign;
}

/** Throws InputError (with field paths) for bad or unbuildable input; never writes anything. */
export function sizeInput(raw: unknown): SizedInput {
	const outcome = sizeDocument(raw);
	if (!outcome.ok) throw new InputError(outcome.issues);
	return { input: outcome.input, sized: outcome.sized };
}
