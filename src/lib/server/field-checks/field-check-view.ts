// A field check as /api/v1 and the pages show it: plain JSON (dates as ISO strings), result parsed.
import type { z } from 'zod';
import type { fieldCheckStatusSchema, fieldCheckSummarySchema } from '../../schemas/api';
import type { FieldCheck, FieldCheckWithResult } from './field-check-model';

export type ApiFieldCheckSummary = z.input<typeof fieldCheckSummarySchema>;
export type ApiFieldCheckStatus = z.input<typeof fieldCheckStatusSchema>;

export const fieldCheckStatusUrl = (id: string) => `/api/v1/simulations/${id}`;

export function toApiFieldCheckSummary(c: FieldCheck): ApiFieldCheckSummary {
	return {
		id: c.id,
		designId: c.designId,
		revisionLabel: c.revisionLabel,
		kind: c.kind,
		mode: c.options.mode,
		state: c.state,
		progress: c.progress,
		error: c.error,
		requestedBy: c.requestedByName,
		createdAt: c.createdAt.toISOString(),
		startedAt: c.startedAt?.toISOString() ?? null,
		finishedAt: c.finishedAt?.toISOString() ?? null,
		cancelRequested: c.cancelRequestedAt !== null,
		attempt: c.attempt,
		statusUrl: fieldCheckStatusUrl(c.id)
	};
}

export function toApiFieldCheckStatus(c: FieldCheckWithResult): ApiFieldCheckStatus {
	return { ...toApiFieldCheckSummary(c), result: c.result, homing: c.homing };
}

