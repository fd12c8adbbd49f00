// Top copper: the patch, its feed (edge line, inset line in notches, quarter-wave section) or probe pad.
import {
	GeometryError,
	createCircleContour,
	createPolygonContour,
	createRectangleContour,
	differenceRegions,
	isPointInRing,
	type Point,
	type Region
} from '../geometry';
import type { SizedDesign } from '../rf/sized-design';
import { patchPolygon } from './patch-polygon';
import { circleWithChannelContour, stripUnderCircleContour } from './round-contours';
import type { ArtworkShape } from './types';

export interface TopCopper {
	readonly shapes: ArtworkShape[];
	readonly voids: ArtworkShape[];
	/** Lowest y of the patch on the feed axis (the radiating edge the feed enters). */
	readonly patchEdgeYMm: number;
	/** Where the probe lands, when the feed is a probe. */
	readonly probeCenter: Point | null;
}

const region = (id: string, role: ArtworkShape['role'], r: Region): ArtworkShape => ({
	id,
	role,
	polarity: 'dark',
	geometry: { kind: 'region', region: r }
});

const rect = (x0: number, y0: number, x1: number, y1: number): Region => ({
	outer: createRectangleContour(x0, y0, x1 - x0, y1 - y0),
	holes: []
});

export function buildTopCopper(sized: SizedDesign, center: Point): TopCopper {
	const [cx, cy] = center;
	const { patch, feed } = sized;
	const shapes: ArtworkShape[] = [];
	const voids: ArtworkShape[] = [];
	const round = patch.kind === 'circular';
	const radius = round ? patch.radiusMm : 0;
	const straight = round ? null : patchPolygon(patch, center);
	const edgeY = round ? cy - radius : straight!.reduce((low, p) => Math.min(low, p[1]), Infinity);
	const patchRegion = (): Region =>
		round ? { outer: createCircleContour(center, radius), holes: [] } : { outer: createPolygonContour(straight!), holes: [] };

	const requireHalfWidthInside = (halfWidthMm: number, what: string) => {
		const limit = round ? radius : straight!.filter((p) => p[1] === edgeY).reduce((low, p) => Math.min(low, Math.abs(p[0] - cx)), Infinity);
		if (!(halfWidthMm < limit)) {
			throw new GeometryError('notch-outside-patch', `${what} (half width ${halfWidthMm.toFixed(4)} mm) must be narrower than the patch edge it meets (half width ${limit.toFixed(4)} mm)`);
		}
	};

	switch (feed.kind) {
		case 'edge': {
			const half = feed.line.widthMm / 2;
			requireHalfWidthInside(half, 'feed.line.widthMm');
			shapes.push(region('patch', 'patch', patchRegion()));
			shapes.push(
				region('feed-line', 'feed-line', round ? { outer: stripUnderCircleContour(center, radius, half, 0), holes: [] } : rect(cx - half, 0, cx + half, edgeY))
			);
			break;
		}
		case 'quarter-wave': {
			const halfT = feed.transformer.widthMm / 2;
			const half = feed.line.widthMm / 2;
			requireHalfWidthInside(halfT, 'feed.transformer.widthMm');
			const joinY = edgeY - feed.transformer.lengthMm;
			if (!(joinY > 0)) {
				throw new GeometryError('feed-longer-than-margin', `feed.transformer.lengthMm (${feed.transformer.lengthMm.toFixed(4)} mm) must be shorter than the board margin below the patch (${edgeY.toFixed(4)} mm)`);
			}
			shapes.push(region('patch', 'patch', patchRegion()));
			shapes.push(
				region('transformer', 'transformer', round ? { outer: stripUnderCircleContour(center, radius, halfT, joinY), holes: [] } : rect(cx - halfT, joinY, cx + halfT, edgeY))
			);
			shapes.push(region('feed-line', 'feed-line', rect(cx - half, 0, cx + half, joinY)));
			break;
		}
		case 'inset': {
			const half = feed.line.widthMm / 2;
			const channelHalf = half + feed.notchGapMm;
			const topY = edgeY + feed.insetDepthMm;
			requireHalfWidthInside(channelHalf, 'inset notch (feed width + 2 × notchGapMm)');
			if (round) {
				const sideY = cy - Math.sqrt(radius * radius - channelHalf * channelHalf);
				if (!(topY > sideY) || !(topY < cy + radius)) {
					throw new GeometryError('notch-outside-patch', `feed.insetDepthMm (${feed.insetDepthMm.toFixed(4)} mm) must reach past the circle's edge at the notch sides (${(sideY - edgeY).toFixed(4)} mm) and stay inside the patch`);
				}
				shapes.push(region('patch', 'patch', { outer: circleWithChannelContour(center, radius, channelHalf, topY), holes: [] }));
			} else {
				const topOfPatch = straight!.reduce((high, p) => Math.max(high, p[1]), -Infinity);
				if (!(topY < topOfPatch)) {
					throw new GeometryError('notch-outside-patch', `feed.insetDepthMm (${feed.insetDepthMm.toFixed(4)} mm) must be less than the patch length (${(topOfPatch - edgeY).toFixed(4)} mm)`);
				}
				// polygon-clipping cuts the notch channel out of the patch
				const cut = differenceRegions([patchRegion()], [rect(cx - channelHalf, edgeY - 1, cx + channelHalf, topY)]);
				if (cut.length !== 1) throw new GeometryError('notch-outside-patch', 'the inset notch splits the patch in two');
				shapes.push(region('patch', 'patch', cut[0]));
			}
			shapes.push(region('feed-line', 'feed-line', rect(cx - half, 0, cx + half, topY)));
			const notchBottom = (x: number) => (round ? cy - Math.sqrt(radius * radius - x * x) : edgeY);
			voids.push(region('notch-left', 'notch', rect(cx - channelHalf, notchBottom(channelHalf), cx - half, topY)));
			voids.push(region('notch-right', 'notch', rect(cx + half, notchBottom(channelHalf), cx + channelHalf, topY)));
			break;
		}
		case 'probe': {
			const at: Point = [cx + feed.offsetXMm, cy + feed.offsetYMm];
			const padR = feed.padDiameterMm / 2;
			const inside = round
				? Math.hypot(feed.offsetXMm, feed.offsetYMm) + padR <= radius
				: [0, 1, 2, 3, 4, 5, 6, 7].every((k) => isPointInRing([at[0] + padR * Math.cos((k * Math.PI) / 4), at[1] + padR * Math.sin((k * Math.PI) / 4)], straight!));
			if (!inside) {
				throw new GeometryError('probe-outside-patch', `the probe pad (diameter ${feed.padDiameterMm} mm at offset ${feed.offsetXMm}, ${feed.offsetYMm} mm) must lie inside the patch`);
			}
			shapes.push(region('patch', 'patch', patchRegion()));
			shapes.push({ id: 'probe-pad', role: 'probe-pad', polarity: 'dark', geometry: { kind: 'circle', center: at, diameterMm: feed.padDiameterMm } });
			return { shapes, voids, patchEdgeYMm: edgeY, probeCenter: at };
		}
		case 'aperture-coupled':
		case 'proximity-coupled':
			// built on three coppers by buildElement; the top copper holds only the patch
			throw new Error(`buildTopCopper: a ${feed.kind} feed is built by buildElement`);
		default:
			return feed satisfies never;
	}
	return { shapes, voids, patchEdgeYMm: edgeY, probeCenter: null };
}
