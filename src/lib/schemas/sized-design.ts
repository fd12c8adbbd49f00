// The sized design as one zod schema: what the API answers, what a revision stores in PostgreSQL (parsed through it on
// the way out), and the `derived` part of every sweep point. Open at the leaves: later sizing models add fields, and
// a stored revision keeps every field it was saved with.
import { z } from 'zod';
import { allFeedKinds, documentedDesignInputSchema, patchShapes } from './design-input';

export const sizingWarningSchema = z.object({ code: z.string(), message: z.string() }).meta({ description: 'A sizing caution: a stable code and one sentence' });

/** Every SizedDesign field but the input and the warnings: what sizing derived, numbers with their unit in their names. */
export const sizedDerivedSchema = z.looseObject({
	shape: z.enum(patchShapes),
	feedKind: z.enum(allFeedKinds),
	frequencyHz: z.number().positive(),
	freeSpaceWavelengthMm: z.number().positive(),
	effectivePermittivity: z.number().min(1),
	patch: z.looseObject({ kind: z.enum(patchShapes) }),
	feed: z.looseObject({ kind: z.enum(allFeedKinds) }),
	ground: z.looseObject({ widthMm: z.number().min(0), lengthMm: z.number().min(0), marginMm: z.number().min(0) }),
	estimates: z.object({ bandwidthFraction: z.number(), gainDbi: z.number() }).catchall(z.number()).meta({ description: 'Bandwidth, efficiency, gain and the rest: numbers, units in their keys' })
});

export const sizedDesignSchema = sizedDerivedSchema
	.extend({
		input: documentedDesignInputSchema,
		warnings: z.array(sizingWarningSchema)
	})
	.meta({ id: 'SizedDesign', description: 'Every derived quantity with its unit in its name (mm, Hz, Ω, S), and the sizing warnings' });
