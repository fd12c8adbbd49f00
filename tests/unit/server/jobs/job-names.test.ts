import { describe, expect, it } from 'vitest';
import { HOMING_MAX_SIMULATIONS, jobBudgetSeconds, jobExpireSeconds } from '../../../../src/lib/server/jobs/job-names';
import { MAX_HOMING_SIMULATIONS } from '../../../../src/worker/fullwave/run-homing';

describe('job time budgets', () => {
	it.each([
		['check', 'quick', 300, 300], // one engine run
		['check', 'standard', 900, 900],
		['check', 'accurate', 900, 1800], // the standard mesh, then the refined one, each with the engine budget
		['homing', 'standard', 900, 900 * HOMING_MAX_SIMULATIONS],
		['homing', 'accurate', 600, 600 * 2 * HOMING_MAX_SIMULATIONS]
	] as const)('a %s on the %s mesh with a %i s engine budget may take %i s', (kind, mode, budgetSeconds, expected) => {
		expect(jobBudgetSeconds(kind, { mode, budgetSeconds })).toBe(expected);
		// pg-boss expires a job only after its budget and a minute to store the result.
		expect(jobExpireSeconds(kind, { mode, budgetSeconds })).toBe(expected + 60);
	});

	it('budgets Homing for as many simulations as the engine study may run', () => {
		expect(HOMING_MAX_SIMULATIONS).toBe(MAX_HOMING_SIMULATIONS);
	});
});
