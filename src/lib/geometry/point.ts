// Millimetre scalars and points: the one unit of the core, written into the types.

/** A length in millimetres. The brand is optional so plain numbers assign; it documents the unit. */
export type Mm = number & { readonly __unit?: 'mm' };

/** A point in the board plane, millimetres: x to the right, y up (mathematical orientation). */
export type Point = readonly [xMm: Mm, yMm: Mm];

export function createPoint(xMm: number, yMm: number): Point {
	return [xMm, yMm];
}

export function distanceMm(a: Point, b: Point): number {
	return Math.hypot(b[0] - a[0], b[1] - a[1]);
}
