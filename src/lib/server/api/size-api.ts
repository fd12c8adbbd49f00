// POST /api/v1/size: a design-input document in, the sized design out; nothing is stored.
import type { SizedDesign } from '$lib/rf';
import { sizeInput } from '../designs/sized-input';

export function sizeDocument(raw: unknown): SizedDesign {
	return sizeInput(raw).sized;
}
