// What a design-rule check reports: which rule, which shapes, where, measured against required.
import type { Point } from '../geometry';

/** Our rule names. Stable: the UI, the API's 422 body and waivers refer to them. */
export type DrcRuleId = 'trace-width' | 'copper-spacing' | 'drill-size' | 'annular-ring' | 'edge-clearance' | 'slot-width' | 'stack-build';

export const DRC_RULE_IDS: readonly DrcRuleId[] = ['trace-width', 'copper-spacing', 'drill-size', 'annular-ring', 'edge-clearance', 'slot-width', 'stack-build'];

export interface Violation {
	readonly ruleId: DrcRuleId;
	/** The artwork layer the offending copper is on; null for a drill on its own. */
	readonly layerId: string | null;
	/** Artwork shape ids (and drill ids) involved, in a fixed order. */
	readonly shapeIds: readonly string[];
	/** Where to draw the marker: board coordinates in mm. */
	readonly location: { readonly xMm: number; readonly yMm: number };
	/** What the artwork has (0 for 'stack-build', which judges the stack, not a length). */
	readonly measuredMm: number;
	/** What the profile asks for at least (0 for 'stack-build'). */
	readonly requiredMm: number;
	/** One sentence for humans. */
	readonly message: string;
}

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
