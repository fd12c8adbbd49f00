// The main sizes a drawing dimensions: patch W and L (or D), inset depth, feed width, ground size.
import type { Point } from '../geometry';
import { feedLineOf } from '../rf/feed-kinds';
import type { SizedDesign } from '../rf/sized-design';
import { patchHalfSizes } from './patch-polygon';
import type { ArtworkDimension } from './types';

export function buildDimensions(sized: SizedDesign, center: Point, patchEdgeYMm: number): ArtworkDimension[] {
	const [cx, cy] = center;
	const { widthMm: gw, lengthMm: gl } = sized.ground;
	const dims: ArtworkDimension[] = [];
	if (sized.patch.kind === 'circular') {
		const r = sized.patch.radiusMm;
		dims.push({ id: 'patch-diameter', label: 'D', from: [cx - r, cy], to: [cx + r, cy], valueMm: 2 * r, side: 'above' });
	} else {
		const { halfXMm: hx, halfYMm: hy } = patchHalfSizes(sized.patch);
		dims.push({ id: 'patch-width', label: 'W', from: [cx - hx, cy + hy], to: [cx + hx, cy + hy], valueMm: 2 * hx, side: 'above' });
		dims.push({ id: 'patch-length', label: 'L', from: [cx + hx, cy - hy], to: [cx + hx, cy + hy], valueMm: 2 * hy, side: 'right' });
	}
	const feed = sized.feed;
	if (feed.kind === 'inset') {
		const x = cx - feed.line.widthMm / 2 - feed.notchGapMm;
		dims.push({ id: 'inset-depth', label: 'y0', from: [x, patchEdgeYMm], to: [x, patchEdgeYMm + feed.insetDepthMm], valueMm: feed.insetDepthMm, side: 'left' });
	}
	const line = feedLineOf(feed);
	if (line) {
		const half = line.widthMm / 2;
		dims.push({ id: 'feed-width', label: 'Wf', from: [cx - half, 0], to: [cx + half, 0], valueMm: line.widthMm, side: 'below' });
	}
	dims.push({ id: 'ground-width', label: 'Wg', from: [0, 0], to: [gw, 0], valueMm: gw, side: 'below' });
	dims.push({ id: 'ground-length', label: 'Lg', from: [0, 0], to: [0, gl], valueMm: gl, side: 'left' });
	return dims;
}
