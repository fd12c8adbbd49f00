// Public face of server/work: heavy work on worker threads with a time budget.
export { runWork, workStartedCount } from './work-pool';
export { runBudgetedWork } from './run-budgeted-work';
export { DEFAULT_PAGE_WORK_BUDGET_MS, DEFAULT_WORK_BUDGET_MS, formatBudget, pageWorkBudgetMs, workBudgetMs, WorkBudgetExceededError } from './work-budget';
export type { WorkResult, WorkTask } from './work-task';
