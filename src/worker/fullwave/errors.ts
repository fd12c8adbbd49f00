// Errors of the engine runner, each with a code the job queue and the CLI map to a state or exit code.

/** The openEMS binary is not installed or cannot start. */
export class EngineMissingError extends Error {
	readonly code = 'engine-missing' as const;
}

/** The run exceeded its wall-clock budget and was stopped. */
export class BudgetExceededError extends Error {
	readonly code = 'budget-exceeded' as const;
}

/** The caller's AbortSignal fired; the engine's process group was killed. */
export class FieldCheckAbortedError extends Error {
	readonly code = 'aborted' as const;
}

/** The engine ran but failed (non-zero exit, missing output files). */
export class EngineFailedError extends Error {
	readonly code = 'engine-failed' as const;
}
