// The pg-boss queues Fringefield uses, what a job carries, and how long each may run before pg-boss gives it up.
import { z } from 'zod';
import type { FieldCheckKind } from '../db/field-check.table';
import type { FieldCheckOptions } from '../../schemas/field-check';

/** One queue per kind of work, so an operator can see (and a worker can take) each on its own. */
export const jobNames = { check: 'field-check', homing: 'field-homing' } as const satisfies Record<FieldCheckKind, string>;
export type JobName = (typeof jobNames)[FieldCheckKind];
export const allJobNames: readonly JobName[] = Object.values(jobNames);

/** What a job carries: only the id of its field_check row, which holds everything else. */
export const fieldCheckJobDataSchema = z.strictObject({ fieldCheckId: z.string().min(1).max(100) });
export type FieldCheckJobData = z.infer<typeof fieldCheckJobDataSchema>;

/**
 * Simulations a Homing study may run at most; its time budget is this many engine budgets. Kept in step with the
 * engine's own cap (src/worker/fullwave) by the worker, which stops the study when the job budget is spent.
 */
export const HOMING_MAX_SIMULATIONS = 8;

/**
 * Seconds a job may take in all. The engine's budget holds for each of its runs: a check is one run (two in accurate
 * mode: the standard mesh, then the refined one), a Homing study at most HOMING_MAX_SIMULATIONS checks.
 */
export function jobBudgetSeconds(kind: FieldCheckKind, options: FieldCheckOptions): number {
	const perCheck = options.budgetSeconds * (options.mode === 'accurate' ? 2 : 1);
	return kind === 'homing' ? perCheck * HOMING_MAX_SIMULATIONS : perCheck;
}

/**
 * pg-boss fails (and retries) an active job older than this: the job budget plus a minute for the worker to store the
 * result. The worker stops the engine at the budget itself, so only a lost worker ever reaches it.
 */
export function jobExpireSeconds(kind: FieldCheckKind, options: FieldCheckOptions): number {
	return jobBudgetSeconds(kind, options) + 60;
}

/** How many times pg-boss hands a job to another worker after its worker was lost. */
export const JOB_RETRY_LIMIT = 2;
