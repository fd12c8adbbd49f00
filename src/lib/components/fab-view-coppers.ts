// Every copper of the stack as the fab view draws it: the read-back image of each copper file, named after its artwork layer.
import type { Artwork } from '$lib/artwork';
import { layerKeyOf, type FabPolygon, type FabView } from '$lib/formats/readback';

/** How a copper is drawn: the top copper solid, a ground plane hatched underneath, any other copper outlined over both. */
export type FabCopperLook = 'top' | 'ground' | 'other';

export interface FabViewCopper {
	/** The physical layer: "copper-L1" … "copper-Ln" (the Gerber file function's layer number). */
	readonly key: string;
	readonly copperIndex: number;
	/** "L2 Inner copper (layer 2) (ground)": the layer number and the artwork layer's own title. */
	readonly name: string;
	readonly look: FabCopperLook;
	/** The Gerber file it was read from; null when no file images it (a read-back mismatch says so). */
	readonly fileName: string | null;
	readonly areaMm2: number;
	readonly polygons: readonly FabPolygon[];
}

const copperIndexOf = (key: string): number => Number(/^copper-L(\d+)$/.exec(key)?.[1] ?? NaN);

/**
 * The coppers in drawing order: ground planes first (underneath), then the top copper, then every other copper (a buried
 * or bottom feed, a driven patch under a parasitic one) from the bottom up, drawn last as outlines so that what lies
 * under the top copper still shows. Copper files that match no artwork layer are kept, named by number.
 */
export function fabViewCoppers(artwork: Artwork, view: FabView): FabViewCopper[] {
	const coppers: FabViewCopper[] = [];
	const seen = new Set<string>();
	for (const layer of artwork.layers) {
		if (layer.function.kind !== 'copper') continue;
		const key = layerKeyOf(layer.function);
		const image = view.layers.find((l) => l.key === key);
		const index = layer.function.copperIndex;
		const look: FabCopperLook = layer.shapes.some((s) => s.role === 'ground') ? 'ground' : index === 1 ? 'top' : 'other';
		coppers.push({ key, copperIndex: index, name: `L${index} ${layer.title}`, look, fileName: image?.fileName ?? null, areaMm2: image?.areaMm2 ?? 0, polygons: image?.polygons ?? [] });
		seen.add(key);
	}
	for (const image of view.layers) {
		const index = copperIndexOf(image.key);
		if (Number.isNaN(index) || seen.has(image.key)) continue;
		coppers.push({ key: image.key, copperIndex: index, name: `L${index} copper (not in the design)`, look: index === 1 ? 'top' : 'other', fileName: image.fileName, areaMm2: image.areaMm2, polygons: image.polygons });
	}
	const rank = (c: FabViewCopper) => ({ ground: 0, top: 1, other: 2 })[c.look];
	return coppers.sort((a, b) => rank(a) - rank(b) || b.copperIndex - a.copperIndex);
}
