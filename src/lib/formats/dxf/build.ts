// Artwork → DXF entities: region contours as closed bulged polylines, round things as CIRCLE, drills on their own layers.
import type { Artwork } from '../../artwork';
import { arcSweepRad, type Contour } from '../../geometry';
import type { DxfCommand, DxfVertex } from './commands';

/** DXF layer name of an artwork layer: our ids in capitals ("COPPER-TOP"). */
export const dxfLayerName = (layerId: string) => layerId.toUpperCase();
export const DXF_PLATED_DRILL_LAYER = 'DRILL-PLATED';
export const DXF_NON_PLATED_DRILL_LAYER = 'DRILL-NON-PLATED';

const COLORS: Record<string, number> = { 'copper-top': 1, 'copper-bottom': 5, profile: 7, 'mask-top': 3, 'mask-bottom': 4, 'copper-inner-1': 6 };

/** A contour of two arcs about one centre, each half a turn, is a whole circle. */
function asCircle(c: Contour): { center: readonly [number, number]; radiusMm: number } | null {
	const [a, b] = c.segments;
	if (c.segments.length !== 2 || a.kind !== 'arc' || b.kind !== 'arc') return null;
	if (a.center[0] !== b.center[0] || a.center[1] !== b.center[1] || a.clockwise !== b.clockwise) return null;
	return { center: a.center, radiusMm: Math.hypot(c.start[0] - a.center[0], c.start[1] - a.center[1]) };
}

function vertices(c: Contour): DxfVertex[] {
	const out: DxfVertex[] = [];
	let from = c.start;
	for (const s of c.segments) {
		out.push({ at: from, bulge: s.kind === 'arc' ? Math.tan(arcSweepRad(from, s.to, s.center, s.clockwise) / 4) : 0 });
		from = s.to;
	}
	return out;
}

export function buildDxfCommands(artwork: Artwork): DxfCommand[] {
	const out: DxfCommand[] = [];
	for (const layer of artwork.layers) out.push({ type: 'layer', name: dxfLayerName(layer.id), colorIndex: COLORS[layer.id] ?? 8 });
	const plated = artwork.drills.filter((d) => d.plated);
	const nonPlated = artwork.drills.filter((d) => !d.plated);
	if (plated.length) out.push({ type: 'layer', name: DXF_PLATED_DRILL_LAYER, colorIndex: 6 });
	if (nonPlated.length) out.push({ type: 'layer', name: DXF_NON_PLATED_DRILL_LAYER, colorIndex: 2 });
	for (const layer of artwork.layers) {
		const name = dxfLayerName(layer.id);
		for (const shape of layer.shapes) {
			const g = shape.geometry;
			if (g.kind === 'circle') {
				out.push({ type: 'circle', layer: name, center: g.center, radiusMm: g.diameterMm / 2 });
				continue;
			}
			if (g.kind === 'stroke') {
				// a legend stroke: its centre line, open (DXF draws no pen width)
				out.push({ type: 'polyline', layer: name, vertices: g.points.map((at) => ({ at, bulge: 0 })), closed: false });
				continue;
			}
			const contours = g.kind === 'region' ? [g.region.outer, ...g.region.holes] : [g.contour];
			for (const c of contours) {
				const circle = asCircle(c);
				if (circle) out.push({ type: 'circle', layer: name, center: circle.center, radiusMm: circle.radiusMm });
				else out.push({ type: 'polyline', layer: name, vertices: vertices(c), closed: true });
			}
		}
	}
	for (const d of [...plated, ...nonPlated]) {
		out.push({ type: 'circle', layer: d.plated ? DXF_PLATED_DRILL_LAYER : DXF_NON_PLATED_DRILL_LAYER, center: d.center, radiusMm: d.diameterMm / 2 });
	}
	return out;
}
