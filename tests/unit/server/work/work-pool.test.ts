// The work pool under vitest: tasks run on worker threads (the TypeScript entry loaded through tsx), give the
// same answers as in-process, and a budget overrun ends the thread with a clear error and leaves the pool usable.
import { isHttpError } from '@sveltejs/kit';
import { isMainThread } from 'node:worker_threads';
import { describe, expect, it } from 'vitest';
import { arrayBenchDocument } from '../../../../src/lib/design';
import { STANDARD_QUICK_TURN_PROFILE } from '../../../../src/lib/schemas/fab-profile';
import { checkRevisionArtwork } from '../../../../src/lib/server/exports/export-work';
import { runBudgetedWork, runWork, WorkBudgetExceededError, workStartedCount } from '../../../../src/lib/server/work';
import { sizeDocument } from '../../../fixtures/designs/size-document';

const narrowProfile = { ...STANDARD_QUICK_TURN_PROFILE, name: 'Coarse test fab', minTraceWidthMm: 5 };

describe('the work pool', () => {
	it('checks a design on a worker thread with the same violations as in-process', async () => {
		const sized = sizeDocument(arrayBenchDocument(2));
		const before = workStartedCount();
		const result = await runWork({ type: 'gate', sized, profile: narrowProfile }, { what: 'test check' });
		expect(workStartedCount()).toBe(before + 1);
		expect(isMainThread).toBe(true);
		expect(result.type).toBe('gate');
		const violations = (result as { violations: unknown[] }).violations;
		// a 5 mm minimum trace: every feed and network line of the 2×2 array is too narrow
		expect(violations.length).toBeGreaterThan(0);
		expect(violations).toEqual(checkRevisionArtwork(sized, narrowProfile));
	}, 60_000);

	it('stops work that overruns its budget and answers the next task', async () => {
		const big = sizeDocument(arrayBenchDocument(32));
		await expect(runWork({ type: 'gate', sized: big, profile: STANDARD_QUICK_TURN_PROFILE }, { what: 'The big check', budgetMs: 50 })).rejects.toThrow(WorkBudgetExceededError);
		await expect(runWork({ type: 'gate', sized: big, profile: STANDARD_QUICK_TURN_PROFILE }, { what: 'The big check', budgetMs: 50 })).rejects.toThrow(
			/The big check did not finish within the server's work budget of 50 ms \(FRINGEFIELD_WORK_BUDGET_MS\)/
		);
		const small = await runWork({ type: 'gate', sized: sizeDocument(arrayBenchDocument(1)), profile: STANDARD_QUICK_TURN_PROFILE }, { what: 'after' });
		expect(small).toEqual({ type: 'gate', violations: [] });
	}, 60_000);

	it('turns an overrun into a 503 for the routes', async () => {
		const big = sizeDocument(arrayBenchDocument(32));
		const err = await runBudgetedWork({ type: 'gate', sized: big, profile: STANDARD_QUICK_TURN_PROFILE }, { what: 'The big check', budgetMs: 50 }).catch((e: unknown) => e);
		expect(isHttpError(err) && err.status).toBe(503);
		expect(isHttpError(err) && err.body.message).toMatch(/work budget of 50 ms \(FRINGEFIELD_WORK_BUDGET_MS\)/);
	}, 60_000);
});
