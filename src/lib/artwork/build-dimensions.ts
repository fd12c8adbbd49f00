// The sizes a drawing dimensions, as measured spans on the board: patch W and L (or D) and its corner cut, a parasitic
// patch's, the feed's
// widths, inset depth and notch gap, a coupling slot and stub or a buried line's overlap, the probe position from datum A (the board's lower-left corner), array pitch, ground.
import type { Point } from '../geometry';
import { feedLineOf } from '../rf/feed-kinds';
import type { SizedDesign } from '../rf/sized-design';
import { patchHalfSizes } from './patch-polygon';
import type { ArtworkDimension } from './types';

/** Where the dimensioned element sits on the board. */
export interface DimensionPlacement {
	/** Centre of the patch whose sizes are dimensioned (an array's upper right one), board coordinates. */
	readonly center: Point;
	/** Lowest y of that patch on the feed axis. */
	readonly patchEdgeYMm: number;
	/** Centre and lower patch edge of the element whose feed is dimensioned (an array's lower right one; absent: the same patch). */
	readonly feedElement?: { readonly center: Point; readonly patchEdgeYMm: number };
	/** Lowest y of that element's feed line (0 where the line starts at the board edge). */
	readonly feedStartYMm: number;
	readonly board: { readonly widthMm: number; readonly lengthMm: number };
	/** Element pitch of an array, mm (absent: one element). */
	readonly pitch?: { readonly xMm: number | null; readonly yMm: number | null };
}

/** Name of the datum the probe position is measured from. */
export const PROBE_DATUM = { name: 'A', at: [0, 0] as Point, description: 'board lower-left corner' } as const;

export function buildDimensions(sized: SizedDesign, placement: DimensionPlacement): ArtworkDimension[] {
	const [px, py] = placement.center;
	const { widthMm: gw, lengthMm: gl } = placement.board;
	const feedElement = placement.feedElement ?? placement;
	const [cx, cy] = feedElement.center;
	const edgeY = feedElement.patchEdgeYMm;
	const dims: ArtworkDimension[] = [];
	const patch = sized.patch;
	if (patch.kind === 'circular') {
		const r = patch.radiusMm;
		dims.push({ id: 'patch-diameter', label: 'D', from: [px - r, py], to: [px + r, py], valueMm: 2 * r, side: 'above' });
	} else {
		const { halfXMm: hx, halfYMm: hy } = patchHalfSizes(patch);
		dims.push({ id: 'patch-width', label: 'W', from: [px - hx, py + hy], to: [px + hx, py + hy], valueMm: 2 * hx, side: 'above' });
		dims.push({ id: 'patch-length', label: 'L', from: [px + hx, py - hy], to: [px + hx, py + hy], valueMm: 2 * hy, side: 'right' });
		if (patch.kind === 'truncated-corner' && patch.truncationLegMm > 0) {
			// the leg of the upper cut along the top edge: upper right for 'rising', upper left for 'falling'
			const t = patch.truncationLegMm;
			const [from, to]: [Point, Point] = patch.truncatedDiagonal === 'rising' ? [[px + hx - t, py + hy], [px + hx, py + hy - t]] : [[px - hx, py + hy - t], [px - hx + t, py + hy]];
			dims.push({ id: 'corner-cut', label: 'c', from, to: [to[0], from[1]], valueMm: t, side: 'above' });
		}
	}
	// a stacked parasitic patch, centred over the driven one: its own width and length (or diameter)
	const parasitic = sized.parasitic?.patch;
	if (parasitic?.kind === 'circular') {
		const r = parasitic.radiusMm;
		dims.push({ id: 'parasitic-width', label: 'Dp', from: [px - r, py], to: [px + r, py], valueMm: 2 * r, side: 'above' });
	} else if (parasitic) {
		const { halfXMm: hx, halfYMm: hy } = patchHalfSizes(parasitic);
		dims.push({ id: 'parasitic-width', label: 'Wp', from: [px - hx, py + hy], to: [px + hx, py + hy], valueMm: 2 * hx, side: 'above' });
		dims.push({ id: 'parasitic-length', label: 'Lp', from: [px + hx, py - hy], to: [px + hx, py + hy], valueMm: 2 * hy, side: 'right' });
	}
	const feed = sized.feed;
	switch (feed.kind) {
		case 'inset': {
			const half = feed.line.widthMm / 2;
			const x = cx - half - feed.notchGapMm;
			dims.push({ id: 'inset-depth', label: 'y0', from: [x, edgeY], to: [x, edgeY + feed.insetDepthMm], valueMm: feed.insetDepthMm, side: 'left' });
			const notchTopY = edgeY + feed.insetDepthMm;
			dims.push({ id: 'notch-gap', label: 'g', from: [cx + half, notchTopY], to: [cx + half + feed.notchGapMm, notchTopY], valueMm: feed.notchGapMm, side: 'below' });
			break;
		}
		case 'probe': {
			const p: Point = [cx + feed.offsetXMm, cy + feed.offsetYMm];
			dims.push({ id: 'probe-x', label: 'xp', from: PROBE_DATUM.at, to: p, valueMm: p[0] - PROBE_DATUM.at[0], side: 'below' });
			dims.push({ id: 'probe-y', label: 'yp', from: PROBE_DATUM.at, to: p, valueMm: p[1] - PROBE_DATUM.at[1], side: 'left' });
			break;
		}
		case 'quarter-wave': {
			const half = feed.transformer.widthMm / 2;
			const joinY = edgeY - feed.transformer.lengthMm;
			dims.push({ id: 'transformer-length', label: 'Lt', from: [cx + half, joinY], to: [cx + half, edgeY], valueMm: feed.transformer.lengthMm, side: 'right' });
			dims.push({ id: 'transformer-width', label: 'Wt', from: [cx - half, edgeY], to: [cx + half, edgeY], valueMm: feed.transformer.widthMm, side: 'below' });
			break;
		}
		case 'aperture-coupled': {
			// the slot in the ground is centred under the patch, across the line; the open stub runs on past its centre
			const half = feed.line.widthMm / 2;
			const [hs, ws] = [feed.slotLengthMm / 2, feed.slotWidthMm / 2];
			dims.push({ id: 'slot-length', label: 'Ls', from: [cx - hs, cy - ws], to: [cx + hs, cy - ws], valueMm: feed.slotLengthMm, side: 'below' });
			dims.push({ id: 'slot-width', label: 'Ws', from: [cx + hs, cy - ws], to: [cx + hs, cy + ws], valueMm: feed.slotWidthMm, side: 'right' });
			if (feed.stubLengthMm > 0) dims.push({ id: 'stub-length', label: 'Lst', from: [cx + half, cy], to: [cx + half, cy + feed.stubLengthMm], valueMm: feed.stubLengthMm, side: 'right' });
			break;
		}
		case 'proximity-coupled': {
			const half = feed.line.widthMm / 2;
			dims.push({ id: 'feed-overlap', label: 'Lo', from: [cx + half, edgeY], to: [cx + half, edgeY + feed.overlapMm], valueMm: feed.overlapMm, side: 'right' });
			break;
		}
		case 'edge':
			break;
		default:
			return feed satisfies never;
	}
	const line = feedLineOf(feed);
	if (line) {
		const half = line.widthMm / 2;
		dims.push({ id: 'feed-width', label: 'Wf', from: [cx - half, placement.feedStartYMm], to: [cx + half, placement.feedStartYMm], valueMm: line.widthMm, side: 'below' });
	}
	// pitch between the dimensioned patch and its neighbour to the left and below
	if (placement.pitch?.xMm) dims.push({ id: 'pitch-x', label: 'Sx', from: [px - placement.pitch.xMm, py], to: [px, py], valueMm: placement.pitch.xMm, side: 'above' });
	if (placement.pitch?.yMm) dims.push({ id: 'pitch-y', label: 'Sy', from: [px, py - placement.pitch.yMm], to: [px, py], valueMm: placement.pitch.yMm, side: 'right' });
	dims.push({ id: 'ground-width', label: 'Wg', from: [0, 0], to: [gw, 0], valueMm: gw, side: 'below' });
	dims.push({ id: 'ground-length', label: 'Lg', from: [0, 0], to: [0, gl], valueMm: gl, side: 'left' });
	return dims;
}
