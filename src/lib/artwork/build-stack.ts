// The stack a solver extrudes: copper, dielectric, copper, with z measured up from the bottom copper's lower face.
import type { SizedDesign } from '../rf/sized-design';
import { laminateClassFor } from '../schemas';
import type { StackLayer } from './types';

export function buildStack(sized: SizedDesign): StackLayer[] {
	const t = sized.copperThicknessMm;
	const { heightMm, relativePermittivity, lossTangent, copperConductivitySPerM } = sized.input.substrate;
	return [
		{ kind: 'copper', id: 'copper-top', layerId: 'copper-top', zMm: t + heightMm, thicknessMm: t, conductivitySPerM: copperConductivitySPerM },
		{ kind: 'dielectric', id: 'substrate', zMm: t, thicknessMm: heightMm, relativePermittivity, lossTangent: lossTangent ?? laminateClassFor(relativePermittivity).typicalLossTangent },
		{ kind: 'copper', id: 'copper-bottom', layerId: 'copper-bottom', zMm: 0, thicknessMm: t, conductivitySPerM: copperConductivitySPerM }
	];
}

/** Copper layer ids for a stack of `copperCount` coppers, top to bottom. */
export function copperLayerIds(copperCount: number): string[] {
	if (copperCount === 2) return ['copper-top', 'copper-bottom'];
	return ['copper-top', ...Array.from({ length: copperCount - 2 }, (_, i) => `copper-inner-${i + 1}`), 'copper-bottom'];
}

/** The stack from the resolved layer stack of the document (top to bottom), z accumulated from the bottom copper's lower face. */
export function buildLayeredStack(sized: SizedDesign): StackLayer[] {
	const entries = sized.layerStack;
	if (!entries) return buildStack(sized);
	const ids = copperLayerIds(entries.filter((e) => e.kind === 'copper').length);
	// z accumulated from the bottom up, so the bottom copper sits exactly at 0 and each slab starts where the one below ends
	const zs: number[] = new Array(entries.length);
	let z = 0;
	for (let i = entries.length - 1; i >= 0; i--) {
		zs[i] = z;
		const e = entries[i];
		z += e.kind === 'copper' ? e.thicknessMm : e.heightMm;
	}
	let copper = 0, dielectric = 0;
	return entries.map((e, i): StackLayer => {
		const zMm = zs[i];
		if (e.kind === 'copper') {
			const layerId = ids[copper++];
			return { kind: 'copper', id: layerId, layerId, zMm, thicknessMm: e.thicknessMm, conductivitySPerM: e.conductivitySPerM };
		}
		dielectric++;
		const layer = { kind: 'dielectric' as const, id: `dielectric-${dielectric}`, zMm, thicknessMm: e.heightMm, relativePermittivity: e.relativePermittivity, lossTangent: e.lossTangent };
		return e.bonding ? { ...layer, bonding: true } : layer;
	});
}
