// runWork for request handlers: a budget overrun becomes kit's 503 with the budget in its message, which the
// API answers as JSON ({ error, issues }) and pages show on the error page; never a hang, never a 500.
import { error } from '@sveltejs/kit';
import { WorkBudgetExceededError } from './work-budget';
import { runWork } from './work-pool';
import type { WorkResult, WorkTask } from './work-task';

export async function runBudgetedWork<T extends WorkTask['type']>(task: Extract<WorkTask, { type: T }>, opts: { what: string; budgetMs?: number; retireThread?: boolean }): Promise<Extract<WorkResult, { type: T }>> {
	let result: WorkResult;
	try {
		result = await runWork(task, opts);
	} catch (err) {
		if (err instanceof WorkBudgetExceededError) error(503, { message: err.message });
		throw err;
	}
	if (result.type !== task.type) throw new Error(`a ${task.type} task answered with a ${result.type} result`);
	return result as Extract<WorkResult, { type: T }>;
}
