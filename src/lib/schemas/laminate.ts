// A laminate in a team's library: the substrate values a design copies, validated like the design's own substrate.
import { z } from 'zod';
import { substrateSchema, type DesignInput, type OrderedLaminate } from './design-input';
import { plainText } from './plain-text';

const s = substrateSchema.shape;

/**
 * The stored properties of one laminate (jsonb `laminate.properties`). The keys are the design
 * input's substrate keys, so choosing a laminate copies them one to one; each bound and message
 * is the substrate schema's own.
 */
export const laminatePropertiesSchema = z.strictObject({
	/** Relative permittivity εr at the datasheet's test frequency. */
	relativePermittivity: s.relativePermittivity,
	/** Dielectric loss tangent tanδ. */
	lossTangent: s.lossTangent.unwrap(),
	/** Dielectric thickness h. */
	heightMm: s.heightMm,
	/** Finished copper thickness in µm (35 µm ≈ 1 oz/ft²). */
	copperThicknessUm: s.copperThicknessUm.unwrap(),
	/** ± tolerance on εr. */
	relativePermittivityTolerance: s.relativePermittivityTolerance.unwrap(),
	/** ± tolerance on h. */
	heightToleranceMm: s.heightToleranceMm.unwrap()
});

/** What the "add laminate" form and the API take. */
export const laminateInputSchema = z.strictObject({
	name: z.string().trim().min(1, { error: 'must not be empty' }).max(80, { error: 'at most 80 characters' }).superRefine(plainText('name')),
	properties: laminatePropertiesSchema
});

export type LaminateProperties = z.output<typeof laminatePropertiesSchema>;
export type LaminateInput = z.output<typeof laminateInputSchema>;

/**
 * A class of laminate material: rounded typical ranges, not any one product's datasheet. Exact values
 * belong in a laminate a team adds from its own supplier's sheet.
 */
export interface LaminateClass {
	name: string;
	/** εr values the class spans (the upper bound is exclusive when classes meet). */
	relativePermittivityRange: readonly [number, number];
	/** Typical tanδ range at 1–10 GHz. */
	lossTangentRange: readonly [number, number];
	/** The value assumed when a document gives no tanδ, and the one the built-in presets carry. */
	typicalLossTangent: number;
	/** Where the ranges come from. */
	source: string;
}

/**
 * Material classes by εr, with typical tanδ (Pozar, Microwave Engineering 4th ed., Appendix G, and
 * IPC-4101 / IPC-4103 base-material classes; from memory, rounded).
 */
export const laminateClasses: readonly LaminateClass[] = [
	{ name: 'PTFE-glass class', relativePermittivityRange: [1, 2.7], lossTangentRange: [0.0005, 0.002], typicalLossTangent: 0.001, source: 'Pozar, Microwave Engineering 4th ed., App. G; IPC-4103 (from memory)' },
	{ name: 'ceramic-filled hydrocarbon or PTFE class', relativePermittivityRange: [2.7, 3.8], lossTangentRange: [0.001, 0.005], typicalLossTangent: 0.003, source: 'IPC-4103 (from memory)' },
	{ name: 'glass-epoxy (FR-4) class', relativePermittivityRange: [3.8, 5], lossTangentRange: [0.015, 0.025], typicalLossTangent: 0.02, source: 'Pozar, Microwave Engineering 4th ed., App. G; IPC-4101 (from memory)' },
	{ name: 'high-εr ceramic-filled class', relativePermittivityRange: [5, 30], lossTangentRange: [0.001, 0.004], typicalLossTangent: 0.003, source: 'IPC-4103 (from memory)' }
];

/** The material class an εr falls in (the first whose range holds it; [lo, hi) except the last). */
export function laminateClassFor(relativePermittivity: number): LaminateClass {
	return laminateClasses.find((c) => relativePermittivity >= c.relativePermittivityRange[0] && relativePermittivity < c.relativePermittivityRange[1]) ?? laminateClasses[laminateClasses.length - 1];
}

/**
 * The laminate the design is built on: the one it records, or else its substrate's stated values with no
 * product named (a retune keeps this while its substrate carries the fitted εr).
 */
export function orderedLaminateOf(design: DesignInput): OrderedLaminate {
	if (design.laminate) return design.laminate;
	const s = design.substrate;
	return {
		relativePermittivity: s.relativePermittivity,
		...(s.relativePermittivityTolerance > 0 ? { relativePermittivityTolerance: s.relativePermittivityTolerance } : {}),
		...(s.lossTangent !== undefined ? { lossTangent: s.lossTangent } : {})
	};
}
