// The artwork's own layers as image items and fab layer keys, flattened the same way the read-back is.
import { CHORD_TOLERANCE_MM, createCircleContour, flattenContour, contourBounds, type Bounds } from '../../geometry';
import type { ArtworkLayer, LayerFunction } from '../../artwork';
import type { FabLayerKey, FabStroke } from './fab-view';
import type { ImageItem } from './image-item';
import { strokeItems } from './read-gerber';

/** The key of the physical layer a layer function images (shared with the file-function reading). */
export function layerKeyOf(fn: LayerFunction): FabLayerKey {
	switch (fn.kind) {
		case 'copper':
			return `copper-L${fn.copperIndex}`;
		case 'profile':
			return 'profile';
		case 'solder-mask':
			return `mask-${fn.side}`;
		case 'legend':
			return `legend-${fn.side}`;
	}
}

/** Gerber %TF.FileFunction values → key (Gerber spec §5.6.3): Copper,L1,Top / Profile,NP / Soldermask,Top. */
export function layerKeyOfFileFunction(values: readonly string[]): FabLayerKey | null {
	const [kind, a, b] = values;
	if (kind === 'Copper' && /^L\d+$/.test(a ?? '')) return `copper-${a}`;
	if (kind === 'Profile') return 'profile';
	if (kind === 'Soldermask' && (a === 'Top' || a === 'Bot')) return a === 'Top' ? 'mask-top' : 'mask-bottom';
	if (kind === 'Legend' && (a === 'Top' || a === 'Bot')) return a === 'Top' ? 'legend-top' : 'legend-bottom';
	void b;
	return null;
}

/** Filled shapes of a layer in drawing order, legend strokes as the ink of their round pen; outlines are not filled and are left out. */
export function artworkImageItems(layer: ArtworkLayer): ImageItem[] {
	const items: ImageItem[] = [];
	for (const s of layer.shapes) {
		const g = s.geometry;
		if (g.kind === 'circle') items.push({ polarity: s.polarity, rings: [flattenContour(createCircleContour(g.center, g.diameterMm / 2), CHORD_TOLERANCE_MM)] });
		else if (g.kind === 'stroke') for (const item of strokeItems(g.points, g.strokeWidthMm, s.polarity)) items.push(item);
		else if (g.kind === 'region') items.push({ polarity: s.polarity, rings: [g.region.outer, ...g.region.holes].map((c) => flattenContour(c, CHORD_TOLERANCE_MM)) });
	}
	return items;
}

/** A layer's pen strokes in drawing order (a legend's lettering and marks). */
export function artworkStrokes(layer: ArtworkLayer): FabStroke[] {
	return layer.shapes.flatMap((s) => (s.geometry.kind === 'stroke' ? [{ points: s.geometry.points.map(([x, y]): [number, number] => [x, y]), widthMm: s.geometry.strokeWidthMm, polarity: s.polarity }] : []));
}

/** Extents of a layer's outlines' centre lines (the profile), exact on arcs. */
export function artworkOutlineBounds(layer: ArtworkLayer): Bounds | null {
	const outlines = layer.shapes.flatMap((s) => (s.geometry.kind === 'outline' ? [s.geometry.contour] : []));
	if (outlines.length === 0) return null;
	return outlines.map(contourBounds).reduce((a, b) => ({
		minXMm: Math.min(a.minXMm, b.minXMm),
		minYMm: Math.min(a.minYMm, b.minYMm),
		maxXMm: Math.max(a.maxXMm, b.maxXMm),
		maxYMm: Math.max(a.maxYMm, b.maxYMm)
	}));
}
