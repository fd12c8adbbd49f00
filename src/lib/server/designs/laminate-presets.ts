// Built-in laminates every team sees: material classes with rounded typical values, never one product's datasheet.
import { laminateClassFor, type LaminateClass, type LaminateProperties } from '../../schemas/laminate';

export interface LaminatePreset {
	/** Stable id, prefixed "preset:" so it never collides with a stored laminate's id. */
	id: string;
	name: string;
	properties: LaminateProperties;
	/** The material class the values are typical of: its ranges and the public source they come from. */
	materialClass: LaminateClass;
}

const preset = (id: string, name: string, properties: LaminateProperties): LaminatePreset => ({ id, name, properties, materialClass: laminateClassFor(properties.relativePermittivity) });

/**
 * Rounded typical values inside each class's range (laminateClasses: Pozar, Microwave Engineering
 * 4th ed., App. G; IPC-4101 / IPC-4103; from memory). Exact values belong in a laminate a team adds
 * from its own supplier's sheet.
 */
export const laminatePresets: readonly LaminatePreset[] = [
	preset('preset:glass-epoxy-1.6', 'Glass-epoxy (FR-4 class) 1.6 mm', { relativePermittivity: 4.4, lossTangent: 0.02, heightMm: 1.6, copperThicknessUm: 35, relativePermittivityTolerance: 0.2, heightToleranceMm: 0.16 }),
	preset('preset:glass-epoxy-0.8', 'Glass-epoxy (FR-4 class) 0.8 mm', { relativePermittivity: 4.4, lossTangent: 0.02, heightMm: 0.8, copperThicknessUm: 35, relativePermittivityTolerance: 0.2, heightToleranceMm: 0.08 }),
	preset('preset:ptfe-glass-0.787', 'PTFE-glass 0.787 mm', { relativePermittivity: 2.2, lossTangent: 0.001, heightMm: 0.787, copperThicknessUm: 35, relativePermittivityTolerance: 0.05, heightToleranceMm: 0.03 }),
	preset('preset:ptfe-glass-1.575', 'PTFE-glass 1.575 mm', { relativePermittivity: 2.2, lossTangent: 0.001, heightMm: 1.575, copperThicknessUm: 35, relativePermittivityTolerance: 0.05, heightToleranceMm: 0.05 }),
	preset('preset:ceramic-hydrocarbon-0.508', 'Ceramic-filled hydrocarbon 0.508 mm', { relativePermittivity: 3.5, lossTangent: 0.003, heightMm: 0.508, copperThicknessUm: 35, relativePermittivityTolerance: 0.05, heightToleranceMm: 0.04 }),
	preset('preset:ceramic-ptfe-1.27', 'Ceramic-filled PTFE, high εr 1.27 mm', { relativePermittivity: 10, lossTangent: 0.003, heightMm: 1.27, copperThicknessUm: 17, relativePermittivityTolerance: 0.25, heightToleranceMm: 0.05 })
];
