// A laminate in a team's library: the substrate values a design copies, validated like the design's own substrate.
import { z } from 'zod';
import { substrateSchema } from './design-input';
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
