// How many threads the engine is started with: the caller's number, else FRINGEFIELD_OPENEMS_THREADS, else one.
import { afterEach, describe, expect, it } from 'vitest';
import { DEFAULT_ENGINE_THREADS, threadCount } from '../../../../src/worker/fullwave/run-field-check';

const saved = process.env.FRINGEFIELD_OPENEMS_THREADS;
afterEach(() => {
	if (saved === undefined) delete process.env.FRINGEFIELD_OPENEMS_THREADS;
	else process.env.FRINGEFIELD_OPENEMS_THREADS = saved;
});

describe('threadCount', () => {
	it('starts the engine on one thread by default', () => {
		delete process.env.FRINGEFIELD_OPENEMS_THREADS;
		// README "Field check and Homing", engine threads: one thread ran openEMS 0.0.35 about 1.3× faster than two on
		// the shared 2-core machine (our own measurement, MC/s from the engine's progress lines)
		expect(DEFAULT_ENGINE_THREADS).toBe(1);
		expect(threadCount({})).toBe(1);
	});

	it('takes FRINGEFIELD_OPENEMS_THREADS, and the caller’s number over it (floored)', () => {
		process.env.FRINGEFIELD_OPENEMS_THREADS = '2';
		expect(threadCount({})).toBe(2);
		expect(threadCount({ threads: 3.7 })).toBe(3);
	});

	it.each([
		['abc', 'not a number'],
		['0', 'zero'],
		['-2', 'negative'],
		['1.5', 'not a whole number'],
		['', 'empty']
	])('ignores FRINGEFIELD_OPENEMS_THREADS=%j (%s) and uses the default', (value) => {
		process.env.FRINGEFIELD_OPENEMS_THREADS = value;
		expect(threadCount({})).toBe(DEFAULT_ENGINE_THREADS);
		// a caller's zero or negative count is no count either
		expect(threadCount({ threads: 0 })).toBe(DEFAULT_ENGINE_THREADS);
		expect(threadCount({ threads: -1 })).toBe(DEFAULT_ENGINE_THREADS);
	});
});
