// Argument checks for the rf functions: anything unusable becomes an InputError naming the argument and its allowed range.
import { InputError } from '../schemas';

export interface RangeOptions {
	/** Exclude the lower bound itself (default: included). */
	exclusiveMin?: boolean;
	/** Exclude the upper bound itself (default: included). */
	exclusiveMax?: boolean;
}

/** Describes [min, max], (min, max) … the way the schemas' messages do. */
export function describeRange(min: number, max: number, opts: RangeOptions = {}): string {
	return `allowed range ${opts.exclusiveMin ? '(' : '['}${min}, ${max}${opts.exclusiveMax ? ')' : ']'}`;
}

/** Returns `value` when it is a finite number inside the range, else throws InputError for `path`. */
export function requireInRange(path: string, value: unknown, min: number, max: number, opts: RangeOptions = {}): number {
	if (typeof value !== 'number' || !Number.isFinite(value)) {
		throw new InputError([{ path, value, message: `must be a finite number; ${describeRange(min, max, opts)}` }]);
	}
	const belowMin = opts.exclusiveMin ? value <= min : value < min;
	const aboveMax = opts.exclusiveMax ? value >= max : value > max;
	if (belowMin || aboveMax) throw new InputError([{ path, value, message: describeRange(min, max, opts) }]);
	return value;
}

/** A finite number > 0 (upper end: the largest finite double). */
const POSITIVE: RangeOptions = { exclusiveMin: true };

export function requirePositive(path: string, value: unknown): number {
	if (typeof value === 'number' && value > 0 && value <= Number.MAX_VALUE) return value;
	return requireInRange(path, value, 0, Number.MAX_VALUE, POSITIVE);
}

/** A finite number ≥ 0. */
export function requireNonNegative(path: string, value: unknown): number {
	return requireInRange(path, value, 0, Number.MAX_VALUE);
}

/** The argument object itself must be a plain object. */
export function requireObject(path: string, value: unknown): Record<string, unknown> {
	if (value === null || typeof value !== 'object' || Array.isArray(value)) {
		throw new InputError([{ path, value, message: 'must be an object' }]);
	}
	return value as Record<string, unknown>;
}
