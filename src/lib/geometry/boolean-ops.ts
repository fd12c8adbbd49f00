// Polygon boolean operations through polygon-clipping (Martinez–Rueda sweep line), on straight contours.
import polygonClipping, { type MultiPolygon, type Polygon as ClipPolygon } from 'polygon-clipping';
import { createPolygonContour, isPolygonContour, contourVertices, type Contour } from './contour';
import { GeometryError } from './geometry-error';
import type { Point } from './point';
import type { Region } from './region';

function toClip(regions: readonly Region[]): MultiPolygon {
	return regions.map((r) => [r.outer, ...r.holes].map(toRing));
}

function toRing(contour: Contour): [number, number][] {
	if (!isPolygonContour(contour)) {
		throw new GeometryError('arc-in-boolean', 'boolean operations take straight contours only; keep round shapes out of them');
	}
	const pts = contourVertices(contour).map(([x, y]) => [x, y] as [number, number]);
	return [...pts, pts[0]];
}

function fromClip(mp: MultiPolygon): Region[] {
	return mp.map((poly: ClipPolygon) => {
		const [outer, ...holes] = poly.map((ring) => createPolygonContour(ring as unknown as Point[]));
		return { outer, holes };
	});
}

/** Union of straight regions. polygon-clipping returns outer rings counter-clockwise and holes clockwise. */
export function unionRegions(...groups: (readonly Region[])[]): Region[] {
	const [first, ...rest] = groups.map(toClip);
	return fromClip(polygonClipping.union(first, ...rest));
}

/** `subject` minus every region of `clips`. */
export function differenceRegions(subject: readonly Region[], ...clips: (readonly Region[])[]): Region[] {
	return fromClip(polygonClipping.difference(toClip(subject), ...clips.map(toClip)));
}

/** Common part of the groups. */
export function intersectionRegions(...groups: (readonly Region[])[]): Region[] {
	const [first, ...rest] = groups.map(toClip);
	return fromClip(polygonClipping.intersection(first, ...rest));
}
