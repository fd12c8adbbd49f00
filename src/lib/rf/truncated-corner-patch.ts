// Corner-truncated square patch for circular polarisation: the cut size from the Q relation and the handedness rule.
import type { Handedness } from '../schemas';
import { requireInRange, requirePositive } from './guard';

/** Which pair of opposite corners is cut, in the patch frame (x along the width, y the feed's axis). */
export type TruncatedDiagonal = 'rising' | 'falling';

/**
 * Leg c of each right-isosceles corner cut: the two cuts remove ΔS = c² from S = s², and single-feed
 * circular polarisation needs ΔS/S = 1/(2Q0) (Garg, Bhartia, Bahl & Ittipiboon, Microstrip Antenna
 * Design Handbook, ch. 9; from memory). So c = s/√(2Q0). Valid as a small perturbation: thin
 * substrate, Q0 ≳ 10 (ΔS/S ≲ 5 %); outside it the relation only gives a starting point for tuning.
 */
export function truncationLegMm(sideMm: number, qualityFactor: number): number {
	const s = requirePositive('sideMm', sideMm);
	const q = requireInRange('qualityFactor', qualityFactor, 0.5, Number.MAX_VALUE);
	return s / Math.sqrt(2 * q);
}

/**
 * Handedness rule for a feed on the y axis and radiation towards +z (away from the ground): cutting
 * the corners on the rising diagonal (+x,+y)/(−x,−y) raises the resonance of the mode polarised
 * along that diagonal, so at f0 it leads the other diagonal mode by 90° and the field turns from
 * the rising towards the falling diagonal, counter-clockwise seen from +z: RHCP (IEEE Std 145).
 * The falling diagonal gives LHCP.
 */
export function truncatedDiagonalFor(handedness: Handedness): TruncatedDiagonal {
	return handedness === 'rhcp' ? 'rising' : 'falling';
}
