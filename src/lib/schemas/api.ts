// zod schemas of the /api/v1 surface: path parameters, queries, bodies and answers. The OpenAPI document is generated from these.
import { z } from 'zod';
import { formatIds } from '../formats/format-ids';
import { documentedDesignInputSchema, designNameSchema } from './design-input';
import { revisionNoteSchema } from './revision-note';
import { sizedDesignSchema } from './sized-design';
import { waiverReasonSchema } from './waiver-reason';
import { fieldCheckModes, fieldCheckProgressSchema, fieldCheckResultSchema, homingResultSchema } from './field-check';

/** The design-input document, named for the OpenAPI components (described by its outline, parsed by the union on feed). */
export const designInputDocumentSchema = documentedDesignInputSchema.meta({ id: 'DesignInput', description: 'The design-input document (see src/lib/schemas/design-input.ts)' });

/** What a download can be: the zip bundle, or one format of the registry (formats/format-ids.ts, the registry's ids). */
export const exportKinds = ['bundle', ...formatIds] as const;
export type ExportKind = (typeof exportKinds)[number];

export function isExportKind(value: string): value is ExportKind {
	return (exportKinds as readonly string[]).includes(value);
}

/**
 * What the export log records: every download kind, and 'sweep-plan' for one saved sweep plan's sweep JSON
 * (the revision's own sweep definition is 'sweep'). Re-exports are compared only within one kind (and one plan).
 */
export const exportLogKinds = [...exportKinds, 'sweep-plan'] as const;
export type ExportLogKind = (typeof exportLogKinds)[number];

export const exportVias = ['ui', 'api', 'cli'] as const;

const idString = (what: string) =>
	z
		.string()
		.min(1, { error: `${what} must not be empty` })
		.max(100, { error: `${what} is at most 100 characters` })
		.regex(/^[A-Za-z0-9_-]+$/, { error: `${what} holds only letters, digits, "_" and "-"` });

export const teamIdParam = idString('teamId').meta({ description: 'Team id', example: 'team_3f9c' });
export const designIdParam = idString('designId').meta({ description: 'Design id', example: 'dsg_71ab' });
export const revisionLabelParam = z
	.string()
	.regex(/^[A-Za-z0-9][A-Za-z0-9.-]{0,15}$/, { error: 'label is 1–16 letters, digits, dots or hyphens' })
	.meta({ description: 'Revision label', example: 'A' });
export const exportKindParam = z.enum(exportKinds).meta({ description: 'What to download: the zip bundle or one format' });

export const teamParamsSchema = z.object({ teamId: teamIdParam });
export const designParamsSchema = z.object({ designId: designIdParam });
export const revisionParamsSchema = z.object({ designId: designIdParam, label: revisionLabelParam });
export const exportParamsSchema = z.object({ designId: designIdParam, label: revisionLabelParam, format: exportKindParam });
export const sweepPlanParamsSchema = revisionParamsSchema.extend({ planId: idString('planId').meta({ description: 'Sweep plan id (from the sweep-plans list)' }) });

/** POST body of a download that goes out despite design-rule violations (editors and owners). */
export const waiverBodySchema = z
	.strictObject({ waiver: z.string({ error: 'required: why the violations are acceptable' }).pipe(waiverReasonSchema).meta({ description: 'Why the violations are acceptable; stored on the export record and printed in the fab notes' }) })
	.meta({ id: 'WaiverBody' });

export const exportSortKeys = ['createdAt', 'design', 'revision', 'kind', 'via', 'user', 'sizeBytes'] as const;
export type ExportSortKey = (typeof exportSortKeys)[number];

/** Query of the export log: filter, sort, page. */
export const exportLogQuerySchema = z.strictObject({
	designId: designIdParam.optional(),
	kind: z.enum(exportLogKinds).optional().meta({ description: "Only this kind of download ('sweep-plan': a saved sweep plan's sweep JSON)" }),
	via: z.enum(exportVias).optional().meta({ description: 'Only downloads made from here' }),
	q: z.string().trim().max(100, { error: 'q is at most 100 characters' }).optional().meta({ description: 'Text in the design name, revision label, person or sha256' }),
	sort: z.enum(exportSortKeys).default('createdAt'),
	order: z.enum(['asc', 'desc']).default('desc'),
	page: z.coerce.number({ error: 'page must be a whole number ≥ 1' }).int({ error: 'page must be a whole number ≥ 1' }).min(1, { error: 'page must be a whole number ≥ 1' }).max(100_000, { error: 'page is at most 100000' }).default(1),
	pageSize: z.coerce.number({ error: 'pageSize must be a whole number in [1, 100]' }).int({ error: 'pageSize must be a whole number in [1, 100]' }).min(1, { error: 'allowed range [1, 100]' }).max(100, { error: 'allowed range [1, 100]' }).default(25)
});
export type ExportLogQuery = z.output<typeof exportLogQuerySchema>;

export const createDesignBodySchema = z
	.strictObject({
		name: designNameSchema.optional().meta({ description: 'Design name (default: the input document’s name)', example: 'Roof GNSS L1' }),
		/** The design-input document of revision A. */
		input: designInputDocumentSchema,
		note: revisionNoteSchema.optional()
	})
	.meta({ id: 'CreateDesign' });
export type CreateDesignBody = z.output<typeof createDesignBodySchema>;

export const createRevisionBodySchema = z
	.strictObject({
		parent: revisionLabelParam.meta({ description: 'Label of the revision this one starts from' }),
		/** The complete design-input document of the new revision. */
		input: designInputDocumentSchema,
		note: revisionNoteSchema.optional()
	})
	.meta({ id: 'CreateRevision' });
export type CreateRevisionBody = z.output<typeof createRevisionBodySchema>;

// ---- answers (documentation of what the routes return) ----

export const teamRoleSchema = z.enum(['owner', 'editor', 'viewer']);

export const teamSummarySchema = z.object({ id: z.string(), name: z.string(), role: teamRoleSchema }).meta({ id: 'Team' });
export const teamListSchema = z.object({ teams: z.array(teamSummarySchema) }).meta({ id: 'TeamList' });

export const revisionSummarySchema = z
	.object({
		label: z.string(),
		parentLabel: z.string().nullable(),
		note: z.string(),
		createdAt: z.iso.datetime(),
		createdBy: z.string().meta({ description: 'Display name of the author' })
	})
	.meta({ id: 'RevisionSummary' });

export const designSummarySchema = z
	.object({ id: z.string(), teamId: z.string(), name: z.string(), slug: z.string(), createdAt: z.iso.datetime(), latestLabel: z.string().nullable() })
	.meta({ id: 'DesignSummary' });
export const designListSchema = z.object({ designs: z.array(designSummarySchema) }).meta({ id: 'DesignList' });

export const designDetailSchema = designSummarySchema.extend({ revisions: z.array(revisionSummarySchema) }).meta({ id: 'Design' });

/** The sized design: one schema for the API, the stored revisions and the sweep points (./sized-design.ts). */
export { sizedDesignSchema };

export const revisionDetailSchema = revisionSummarySchema
	.extend({ designId: z.string(), designName: z.string(), input: designInputDocumentSchema, results: sizedDesignSchema })
	.meta({ id: 'Revision' });

export const exportedFileSchema = z.object({ name: z.string(), sizeBytes: z.number().int(), sha256: z.string().regex(/^[0-9a-f]{64}$/) }).meta({ id: 'ExportedFile' });

export const exportRecordSchema = z
	.object({
		id: z.string(),
		createdAt: z.iso.datetime(),
		design: z.object({ id: z.string(), name: z.string() }),
		revision: z.object({ label: z.string() }),
		kind: z.enum(exportLogKinds).meta({ description: "'bundle', a format, or 'sweep-plan' (a saved sweep plan's sweep JSON; the revision's own sweep definition is 'sweep')" }),
		sweepPlan: z
			.object({ id: z.string(), name: z.string() })
			.nullable()
			.meta({ description: "The saved plan a 'sweep-plan' download was built from; null for every other kind" }),
		via: z.enum(exportVias),
		user: z.object({ displayName: z.string() }),
		files: z.array(exportedFileSchema),
		sizeBytes: z
			.number()
			.int()
			.nullable()
			.meta({
				description:
					'Length in bytes of what sha256 covers: the zip for a bundle or a several-file format, the file itself otherwise. null for a zip downloaded before Fringefield stored that length'
			}),
		sha256: z.string().meta({ description: 'sha256 of the delivered bytes (the zip for a bundle)' }),
		waiver: z
			.string()
			.nullable()
			.meta({ description: 'The reason an editor or owner gave for exporting despite design-rule violations (also printed in the fab notes); null when the design passed its fab profile' }),
		earlier: z
			.object({ exportId: z.string(), createdAt: z.iso.datetime(), matches: z.boolean() })
			.nullable()
			.meta({ description: 'The first earlier export of the same revision and kind (and, for a sweep-plan, the same plan), and whether every hash matches it; null for a first export' })
	})
	.meta({ id: 'ExportRecord' });

export const exportLogSchema = z
	.object({ items: z.array(exportRecordSchema), total: z.number().int(), page: z.number().int(), pageSize: z.number().int() })
	.meta({ id: 'ExportLog' });

export const problemSchema = z
	.object({ error: z.string(), issues: z.array(z.object({ path: z.string(), message: z.string() })) })
	.meta({ id: 'Problem', description: 'What went wrong; for bad input, one issue per field' });

// ---- field checks (full-wave simulation of a revision) and Homing ----

/** POST body that starts a field check (or, with homing, a Homing study) of a revision — editors and owners. */
export const startFieldCheckBodySchema = z
	.strictObject({
		mode: z.enum(fieldCheckModes).default('standard').meta({ description: 'Mesh: quick (a first look, ~2 %), standard, or accurate (standard refined 1.5×, reports the shift)' }),
		homing: z.boolean().default(false).meta({ description: 'Run Homing instead: move the resonant dimension, then the feed, until the simulated patch meets its target' })
	})
	.meta({ id: 'StartFieldCheck' });
export type StartFieldCheckBody = z.output<typeof startFieldCheckBodySchema>;

export const fieldCheckParamsSchema = z.object({ id: z.uuid({ error: 'id is a field check id (a UUID)' }).meta({ description: 'Field check id', example: '0b9e3c0e-5c1a-4c55-9b43-5c2a7e1d9f10' }) });

export const fieldCheckStates = ['queued', 'running', 'succeeded', 'failed', 'cancelled'] as const;

export const fieldCheckSummarySchema = z
	.object({
		id: z.string(),
		designId: z.string(),
		revisionLabel: z.string(),
		kind: z.enum(['check', 'homing']).meta({ description: 'check: one full-wave simulation; homing: the tune-to-target study' }),
		mode: z.enum(fieldCheckModes),
		state: z.enum(fieldCheckStates),
		progress: fieldCheckProgressSchema.nullable(),
		error: z.string().nullable().meta({ description: 'Why it failed or was cancelled; while queued again after a lost worker, what happened' }),
		requestedBy: z.string().meta({ description: 'Display name of whoever started it' }),
		createdAt: z.iso.datetime(),
		startedAt: z.iso.datetime().nullable(),
		finishedAt: z.iso.datetime().nullable(),
		cancelRequested: z.boolean(),
		attempt: z.number().int().meta({ description: 'Times a worker has taken it (above 1 after a lost worker)' }),
		statusUrl: z.string().meta({ description: 'GET here for the status, progress and result' })
	})
	.meta({ id: 'FieldCheckSummary' });

export const fieldCheckListSchema = z.object({ items: z.array(fieldCheckSummarySchema) }).meta({ id: 'FieldCheckList' });

export const fieldCheckStatusSchema = fieldCheckSummarySchema
	.extend({
		result: fieldCheckResultSchema.nullable().meta({ description: 'When succeeded: the full-wave result (for Homing, that of the tuned patch)' }),
		homing: homingResultSchema.nullable().meta({ description: 'When a Homing study succeeded: its iterations and the tuned design input' })
	})
	.meta({ id: 'FieldCheckStatus' });
