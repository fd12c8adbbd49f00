// What a design-rule check reports: which rule, which shapes, where, measured against required (the type comes from schemas/violation.ts).
import type { Point } from '../geometry';

export { drcRuleIds as DRC_RULE_IDS, type DrcRuleId, type Violation } from '../schemas/violation';
import type { Violation } from '../schemas/violation';

/** Rounded to 0.1 µm for messages and reports; the comparison itself uses the full value. */
export function roundMm(valueMm: number): number {
	return Math.round(valueMm * 1e4) / 1e4;
}

export function locationOf(p: Point): Violation['location'] {
	return { xMm: roundMm(p[0]), yMm: roundMm(p[1]) };
}

export function midpointOf(a: Point, b: Point): Point {
	return [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];
}
