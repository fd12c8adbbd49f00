// One filled ring with a polarity, in drawing order: the common currency of the fab's image and the artwork's.
import { createPolygonContour, differenceRegions, regionArea, unionRegions, boundsOfPoints, emptyBounds, type Bounds, type Point, type Region } from '../../geometry';
import type { FabPolygon } from './fab-view';

export interface ImageItem {
	readonly polarity: 'dark' | 'clear';
	/** One filled area: an outer ring and holes (rings of at least three points, not closed). */
	readonly rings: readonly (readonly Point[])[];
}

export interface LayerImage {
	readonly regions: Region[];
	readonly areaMm2: number;
	readonly bounds: Bounds | null;
}

function toRegion(item: ImageItem): Region | null {
	const [outer, ...holes] = item.rings.filter((r) => r.length >= 3);
	if (!outer) return null;
	return { outer: createPolygonContour(outer), holes: holes.map((h) => createPolygonContour(h)) };
}

/**
 * Applies the items in order: dark adds, clear removes what is there (Gerber's LPD/LPC), via polygon-clipping.
 * A run of items of one polarity is applied in one operation ((image ∪ d1 ∪ … ∪ dk) − (c1 ∪ … ∪ cm) is the
 * same image as one item at a time), so an array's thousands of shapes cost one sweep, not one per shape.
 */
/** Most regions handed to one polygon-clipping call (a bounded argument list). */
const RUN_BATCH = 2000;

export function composeImage(items: readonly ImageItem[]): LayerImage {
	let image: Region[] = [];
	let run: Region[] = [];
	let runPolarity: ImageItem['polarity'] = 'dark';
	const flush = () => {
		// in batches, so no call gets more arguments than RUN_BATCH however large the layer
		for (let start = 0; start < run.length; start += RUN_BATCH) {
			const groups = run.slice(start, start + RUN_BATCH).map((r) => [r]);
			if (runPolarity === 'dark') image = unionRegions(image, ...groups);
			else if (image.length) image = differenceRegions(image, ...groups);
		}
		run = [];
	};
	for (const item of items) {
		const r = toRegion(item);
		if (!r) continue;
		if (item.polarity !== runPolarity) flush();
		runPolarity = item.polarity;
		run.push(r);
	}
	flush();
	return { regions: image, areaMm2: imageArea(image), bounds: imageBounds(image) };
}

export function imageArea(regions: readonly Region[]): number {
	return regions.reduce((sum, r) => sum + regionArea(r), 0);
}

export function imageBounds(regions: readonly Region[]): Bounds | null {
	if (regions.length === 0) return null;
	let b = emptyBounds;
	for (const r of regions) b = boundsOfPoints([r.outer.start, ...r.outer.segments.map((s) => s.to)], b);
	return b;
}

/** Total length of every ring of the image, mm. */
export function imagePerimeter(regions: readonly Region[]): number {
	let total = 0;
	for (const r of regions) {
		for (const c of [r.outer, ...r.holes]) {
			let from = c.start;
			for (const seg of c.segments) {
				total += Math.hypot(seg.to[0] - from[0], seg.to[1] - from[1]);
				from = seg.to;
			}
		}
	}
	return total;
}

/** Area of the part covered by one image and not the other (the symmetric difference). */
export function differenceArea(a: readonly Region[], b: readonly Region[]): number {
	if (a.length === 0 || b.length === 0) return imageArea(a) + imageArea(b);
	return imageArea(differenceRegions(a, b)) + imageArea(differenceRegions(b, a));
}

export function toFabPolygons(regions: readonly Region[]): FabPolygon[] {
	const ring = (c: Region['outer']) => [c.start, ...c.segments.slice(0, -1).map((s) => s.to)].map(([x, y]) => [x, y] as [number, number]);
	return regions.map((r) => ({ outer: ring(r.outer), holes: r.holes.map(ring) }));
}
