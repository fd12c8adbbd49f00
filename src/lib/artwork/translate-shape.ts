// A shape moved by an offset and renamed: how array elements and layered parts are placed on the board.
import { translateContour, translatePoint, translateRegion } from '../geometry';
import type { ArtworkShape } from './types';

export function translateShape(shape: ArtworkShape, dxMm: number, dyMm: number, id = shape.id): ArtworkShape {
	const g = shape.geometry;
	const geometry: ArtworkShape['geometry'] =
		g.kind === 'region'
			? { kind: 'region', region: translateRegion(g.region, dxMm, dyMm) }
			: g.kind === 'circle'
				? { kind: 'circle', center: translatePoint(g.center, dxMm, dyMm), diameterMm: g.diameterMm }
				: g.kind === 'outline'
					? { kind: 'outline', contour: translateContour(g.contour, dxMm, dyMm), strokeWidthMm: g.strokeWidthMm }
					: { kind: 'stroke', points: g.points.map((p) => translatePoint(p, dxMm, dyMm)), strokeWidthMm: g.strokeWidthMm };
	return { ...shape, id, geometry };
}
