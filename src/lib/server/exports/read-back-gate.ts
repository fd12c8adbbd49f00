// The read-back self-check as the server answers it: a mismatch is logged under a support id and refuses the download.
import { randomUUID } from 'node:crypto';
import type { ReadBackResult } from '$lib/formats/readback';
import { ReadBackFailedError } from './export-refusal';

export function assertReadBack(result: ReadBackResult, context: Record<string, string>, logError: (line: string) => void = console.error): ReadBackResult {
	if (!result.ok) {
		const supportId = randomUUID();
		logError(JSON.stringify({ event: 'export.read-back-mismatch', supportId, ...context, mismatches: result.mismatches }));
		throw new ReadBackFailedError(supportId, result.mismatches);
	}
	return result;
}
