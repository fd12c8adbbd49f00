// The sweep document's JSON Schemas (draft 2020-12): version 2 generated from the zod schemas, version 1 as published
// (frozen, so the documents written before version 2 keep validating). Plain objects for ajv and the routes.
import { z } from 'zod';
import { designInputOutline } from '../../schemas';
import { sweepPointSchema } from '../../schemas/sweep-point';
import { SWEEP_FORMAT, SWEEP_FORMAT_VERSION, SWEEP_SCHEMA_PATH } from './document';
import { MAX_SWEEP_POINTS, sweepPlanSchema } from './plan';
import sweepV1Schema from './sweep-v1.schema.json' with { type: 'json' };

function jsonSchemaOf(schema: z.ZodType, io: 'input' | 'output' = 'output'): Record<string, unknown> {
	const out = z.toJSONSchema(schema, { target: 'draft-2020-12', io, unrepresentable: 'any' }) as Record<string, unknown>;
	delete out.$schema;
	return out;
}

/** The version-1 schema exactly as /schemas/sweep-v1.json published it before version 2. */
export const sweepJsonSchemaV1: Record<string, unknown> = sweepV1Schema;

export const sweepJsonSchema = {
	$schema: 'https://json-schema.org/draft/2020-12/schema',
	$id: SWEEP_SCHEMA_PATH,
	title: 'Fringefield sweep document, version 2',
	description: `A base patch-antenna design (only the fields that apply to it), a plan of swept fields, and for each point (at most ${MAX_SWEEP_POINTS}) its parameters, derived sizes, every layer's geometry in mm, the stack with each copper's thickness and conductivity, and the solver set-up: ports, frequency window, the frequency the materials hold at, and the dielectric outline.`,
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
		// the input side: a field left out (one that does not apply to the design) is allowed
		designInput: jsonSchemaOf(designInputOutline, 'input'),
		plan: jsonSchemaOf(sweepPlanSchema),
		// generated from the one zod schema of a sweep point (src/lib/schemas/sweep-point.ts), artwork and sized design included
		point: jsonSchemaOf(sweepPointSchema)
	}
} as const;
