// Named tolerances of the geometry room, each with the reason for its value.

/**
 * Two lengths closer than 1 nm are the same length. Gerber 4.6 resolves 1 nm (6 decimals of a mm),
 * so anything finer cannot survive a round trip through our own files anyway.
 */
export const LENGTH_EPSILON_MM = 1e-6;

/**
 * Largest gap allowed between a flattened chord and its true arc when a round shape is turned into
 * a polygon for boolean work or drawing checks: 0.1 µm, a hundredth of a typical fab's 10 µm
 * etch resolution, so flattening never moves copper by a visible amount.
 */
export const CHORD_TOLERANCE_MM = 1e-4;

/** Areas below 1e-6 mm² (a 1 µm square) are treated as zero: smaller than any etchable feature. */
export const AREA_EPSILON_MM2 = 1e-6;

/** True when two lengths differ by less than `toleranceMm` (default LENGTH_EPSILON_MM). */
export function isNearlyEqualMm(a: number, b: number, toleranceMm = LENGTH_EPSILON_MM): boolean {
	return Math.abs(a - b) <= toleranceMm;
}
