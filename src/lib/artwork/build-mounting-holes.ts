// The user's mounting holes: non-plated drills, a copper pull-back around each in every plane, mask openings over them.
import { GeometryError } from '../geometry';
import type { SizedDesign } from '../rf/sized-design';
import type { Artwork, ArtworkDrill, ArtworkLayer, ArtworkShape } from './types';

/**
 * Copper kept back from a non-plated hole's wall on every plane it passes: common practice, no source (the drill
 * must not tear or burr the plane, and a screw head or washer should not touch it unless meant to).
 */
export const MOUNTING_HOLE_COPPER_PULLBACK_MM = 0.5;
/** Mask opening beyond a non-plated hole's wall: common practice, no source (keeps mask out of the hole). */
export const MOUNTING_HOLE_MASK_MARGIN_MM = 0.1;
/**
 * Least distance from a mounting hole's wall to the patch, in substrate heights h: the fringing field at a
 * radiating edge reaches out a few h and a metal screw or standoff there detunes the patch. Five h is common
 * practice, no source; the design-rule check "hole-keep-out" holds the holes to it.
 */
export const MOUNTING_HOLE_KEEP_OUT_HEIGHTS = 5;

/** The keep-out distance for a design: MOUNTING_HOLE_KEEP_OUT_HEIGHTS × the dielectric under the top copper. */
export function mountingHoleKeepOutMm(artwork: Pick<Artwork, 'stack'>): number {
	const firstDielectric = artwork.stack.find((l) => l.kind === 'dielectric');
	return MOUNTING_HOLE_KEEP_OUT_HEIGHTS * (firstDielectric?.thicknessMm ?? 0);
}

/** The artwork with the document's mounting holes added; unchanged (the same object) when it has none. */
export function withMountingHoles(artwork: Artwork, sized: SizedDesign): Artwork {
	const holes = sized.input.mountingHoles ?? [];
	if (holes.length === 0) return artwork;
	const { widthMm, lengthMm } = artwork.board;
	const drills: ArtworkDrill[] = holes.map((h, i) => {
		const r = h.diameterMm / 2;
		if (h.xMm - r < 0 || h.yMm - r < 0 || h.xMm + r > widthMm || h.yMm + r > lengthMm) {
			throw new GeometryError(
				'mounting-hole-outside-board',
				`mountingHoles.${i} (⌀ ${h.diameterMm} mm at ${h.xMm}, ${h.yMm} mm) must lie inside the ${widthMm.toFixed(3)} × ${lengthMm.toFixed(3)} mm board`
			);
		}
		return { id: `mounting-hole-${i + 1}`, role: 'mounting', plated: false, center: [h.xMm, h.yMm], diameterMm: h.diameterMm, fromCopper: 1, toCopper: artwork.metadata.copperLayerCount };
	});
	const around = (d: ArtworkDrill, margin: number, idPrefix: string, role: ArtworkShape['role'], polarity: ArtworkShape['polarity']): ArtworkShape => ({
		id: `${idPrefix}-${d.id}`,
		role,
		polarity,
		geometry: { kind: 'circle', center: d.center, diameterMm: d.diameterMm + 2 * margin }
	});
	const layers = artwork.layers.map((layer): ArtworkLayer => {
		const f = layer.function;
		if (f.kind === 'copper' && layer.shapes.some((s) => s.role === 'ground' && s.polarity === 'dark')) {
			return { ...layer, shapes: [...layer.shapes, ...drills.map((d) => around(d, MOUNTING_HOLE_COPPER_PULLBACK_MM, `${layer.id}-clearance`, 'clearance', 'clear'))] };
		}
		if (f.kind === 'solder-mask') return { ...layer, shapes: [...layer.shapes, ...drills.map((d) => around(d, MOUNTING_HOLE_MASK_MARGIN_MM, `mask-${f.side}`, 'mask-opening', 'dark'))] };
		return layer;
	});
	return { ...artwork, layers, drills: [...artwork.drills, ...drills], metadata: { ...artwork.metadata, mountingHoleKeepOutMm: mountingHoleKeepOutMm(artwork) } };
}
