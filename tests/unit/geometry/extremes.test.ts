// minOf / maxOf agree with Math.min / Math.max (ECMA-262 §21.3.2.24–25: NaN wins, no values give ±Infinity) and
// take a list far longer than the arguments a call can spread.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { maxOf, minOf } from '../../../src/lib/geometry';

describe('minOf / maxOf', () => {
	it('equal Math.min / Math.max on short lists, NaN included', () => {
		fc.assert(
			fc.property(fc.array(fc.double(), { maxLength: 50 }), (xs) => {
				expect(Object.is(minOf(xs), Math.min(...xs)) || (Number.isNaN(minOf(xs)) && Number.isNaN(Math.min(...xs)))).toBe(true);
				expect(Object.is(maxOf(xs), Math.max(...xs)) || (Number.isNaN(maxOf(xs)) && Number.isNaN(Math.max(...xs)))).toBe(true);
			}),
			{ numRuns: 200, seed: 11 }
		);
	});

	it('give the stated value for no values', () => {
		expect(minOf([])).toBe(Infinity);
		expect(maxOf([], 0)).toBe(0);
	});

	it('read a 1 000 000-value list (Math.max(...list) throws RangeError there)', () => {
		const long = Array.from({ length: 1_000_000 }, (_, i) => (i * 7919) % 1_000_003);
		expect(() => Math.max(...long)).toThrow(RangeError);
		expect(maxOf(long)).toBe(1_000_002);
		expect(minOf(long)).toBe(0);
	});
});
