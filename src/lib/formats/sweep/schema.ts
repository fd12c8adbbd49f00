// The sweep document's JSON Schema (draft 2020-12), generated from the zod schemas: an object for ajv and for the route that publishes it.
import { z } from 'zod';
import { designInputSchema } from '../../schemas';
import { sweepPointSchema } from '../../schemas/sweep-point';
import { SWEEP_FORMAT, SWEEP_FORMAT_VERSION, SWEEP_SCHEMA_PATH } from './document';
import { MAX_SWEEP_POINTS, sweepPlanSchema } from './plan';


function jsonSchemaOf(schema: z.ZodType): Record<string, unknown> {
	const out = z.toJSONSchema(schema, { target: 'draft-2020-12', io: 'output', unrepresentable: 'any' }) as Record<string, unknown>;
	delete out.$schema;
	return out;
}

export const sweepJsonSchema = {
	$schema: 'https://json-schema.org/draft/2020-12/schema',
	$id: SWEEP_SCHEMA_PATH,
	title: 'Fringefield sweep document, version 1',
	description: `A base patch-antenna design, a plan of swept fields, and for each point (at most ${MAX_SWEEP_POINTS}) its parameters, derived sizes, every layer's geometry in mm and the stack.`,
	type: 'object',
	required: ['$schema', 'format', 'formatVersion', 'design', 'base', 'plan', 'pointCount', 'points'],
	additionalProperties: false,
	properties: {
		$schema: { type: 'string' },
		format: { const: SWEEP_FORMAT },
		formatVersion: { const: SWEEP_FORMAT_VERSION },
		design: {
			type: 'object',
			required: ['name', 'slug', 'revision', 'revisionDate', 'software'],
			additionalProperties: false,
			properties: {
				name: { type: 'string' },
				slug: { type: 'string', pattern: '^[a-z0-9-]+$' },
				revision: { type: 'string' },
				revisionDate: { type: 'string', pattern: '^\\d{4}-\\d{2}-\\d{2}$' },
				software: { type: 'string' }
			}
		},
		base: { $ref: '#/$defs/designInput' },
		plan: { $ref: '#/$defs/plan' },
		pointCount: { type: 'integer', minimum: 0, maximum: MAX_SWEEP_POINTS },
		points: { type: 'array', maxItems: MAX_SWEEP_POINTS, items: { $ref: '#/$defs/point' } }
	},
	$defs: {
		designInput: jsonSchemaOf(designInputSchema),
		plan: jsonSchemaOf(sweepPlanSchema),
		// generated from the one zod schema of a sweep point (src/lib/schemas/sweep-point.ts), artwork and sized design included
		point: jsonSchemaOf(sweepPointSchema)
	}
} as const;
