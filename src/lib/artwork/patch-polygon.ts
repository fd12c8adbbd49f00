// Vertices of a straight-edged patch (rectangular, nearly-square, truncated-corner) centred on a point, counter-clockwise.
import type { Point } from '../geometry';
import type { SizedPatch } from '../rf/sized-design';

type StraightPatch = Exclude<SizedPatch, { kind: 'circular' }>;

/** Half sizes along x and y. */
export function patchHalfSizes(patch: StraightPatch): { halfXMm: number; halfYMm: number } {
	if (patch.kind === 'truncated-corner') return { halfXMm: patch.sideMm / 2, halfYMm: patch.sideMm / 2 };
	return { halfXMm: patch.widthMm / 2, halfYMm: patch.lengthMm / 2 };
}

/**
 * Corner cuts: right-isosceles triangles of leg `truncationLegMm` on the diagonal sizing chose:
 * 'rising' cuts the lower-left and upper-right corners, 'falling' the other two.
 */
export function patchPolygon(patch: StraightPatch, center: Point): Point[] {
	const [cx, cy] = center;
	const { halfXMm: hx, halfYMm: hy } = patchHalfSizes(patch);
	const x0 = cx - hx, x1 = cx + hx, y0 = cy - hy, y1 = cy + hy;
	if (patch.kind !== 'truncated-corner' || patch.truncationLegMm <= 0) {
		return [[x0, y0], [x1, y0], [x1, y1], [x0, y1]];
	}
	const t = patch.truncationLegMm;
	const cutLowerLeft = patch.truncatedDiagonal === 'rising';
	const pts: Point[] = [];
	// lower-left, lower-right, upper-right, upper-left; cut either LL+UR or LR+UL
	if (cutLowerLeft) pts.push([x0 + t, y0]);
	else pts.push([x0, y0]);
	if (!cutLowerLeft) pts.push([x1 - t, y0], [x1, y0 + t]);
	else pts.push([x1, y0]);
	if (cutLowerLeft) pts.push([x1, y1 - t], [x1 - t, y1]);
	else pts.push([x1, y1]);
	if (!cutLowerLeft) pts.push([x0 + t, y1], [x0, y1 - t]);
	else pts.push([x0, y1]);
	if (cutLowerLeft) pts.push([x0, y0 + t]);
	return pts;
}
