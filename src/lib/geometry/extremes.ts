// The least and the greatest of a list of numbers, in one pass: no array is spread into Math.min/Math.max, whose every
// argument takes a stack slot (a long list would overflow it; see tests/unit/source/no-argument-spread.test.ts).

/** The least value, or `empty` (Infinity unless given) for no values. */
export function minOf(values: Iterable<number>, empty = Number.POSITIVE_INFINITY): number {
	let least = empty;
	let any = false;
	for (const v of values) {
		least = any ? Math.min(least, v) : v;
		any = true;
	}
	return least;
}

/** The greatest value, or `empty` (−Infinity unless given) for no values. */
export function maxOf(values: Iterable<number>, empty = Number.NEGATIVE_INFINITY): number {
	let greatest = empty;
	let any = false;
	for (const v of values) {
		greatest = any ? Math.max(greatest, v) : v;
		any = true;
	}
	return greatest;
}
