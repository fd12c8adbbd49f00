// The OpenAPI 3.1 document of /api/v1, generated from the same zod schemas the routes parse with.
import { OpenAPIRegistry, OpenApiGeneratorV31 } from '@asteasolutions/zod-to-openapi';
import { z } from 'zod';
import {
	createDesignBodySchema,
	designInputDocumentSchema,
	createRevisionBodySchema,
	designDetailSchema,
	designListSchema,
	designParamsSchema,
	exportLogQuerySchema,
	exportLogSchema,
	exportParamsSchema,
	fieldCheckListSchema,
	fieldCheckParamsSchema,
	fieldCheckStatusSchema,
	problemSchema,
	revisionDetailSchema,
	revisionParamsSchema,
	sizedDesignSchema,
	startFieldCheckBodySchema,
	sweepPlanParamsSchema,
	teamListSchema,
	teamParamsSchema,
	waiverBodySchema
} from '$lib/schemas/api';
import { fabProfileSchema } from '$lib/schemas/fab-profile';
import { violationSchema } from '$lib/schemas/violation';
import { SOFTWARE_VERSION } from '$lib/formats/export-meta';
import { sweepPlanSchema } from '$lib/formats/sweep';

const problemResponse = (description: string) => ({ description, content: { 'application/json': { schema: problemSchema } } });
const jsonResponse = (description: string, schema: z.ZodType) => ({ description, content: { 'application/json': { schema } } });

const denied = {
	401: problemResponse('No session and no valid API token'),
	404: problemResponse('Not found, or not in a team the caller belongs to (an API token reaches only its own team)')
};
const badInput = { 400: problemResponse('Bad input: one issue per field, each naming the allowed range') };
const forbidden = { 403: problemResponse('A member whose role lacks this right (viewers read and download only)') };

const fabProfileDocSchema = fabProfileSchema.meta({ id: 'FabProfile', description: 'The fab capability profile the revision was checked against (recorded when it was saved)' });
const refusalSchema = z
	.object({ error: z.string(), profile: fabProfileDocSchema, violations: z.array(violationSchema).min(1), issues: z.array(z.object({ path: z.string(), message: z.string() })).max(0).meta({ description: 'Always empty here (the input was fine)' }) })
	.meta({ id: 'ExportRefusal', description: 'The revision breaks its fab profile: every violation, and the profile. Nothing was built or recorded.' });
const readBackFailureSchema = z
	.object({ error: z.string(), supportId: z.string(), issues: z.array(z.object({ path: z.string(), message: z.string() })).max(0) })
	.meta({ id: 'ReadBackFailure', description: 'The files just written did not read back as the artwork (our bug); nothing was delivered. Quote the support id.' });
const refused = {
	422: jsonResponse('Refused: the revision breaks design rules of its fab profile. Download again with POST { "waiver": "reason" } (editors and owners) to export anyway', refusalSchema),
	500: jsonResponse('The read-back self-check failed; nothing was delivered', readBackFailureSchema)
};
const sweepPlanSummarySchema = z
	.object({
		id: z.string(),
		name: z.string(),
		pointCount: z.number().int(),
		createdAt: z.iso.datetime(),
		createdBy: z.string().meta({ description: 'Display name of whoever saved the plan' }),
		plan: sweepPlanSchema.meta({ id: 'SweepPlan', description: 'Axes (from/to/step or a list of values) over design-input fields, combined as a grid or zipped' })
	})
	.meta({ id: 'SweepPlanSummary' });
const sweepPlanListSchema = z.object({ plans: z.array(sweepPlanSummarySchema) }).meta({ id: 'SweepPlanList' });
const sweepDocumentSchema = z.looseObject({}).meta({ description: 'Sweep definition, versioned schema of its own (/schemas/sweep-v2.json; documents written before version 2 follow /schemas/sweep-v1.json)' });

function buildRegistry(): OpenAPIRegistry {
	const registry = new OpenAPIRegistry();
	registry.registerComponent('securitySchemes', 'apiToken', {
		type: 'http',
		scheme: 'bearer',
		description: 'A personal API token (ff_…) made on the API tokens page; it reaches one team'
	});
	registry.registerComponent('securitySchemes', 'session', { type: 'apiKey', in: 'cookie', name: 'ff_session', description: 'The signed-in session of the web app' });

	registry.registerPath({
		method: 'get',
		path: '/teams',
		tags: ['teams'],
		summary: 'The teams the caller belongs to (an API token: its one team)',
		responses: { 200: jsonResponse('The teams with the caller’s role in each', teamListSchema), 401: denied[401] }
	});
	registry.registerPath({
		method: 'get',
		path: '/teams/{teamId}/designs',
		tags: ['designs'],
		summary: 'The team’s designs',
		request: { params: teamParamsSchema },
		responses: { 200: jsonResponse('Designs, newest first', designListSchema), ...badInput, ...denied }
	});
	registry.registerPath({
		method: 'post',
		path: '/teams/{teamId}/designs',
		tags: ['designs'],
		summary: 'Create a design with its first revision (A) — editors and owners',
		request: { params: teamParamsSchema, body: { required: true, content: { 'application/json': { schema: createDesignBodySchema } } } },
		responses: { 201: jsonResponse('The new design', designDetailSchema), ...badInput, ...denied, ...forbidden }
	});
	registry.registerPath({
		method: 'get',
		path: '/designs/{designId}',
		tags: ['designs'],
		summary: 'A design with its revision history',
		request: { params: designParamsSchema },
		responses: { 200: jsonResponse('The design', designDetailSchema), ...badInput, ...denied }
	});
	registry.registerPath({
		method: 'post',
		path: '/designs/{designId}/revisions',
		tags: ['revisions'],
		summary: 'Save a new revision from a parent (never changes an old one) — editors and owners',
		request: { params: designParamsSchema, body: { required: true, content: { 'application/json': { schema: createRevisionBodySchema } } } },
		responses: { 201: jsonResponse('The new revision', revisionDetailSchema), ...badInput, ...denied, ...forbidden }
	});
	registry.registerPath({
		method: 'get',
		path: '/designs/{designId}/revisions/{label}',
		tags: ['revisions'],
		summary: 'One revision: its input document and its computed results',
		request: { params: revisionParamsSchema },
		responses: { 200: jsonResponse('The revision', revisionDetailSchema), ...badInput, ...denied }
	});
	registry.registerPath({
		method: 'get',
		path: '/designs/{designId}/revisions/{label}/sweep',
		tags: ['exports'],
		summary: 'The revision’s sweep definition (JSON; see /schemas for its JSON Schema) — recorded in the export log',
		request: { params: revisionParamsSchema },
		responses: {
			200: { description: 'The sweep definition document', content: { 'application/json': { schema: sweepDocumentSchema } } },
			...badInput,
			...denied
		}
	});
	const downloaded = {
		description: 'The file (content-disposition: attachment); x-content-sha256 carries the sha256 of the body, x-export-id the export record',
		content: { 'application/octet-stream': { schema: z.string().meta({ format: 'binary' }) } }
	};
	registry.registerPath({
		method: 'get',
		path: '/designs/{designId}/revisions/{label}/export/{format}',
		tags: ['exports'],
		summary: 'Download one format or the zip bundle — checked against the revision’s fab profile, recorded in the export log; the same revision always gives the same bytes',
		request: { params: exportParamsSchema },
		responses: { 200: downloaded, ...badInput, ...denied, ...refused }
	});
	registry.registerPath({
		method: 'post',
		path: '/designs/{designId}/revisions/{label}/export/{format}',
		tags: ['exports'],
		summary: 'Download despite design-rule violations, with a waiver — editors and owners; the reason is stored on the export record and printed in the fab notes (a clean revision downloads as with GET, no waiver recorded)',
		request: { params: exportParamsSchema, body: { required: true, content: { 'application/json': { schema: waiverBodySchema } } } },
		responses: { 200: downloaded, ...badInput, ...denied, ...forbidden, 500: refused[500] }
	});
	registry.registerPath({
		method: 'get',
		path: '/designs/{designId}/revisions/{label}/sweep-plans',
		tags: ['sweeps'],
		summary: 'The revision’s saved sweep plans, each with its point count',
		request: { params: revisionParamsSchema },
		responses: { 200: jsonResponse('The plans, newest first', sweepPlanListSchema), ...badInput, ...denied }
	});
	registry.registerPath({
		method: 'get',
		path: '/designs/{designId}/revisions/{label}/sweep-plans/{planId}/sweep',
		tags: ['sweeps'],
		summary: 'The sweep JSON of one saved plan (every point sized and drawn) — recorded in the export log as a sweep export',
		request: { params: sweepPlanParamsSchema },
		responses: {
			200: { description: 'The sweep document; x-sweep-point-count carries its point count', content: { 'application/json': { schema: sweepDocumentSchema } } },
			...badInput,
			...denied
		}
	});
	registry.registerPath({
		method: 'post',
		path: '/designs/{designId}/revisions/{label}/simulations',
		tags: ['field checks'],
		summary: 'Start a field check (one full-wave simulation of the revision’s artwork) or, with homing, a Homing study — editors and owners; it runs on a worker, follow it at statusUrl',
		request: { params: revisionParamsSchema, body: { required: true, content: { 'application/json': { schema: startFieldCheckBodySchema } } } },
		responses: {
			202: jsonResponse('Queued; the Location header and statusUrl name the status endpoint', fieldCheckStatusSchema),
			...badInput,
			...denied,
			...forbidden,
			429: problemResponse('The team already has as many field checks waiting or running as it may')
		}
	});
	registry.registerPath({
		method: 'get',
		path: '/designs/{designId}/revisions/{label}/simulations',
		tags: ['field checks'],
		summary: 'The revision’s field checks and Homing studies, newest first (without results)',
		request: { params: revisionParamsSchema },
		responses: { 200: jsonResponse('The checks', fieldCheckListSchema), ...badInput, ...denied }
	});
	registry.registerPath({
		method: 'get',
		path: '/simulations/{id}',
		tags: ['field checks'],
		summary: 'A field check’s state and progress; when it succeeded, its S11, impedance, resonance, band and (for Homing) the iterations and tuned input',
		request: { params: fieldCheckParamsSchema },
		responses: { 200: jsonResponse('The check', fieldCheckStatusSchema), ...badInput, ...denied }
	});
	registry.registerPath({
		method: 'post',
		path: '/simulations/{id}/cancel',
		tags: ['field checks'],
		summary: 'Cancel a queued or running field check — editors and owners; a running engine is stopped within a few seconds',
		request: { params: fieldCheckParamsSchema },
		responses: {
			200: jsonResponse('It was queued and is now cancelled', fieldCheckStatusSchema),
			202: jsonResponse('It was running: its worker stops the engine on its next heartbeat and marks it cancelled', fieldCheckStatusSchema),
			409: problemResponse('It had already ended'),
			...badInput,
			...denied,
			...forbidden
		}
	});
	registry.registerPath({
		method: 'get',
		path: '/teams/{teamId}/exports',
		tags: ['exports'],
		summary: 'The team’s export log: filter, sort, page',
		request: { params: teamParamsSchema, query: exportLogQuerySchema },
		responses: { 200: jsonResponse('One page of the log', exportLogSchema), ...badInput, ...denied }
	});
	registry.registerPath({
		method: 'post',
		path: '/size',
		tags: ['sizing'],
		summary: 'Size a design (stateless: nothing is stored)',
		request: { body: { required: true, content: { 'application/json': { schema: designInputDocumentSchema } } } },
		responses: { 200: jsonResponse('The sized design', sizedDesignSchema), ...badInput, 401: denied[401] }
	});
	return registry;
}

let cached: ReturnType<OpenApiGeneratorV31['generateDocument']> | undefined;

export function openApiDocument() {
	cached ??= new OpenApiGeneratorV31(buildRegistry().definitions).generateDocument({
		openapi: '3.1.0',
		info: {
			title: 'Fringefield API',
			version: SOFTWARE_VERSION,
			description:
				'Teams, designs, immutable revisions, sizing, sweep definitions and recorded downloads. Authorise with the session cookie of the web app, or with a personal API token sent as the header Authorization: Bearer ff_… (a token reaches only the one team it was made for).'
		},
		servers: [{ url: '/api/v1' }],
		security: [{ apiToken: [] }, { session: [] }]
	});
	return cached;
}
