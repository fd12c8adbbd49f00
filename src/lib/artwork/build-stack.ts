// The stack a solver extrudes: copper, dielectric, copper, with z measured up from the bottom copper's lower face.
import type { SizedDesign } from '../rf/sized-design';
import type { StackLayer } from './types';

export function buildStack(sized: SizedDesign): StackLayer[] {
	const t = sized.copperThicknessMm;
	const { heightMm, relativePermittivity, lossTangent, copperConductivitySPerM } = sized.input.substrate;
	return [
		{ kind: 'copper', id: 'copper-top', layerId: 'copper-top', zMm: t + heightMm, thicknessMm: t, conductivitySPerM: copperConductivitySPerM },
		{ kind: 'dielectric', id: 'substrate', zMm: t, thicknessMm: heightMm, relativePermittivity, lossTangent },
		{ kind: 'copper', id: 'copper-bottom', layerId: 'copper-bottom', zMm: 0, thicknessMm: t, conductivitySPerM: copperConductivitySPerM }
	];
}
