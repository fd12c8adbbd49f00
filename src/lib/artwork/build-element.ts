// One element in its own frame: its copper on each layer, with its feed line starting at the feed point (0, 0) and running up (+y).
import { createCircleContour, createPolygonContour, createRectangleContour, boundsOfPoints, contourBounds, emptyBounds, mergeBounds, type Bounds, type Point, type Region } from '../geometry';
import { isLayeredFeed } from '../rf/feed-kinds';
import type { SizedDesign, SizedFeed, SizedPatch } from '../rf/sized-design';
import { patchHalfSizes, patchPolygon } from './patch-polygon';
import { buildTopCopper } from './build-top-copper';
import type { ArtworkShape } from './types';

/** Which copper holds what: indices into the copper layers, top = 0. */
export interface LayerRoles {
	/** Where the radiating (or parasitic) patch is. */
	topIndex: number;
	/** Where the feed line and the corporate feed run. */
	feedIndex: number;
	/** The ground. */
	groundIndex: number;
	copperCount: number;
}

export interface BuiltElement {
	/** Shapes per copper index (0 = top), in drawing order. */
	readonly shapes: ArtworkShape[][];
	readonly voids: ArtworkShape[][];
	/** Clear shapes cut into the ground after it is drawn (coupling slots). */
	readonly groundCuts: ArtworkShape[];
	/** Bounds of the element's copper on the feed layer. */
	readonly feedFootprint: Bounds;
	/** Bounds of each of those shapes on its own (the corporate feed keeps its clearance from these). */
	readonly feedBoxes: Bounds[];
	/** Bounds of all the element's copper (every layer but the ground). */
	readonly footprint: Bounds;
	/** Centre of the patch. */
	readonly center: Point;
	/** Lowest point of the patch on its axis (for dimensions). */
	readonly patchEdgeYMm: number;
}

/** How far the feed's printed parts reach below the patch before the line of the array run starts. */
function feedRoomBelowPatchMm(feed: SizedFeed): number {
	switch (feed.kind) {
		case 'quarter-wave':
			return feed.transformer.lengthMm;
		case 'edge':
		case 'inset':
		case 'probe':
		case 'aperture-coupled':
		case 'proximity-coupled':
			return 0;
		default:
			return feed satisfies never;
	}
}

export function layerRolesOf(sized: SizedDesign): LayerRoles {
	const aboveGround = { topIndex: 0, feedIndex: 1, groundIndex: 2, copperCount: 3 };
	switch (sized.feed.kind) {
		case 'aperture-coupled':
			return { topIndex: 0, groundIndex: 1, feedIndex: 2, copperCount: 3 }; // the slotted ground between patch and line
		case 'proximity-coupled':
			return aboveGround; // the line buried between patch and ground
		case 'edge':
		case 'inset':
		case 'quarter-wave':
		case 'probe':
			return sized.parasitic ? aboveGround : { topIndex: 0, feedIndex: 0, groundIndex: 1, copperCount: 2 };
		default:
			return sized.feed satisfies never;
	}
}

const region = (id: string, role: ArtworkShape['role'], r: Region, polarity: ArtworkShape['polarity'] = 'dark'): ArtworkShape => ({ id, role, polarity, geometry: { kind: 'region', region: r } });
const rect = (x0: number, y0: number, x1: number, y1: number): Region => ({ outer: createRectangleContour(x0, y0, x1 - x0, y1 - y0), holes: [] });

function patchRegion(patch: SizedPatch, center: Point): Region {
	return patch.kind === 'circular' ? { outer: createCircleContour(center, patch.radiusMm), holes: [] } : { outer: createPolygonContour(patchPolygon(patch, center)), holes: [] };
}

function halfY(patch: SizedPatch): number {
	return patch.kind === 'circular' ? patch.radiusMm : patchHalfSizes(patch).halfYMm;
}

function shapeBounds(shapes: readonly ArtworkShape[]): Bounds {
	let b = emptyBounds;
	for (const s of shapes) {
		const g = s.geometry;
		if (g.kind === 'region') b = mergeBounds(b, contourBounds(g.region.outer));
		else if (g.kind === 'circle') b = boundsOfPoints([[g.center[0] - g.diameterMm / 2, g.center[1] - g.diameterMm / 2], [g.center[0] + g.diameterMm / 2, g.center[1] + g.diameterMm / 2]], b);
		else if (g.kind === 'outline') b = mergeBounds(b, contourBounds(g.contour));
		else b = boundsOfPoints(g.points, b);
	}
	return b;
}

/**
 * Builds the element with `runMm` of feed line between the feed point and the patch (or, for the
 * coupled feeds, between the feed point and the patch's lower edge).
 */
export function buildElement(sized: SizedDesign, runMm: number): BuiltElement {
	const roles = layerRolesOf(sized);
	const shapes: ArtworkShape[][] = Array.from({ length: roles.copperCount }, () => []);
	const voids: ArtworkShape[][] = Array.from({ length: roles.copperCount }, () => []);
	const groundCuts: ArtworkShape[] = [];
	const feed = sized.feed;
	const hy = halfY(sized.patch);
	let center: Point;
	if (isLayeredFeed(feed)) {
		center = [0, runMm + hy];
		shapes[roles.topIndex].push(region('patch', 'patch', patchRegion(sized.patch, center)));
		const half = feed.line.widthMm / 2;
		switch (feed.kind) {
			case 'aperture-coupled': {
				const slotY = center[1];
				shapes[roles.feedIndex].push(region('feed-line', 'feed-line', rect(-half, 0, half, slotY)));
				if (feed.stubLengthMm > 0) shapes[roles.feedIndex].push(region('tuning-stub', 'tuning-stub', rect(-half, slotY, half, slotY + feed.stubLengthMm)));
				groundCuts.push(region('coupling-slot', 'coupling-slot', rect(-feed.slotLengthMm / 2, slotY - feed.slotWidthMm / 2, feed.slotLengthMm / 2, slotY + feed.slotWidthMm / 2), 'clear'));
				break;
			}
			case 'proximity-coupled':
				shapes[roles.feedIndex].push(region('feed-line', 'feed-line', rect(-half, 0, half, runMm + feed.overlapMm)));
				break;
			default:
				return feed satisfies never;
		}
	} else {
		const below = hy + feedRoomBelowPatchMm(feed);
		center = [0, runMm + below];
		const top = buildTopCopper(sized, center);
		for (const s of top.shapes) shapes[roles.feedIndex].push(s);
		for (const v of top.voids) voids[roles.feedIndex].push(v);
		if (sized.parasitic) shapes[roles.topIndex].push(region('parasitic-patch', 'parasitic-patch', patchRegion(sized.parasitic.patch, center)));
	}
	const all = shapes.filter((_, i) => i !== roles.groundIndex).flat();
	const feedShapes = [...shapes[roles.feedIndex], ...groundCuts];
	return { shapes, voids, groundCuts, feedFootprint: shapeBounds(feedShapes), feedBoxes: feedShapes.map((s) => shapeBounds([s])), footprint: shapeBounds(all), center, patchEdgeYMm: center[1] - hy };
}

export { shapeBounds };
