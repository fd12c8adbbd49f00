// How long one request's heavy work (building, checking, writing a design's files) may take before it is given up.

/** Default budget: a 64 × 64 array's bundle (the largest design) builds well inside it on a 2-core machine. */
export const DEFAULT_WORK_BUDGET_MS = 120_000;

/** FRINGEFIELD_WORK_BUDGET_MS when set to a positive number of milliseconds, else the default. */
export function workBudgetMs(): number {
	const raw = Number(process.env.FRINGEFIELD_WORK_BUDGET_MS);
	return Number.isFinite(raw) && raw > 0 ? raw : DEFAULT_WORK_BUDGET_MS;
}

/**
 * Default budget of a page's heavy panels (the revision page's check, drawing and read-back): a page answers within
 * it, showing the panels that finished and a note naming the budget for the others. An ordinary design needs well
 * under a second; the largest design the page draws (16 × 16, see REVISION_DRAWING_SHAPE_LIMIT) about 1 s on one core.
 */
export const DEFAULT_PAGE_WORK_BUDGET_MS = 10_000;

/** FRINGEFIELD_PAGE_WORK_BUDGET_MS when set to a positive number of milliseconds, else the default. */
export function pageWorkBudgetMs(): number {
	const raw = Number(process.env.FRINGEFIELD_PAGE_WORK_BUDGET_MS);
	return Number.isFinite(raw) && raw > 0 ? raw : DEFAULT_PAGE_WORK_BUDGET_MS;
}

/** Human form of a budget: "120 s", "2.5 s", "50 ms". */
export function formatBudget(ms: number): string {
	if (ms < 1000) return `${Math.round(ms)} ms`;
	return `${ms >= 10_000 ? Math.round(ms / 1000) : Math.round(ms / 100) / 10} s`;
}

/**
 * The work did not finish within the budget: it was stopped (its worker thread ended) and nothing
 * was delivered or recorded. Routes answer 503 with this message, never a hang.
 */
export class WorkBudgetExceededError extends Error {
	constructor(
		readonly what: string,
		readonly budgetMs: number
	) {
		super(`${what} did not finish within the server's work budget of ${formatBudget(budgetMs)} (FRINGEFIELD_WORK_BUDGET_MS) and was stopped; try again later, or ask for a smaller download`);
		this.name = 'WorkBudgetExceededError';
	}
}
