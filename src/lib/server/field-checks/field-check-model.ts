// A field check as the app sees it: camelCase, and its json read back through the zod schemas of the contract.
import { fieldCheckOptionsSchema, fieldCheckProgressSchema, fieldCheckResultSchema, homingResultSchema, type FieldCheckOptions, type FieldCheckProgress, type FieldCheckResult, type HomingResult } from '../../schemas/field-check';
import type { FieldCheckKind, FieldCheckState } from '../db/field-check.table';

export interface FieldCheck {
	id: string;
	teamId: string;
	designId: string;
	revisionId: string;
	revisionLabel: string;
	kind: FieldCheckKind;
	options: FieldCheckOptions;
	state: FieldCheckState;
	progress: FieldCheckProgress | null;
	error: string | null;
	requestedBy: string;
	requestedByName: string;
	createdAt: Date;
	startedAt: Date | null;
	finishedAt: Date | null;
	cancelRequestedAt: Date | null;
	attempt: number;
	jobId: string;
}

export interface FieldCheckWithResult extends FieldCheck {
	/** The full-wave result; for Homing, that of the tuned patch. */
	result: FieldCheckResult | null;
	/** The whole Homing study (kind 'homing' only). */
	homing: HomingResult | null;
}

export interface FieldCheckRecord {
	id: string;
	team_id: string;
	design_id: string;
	revision_id: string;
	revision_label: string;
	kind: FieldCheckKind;
	options: unknown;
	state: FieldCheckState;
	progress: unknown;
	error: string | null;
	requested_by: string;
	requested_by_name: string;
	created_at: Date;
	started_at: Date | null;
	finished_at: Date | null;
	cancel_requested_at: Date | null;
	attempt: number;
	job_id: string;
}

export function toFieldCheck(row: FieldCheckRecord): FieldCheck {
	return {
		id: row.id,
		teamId: row.team_id,
		designId: row.design_id,
		revisionId: row.revision_id,
		revisionLabel: row.revision_label,
		kind: row.kind,
		options: fieldCheckOptionsSchema.parse(row.options),
		state: row.state,
		progress: row.progress === null ? null : fieldCheckProgressSchema.parse(row.progress),
		error: row.error,
		requestedBy: row.requested_by,
		requestedByName: row.requested_by_name,
		createdAt: row.created_at,
		startedAt: row.started_at,
		finishedAt: row.finished_at,
		cancelRequestedAt: row.cancel_requested_at,
		attempt: row.attempt,
		jobId: row.job_id
	};
}

export function toFieldCheckWithResult(row: FieldCheckRecord & { result: unknown }): FieldCheckWithResult {
	const check = toFieldCheck(row);
	if (row.result === null) return { ...check, result: null, homing: null };
	if (check.kind === 'homing') {
		const homing = homingResultSchema.parse(row.result);
		return { ...check, result: homing.final, homing };
	}
	return { ...check, result: fieldCheckResultSchema.parse(row.result), homing: null };
}

/** The check has ended and will not change again. */
export function isFinal(state: FieldCheckState): boolean {
	return state === 'succeeded' || state === 'failed' || state === 'cancelled';
}
