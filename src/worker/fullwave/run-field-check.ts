// One Field check: design input → model → openEMS subprocess → post-processor → FieldCheckResult.
import type { FieldCheckOptions, FieldCheckProgress, FieldCheckResult } from '../../lib/schemas/field-check';

export interface FieldCheckContext {
	/** Stops the run: the engine's process group is killed and FieldCheckAbortedError thrown. */
	signal?: AbortSignal;
	onProgress?: (progress: FieldCheckProgress) => void;
	/** Folder for the model and the engine's output (default: a fresh temp folder, removed after). */
	workDir?: string;
	/** Engine threads (default os.availableParallelism(), or FRINGEFIELD_OPENEMS_THREADS). */
	threads?: number;
}

/**
 * Runs one Field check of a design-input document. Throws InputError for a bad document,
 * EngineMissingError, BudgetExceededError (naming the budget), FieldCheckAbortedError or EngineFailedError.
 */
export async function runFieldCheck(input: unknown, options: Partial<FieldCheckOptions>, context: FieldCheckContext = {}): Promise<FieldCheckResult> {
	void input;
	void options;
	void context;
	throw new Error('runFieldCheck: not built yet');
}
