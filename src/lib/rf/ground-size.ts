// Ground plane and substrate outline: the patch plus a margin on every side (default 3h).
import { requireNonNegative, requireObject, requirePositive } from './guard';

export interface GroundInput {
	/** Patch extent along x (width, or diameter). */
	patchWidthMm: number;
	/** Patch extent along y (length, or diameter). */
	patchLengthMm: number;
	heightMm: number;
	/** Margin beyond the patch on every side; default 3h. */
	marginMm?: number;
	/** Room the feed needs beyond the patch along y (e.g. a λ/4 section); the y margin grows to it. */
	feedRoomMm?: number;
}

/** Default margin in substrate heights: ground = patch + 6h overall (common practice, no source). */
export const DEFAULT_MARGIN_HEIGHTS = 3;

/** Ground size centred on the patch: W + 2m by L + 2·max(m, feed room). */
export function groundSize(input: GroundInput): { widthMm: number; lengthMm: number; marginMm: number } {
	const d = requireObject('input', input);
	const w = requirePositive('patchWidthMm', d.patchWidthMm);
	const l = requirePositive('patchLengthMm', d.patchLengthMm);
	const h = requirePositive('heightMm', d.heightMm);
	const marginMm = d.marginMm === undefined ? DEFAULT_MARGIN_HEIGHTS * h : requireNonNegative('marginMm', d.marginMm);
	const feedRoomMm = d.feedRoomMm === undefined ? 0 : requireNonNegative('feedRoomMm', d.feedRoomMm);
	return { widthMm: w + 2 * marginMm, lengthMm: l + 2 * Math.max(marginMm, feedRoomMm), marginMm };
}
