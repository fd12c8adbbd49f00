// The sweep document's JSON Schema (draft 2020-12): an object for ajv and for the route that publishes it.
import { z } from 'zod';
import { designInputSchema } from '../../schemas';
import { SWEEP_FORMAT, SWEEP_FORMAT_VERSION, SWEEP_SCHEMA_PATH } from './document';
import { MAX_SWEEP_POINTS, sweepPlanSchema, sweepableFields } from './plan';

const point = { type: 'array', prefixItems: [{ type: 'number' }, { type: 'number' }], items: false, minItems: 2, description: '[x, y] in mm, board origin at its lower-left corner' };
const num = { type: 'number' };
const mm = { type: 'number', minimum: 0 };

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
		parameters: { type: 'object', propertyNames: { enum: [...sweepableFields] }, additionalProperties: num },
		point: {
			oneOf: [
				{
					type: 'object',
					required: ['index', 'status', 'parameters', 'derived', 'warnings', 'board', 'layers', 'drills', 'stack'],
					additionalProperties: false,
					properties: {
						index: { type: 'integer', minimum: 0 },
						status: { const: 'sized' },
						parameters: { $ref: '#/$defs/parameters' },
						derived: { $ref: '#/$defs/derived' },
						warnings: { type: 'array', items: { type: 'object', required: ['code', 'message'], properties: { code: { type: 'string' }, message: { type: 'string' } } } },
						board: { type: 'object', required: ['widthMm', 'lengthMm'], additionalProperties: false, properties: { widthMm: mm, lengthMm: mm } },
						layers: { type: 'array', minItems: 1, items: { $ref: '#/$defs/layer' } },
						drills: { type: 'array', items: { $ref: '#/$defs/drill' } },
						stack: {
							type: 'array',
							minItems: 1,
							description: 'Every copper and dielectric layer in order, bottom up: the first entry is the bottom copper at zMm 0 (zMm is each slab\'s bottom face, measured up from the bottom copper\'s lower face) and zMm increases along the list to the top copper; each slab starts where the one before it ends. A probe entry, when the design states a probe model, comes last.',
							items: { $ref: '#/$defs/stackLayer' }
						}
					}
				},
				{
					type: 'object',
					required: ['index', 'status', 'parameters', 'error'],
					additionalProperties: false,
					properties: {
						index: { type: 'integer', minimum: 0 },
						status: { const: 'refused' },
						parameters: { $ref: '#/$defs/parameters' },
						error: {
							type: 'object',
							required: ['kind', 'path', 'message'],
							additionalProperties: false,
							properties: { kind: { enum: ['input', 'geometry'] }, path: { type: 'string' }, message: { type: 'string' } }
						}
					}
				}
			]
		},
		derived: {
			type: 'object',
			description: 'What sizing derived (every SizedDesign field but the input and warnings); new fields may appear.',
			required: ['shape', 'feedKind', 'frequencyHz', 'freeSpaceWavelengthMm', 'effectivePermittivity', 'patch', 'feed', 'ground', 'estimates'],
			properties: {
				shape: { type: 'string' },
				feedKind: { type: 'string' },
				frequencyHz: { type: 'number', exclusiveMinimum: 0 },
				freeSpaceWavelengthMm: { type: 'number', exclusiveMinimum: 0 },
				effectivePermittivity: { type: 'number', minimum: 1 },
				patch: { type: 'object', required: ['kind'], properties: { kind: { enum: ['rectangular', 'circular', 'truncated-corner', 'nearly-square'] } } },
				feed: { type: 'object', required: ['kind'], properties: { kind: { enum: ['edge', 'inset', 'quarter-wave', 'probe', 'aperture-coupled', 'proximity-coupled'] } } },
				ground: { type: 'object', required: ['widthMm', 'lengthMm', 'marginMm'], properties: { widthMm: mm, lengthMm: mm, marginMm: mm } },
				estimates: { type: 'object', additionalProperties: num }
			}
		},
		segment: {
			oneOf: [
				{ type: 'object', required: ['kind', 'to'], additionalProperties: false, properties: { kind: { const: 'line' }, to: point } },
				{
					type: 'object',
					required: ['kind', 'to', 'center', 'clockwise'],
					additionalProperties: false,
					properties: { kind: { const: 'arc' }, to: point, center: point, clockwise: { type: 'boolean' } }
				}
			]
		},
		contour: {
			type: 'object',
			description: 'Closed: the last segment ends at start. Outer contours counter-clockwise, holes clockwise.',
			required: ['start', 'segments'],
			additionalProperties: false,
			properties: { start: point, segments: { type: 'array', minItems: 2, items: { $ref: '#/$defs/segment' } } }
		},
		shape: {
			type: 'object',
			required: ['id', 'role', 'polarity', 'geometry'],
			additionalProperties: false,
			properties: {
				id: { type: 'string' },
				role: {
					enum: ['patch', 'feed-line', 'transformer', 'notch', 'probe-pad', 'ground', 'clearance', 'profile', 'mask-opening', 'parasitic-patch', 'coupling-slot', 'tuning-stub', 'feed-network', 'network-transformer']
				},
				polarity: { enum: ['dark', 'clear'] },
				geometry: {
					oneOf: [
						{
							type: 'object',
							required: ['kind', 'region'],
							additionalProperties: false,
							properties: {
								kind: { const: 'region' },
								region: {
									type: 'object',
									required: ['outer', 'holes'],
									additionalProperties: false,
									properties: { outer: { $ref: '#/$defs/contour' }, holes: { type: 'array', items: { $ref: '#/$defs/contour' } } }
								}
							}
						},
						{ type: 'object', required: ['kind', 'center', 'diameterMm'], additionalProperties: false, properties: { kind: { const: 'circle' }, center: point, diameterMm: { type: 'number', exclusiveMinimum: 0 } } },
						{
							type: 'object',
							required: ['kind', 'contour', 'strokeWidthMm'],
							additionalProperties: false,
							properties: { kind: { const: 'outline' }, contour: { $ref: '#/$defs/contour' }, strokeWidthMm: { type: 'number', exclusiveMinimum: 0 } }
						}
					]
				}
			}
		},
		layer: {
			type: 'object',
			required: ['id', 'title', 'function', 'shapes', 'voids'],
			additionalProperties: false,
			properties: {
				id: { type: 'string' },
				title: { type: 'string' },
				function: {
					type: 'object',
					required: ['kind'],
					properties: { kind: { enum: ['copper', 'profile', 'solder-mask'] }, copperIndex: { type: 'integer', minimum: 1 }, side: { enum: ['top', 'inner', 'bottom'] } }
				},
				shapes: { type: 'array', items: { $ref: '#/$defs/shape' } },
				voids: { type: 'array', items: { $ref: '#/$defs/shape' } }
			}
		},
		drill: {
			type: 'object',
			required: ['id', 'role', 'plated', 'center', 'diameterMm', 'fromCopper', 'toCopper'],
			additionalProperties: false,
			properties: {
				id: { type: 'string' },
				role: { const: 'probe' },
				plated: { type: 'boolean' },
				center: point,
				diameterMm: { type: 'number', exclusiveMinimum: 0 },
				fromCopper: { type: 'integer', minimum: 1 },
				toCopper: { type: 'integer', minimum: 1 }
			}
		},
		stackLayer: {
			oneOf: [
				{
					type: 'object',
					required: ['kind', 'id', 'layerId', 'zMm', 'thicknessMm', 'conductivitySPerM'],
					additionalProperties: false,
					properties: { kind: { const: 'copper' }, id: { type: 'string' }, layerId: { type: 'string' }, zMm: mm, thicknessMm: { type: 'number', exclusiveMinimum: 0 }, conductivitySPerM: { type: 'number', exclusiveMinimum: 0 } }
				},
				{
					type: 'object',
					required: ['kind', 'id', 'zMm', 'thicknessMm', 'relativePermittivity', 'lossTangent'],
					additionalProperties: false,
					properties: {
						kind: { const: 'dielectric' },
						id: { type: 'string' },
						zMm: mm,
						thicknessMm: { type: 'number', exclusiveMinimum: 0 },
						relativePermittivity: { type: 'number', minimum: 1 },
						lossTangent: { type: 'number', minimum: 0 },
						bonding: { type: 'boolean', description: 'true for a bonding film (prepreg) between cores' }
					}
				},
				{
					type: 'object',
					description: 'Not a slab: what conducts in the probe hole, listed last when the design states a probe model. It spans the stack from zMm over thicknessMm; a plated barrel is a copper tube of inside diameter drillDiameterMm and wall platingThicknessUm, a solid pin fills the hole.',
					required: ['kind', 'id', 'model', 'center', 'drillDiameterMm', 'platingThicknessUm', 'zMm', 'thicknessMm'],
					additionalProperties: false,
					properties: {
						kind: { const: 'probe' },
						id: { type: 'string' },
						model: { enum: ['solid-pin', 'plated-barrel'] },
						center: point,
						drillDiameterMm: { type: 'number', exclusiveMinimum: 0 },
						platingThicknessUm: { type: ['number', 'null'], exclusiveMinimum: 0 },
						zMm: mm,
						thicknessMm: { type: 'number', exclusiveMinimum: 0 }
					}
				}
			]
		}
	}
} as const;
