// A waiver's reason from a form or the API: validated by the one schema (src/lib/schemas/waiver-reason.ts).
import { parseWith, waiverReasonSchema } from '$lib/schemas';
import { z } from 'zod';

export { WAIVER_MAX_CHARS, WAIVER_MIN_CHARS } from '$lib/schemas';

const waiverFieldSchema = z.object({ waiver: waiverReasonSchema });

/** null/absent → no waiver; otherwise the reason on one line, or an InputError at path "waiver". */
export function parseWaiverReason(raw: unknown): string | null {
	if (raw === undefined || raw === null) return null;
	return parseWith(waiverFieldSchema, { waiver: raw }).waiver;
}
