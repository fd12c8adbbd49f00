// Built-in laminates every team sees: named by material class only, typical values.
import type { LaminateProperties } from '../../schemas/laminate';

export interface LaminatePreset {
	/** Stable id, prefixed "preset:" so it never collides with a stored laminate's id. */
	id: string;
	name: string;
	properties: LaminateProperties;
}

/**
 * Typical values for each material class (common practice, no source; εr and tanδ from memory of
 * typical datasheet values at 1–10 GHz). Check your own laminate's datasheet before ordering.
 */
export const laminatePresets: readonly LaminatePreset[] = [
	{
		id: 'preset:glass-epoxy-1.6',
		name: 'Glass-epoxy (FR-4 class) 1.6 mm',
		properties: { relativePermittivity: 4.4, lossTangent: 0.02, heightMm: 1.6, copperThicknessUm: 35, relativePermittivityTolerance: 0.2, heightToleranceMm: 0.16 }
	},
	{
		id: 'preset:glass-epoxy-0.8',
		name: 'Glass-epoxy (FR-4 class) 0.8 mm',
		properties: { relativePermittivity: 4.3, lossTangent: 0.02, heightMm: 0.8, copperThicknessUm: 35, relativePermittivityTolerance: 0.2, heightToleranceMm: 0.08 }
	},
	{
		id: 'preset:ptfe-glass-0.787',
		name: 'PTFE-glass 0.787 mm',
		properties: { relativePermittivity: 2.2, lossTangent: 0.0009, heightMm: 0.787, copperThicknessUm: 35, relativePermittivityTolerance: 0.02, heightToleranceMm: 0.025 }
	},
	{
		id: 'preset:ptfe-glass-1.575',
		name: 'PTFE-glass 1.575 mm',
		properties: { relativePermittivity: 2.2, lossTangent: 0.0009, heightMm: 1.575, copperThicknessUm: 35, relativePermittivityTolerance: 0.02, heightToleranceMm: 0.05 }
	},
	{
		id: 'preset:ceramic-hydrocarbon-0.508',
		name: 'Ceramic-filled hydrocarbon 0.508 mm',
		properties: { relativePermittivity: 3.48, lossTangent: 0.0037, heightMm: 0.508, copperThicknessUm: 35, relativePermittivityTolerance: 0.05, heightToleranceMm: 0.038 }
	},
	{
		id: 'preset:ceramic-ptfe-1.27',
		name: 'Ceramic-filled PTFE, high εr 1.27 mm',
		properties: { relativePermittivity: 10.2, lossTangent: 0.0023, heightMm: 1.27, copperThicknessUm: 17, relativePermittivityTolerance: 0.25, heightToleranceMm: 0.05 }
	}
];
