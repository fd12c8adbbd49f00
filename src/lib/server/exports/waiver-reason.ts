// A waiver's reason: free text a fab will read, so one trimmed paragraph of sensible length.
import { InputError } from '$lib/schemas';

export const WAIVER_MIN_CHARS = 5;
export const WAIVER_MAX_CHARS = 500;

/** null/absent → no waiver; otherwise the trimmed reason, or an InputError naming the allowed length. */
export function parseWaiverReason(raw: unknown): string | null {
	if (raw === undefined || raw === null) return null;
	if (typeof raw !== 'string') throw new InputError([{ path: 'waiver', value: raw, message: `must be text of ${WAIVER_MIN_CHARS}–${WAIVER_MAX_CHARS} characters` }]);
	const reason = raw.replace(/\s+/g, ' ').trim();
	if (reason.length < WAIVER_MIN_CHARS || reason.length > WAIVER_MAX_CHARS) {
		throw new InputError([{ path: 'waiver', value: raw, message: `must say why, in ${WAIVER_MIN_CHARS}–${WAIVER_MAX_CHARS} characters; allowed range [${WAIVER_MIN_CHARS}, ${WAIVER_MAX_CHARS}] characters` }]);
	}
	return reason;
}
