// A filled area: one counter-clockwise outer contour and any clockwise holes.
import type { Contour } from './contour';
import { contourArea } from './contour-area';

export interface Region {
	readonly outer: Contour;
	readonly holes: readonly Contour[];
}

/** Net area in mm²: the outer area minus the holes (orientation-independent). */
export function regionArea(region: Region): number {
	return Math.abs(contourArea(region.outer)) - region.holes.reduce((sum, h) => sum + Math.abs(contourArea(h)), 0);
}
