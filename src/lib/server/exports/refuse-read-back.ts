// A failed read-back as the export's refusal: the mismatches logged under a new support id, the caller told only the id.
import { randomUUID } from 'node:crypto';
import type { ReadBackMismatch } from '$lib/formats/readback/fab-view';
import { ReadBackFailedError } from './export-refusal';

export function refuseReadBack(mismatches: readonly ReadBackMismatch[], context: Record<string, string>, logError: (line: string) => void = console.error): never {
	const supportId = randomUUID();
	logError(JSON.stringify({ event: 'export.read-back-mismatch', supportId, ...context, mismatches }));
	throw new ReadBackFailedError(supportId, mismatches);
}
