// What /api/v1 answers look like: plain JSON of designs, revisions and teams (dates as ISO strings).
import type { z } from 'zod';
import type { designDetailSchema, designSummarySchema, revisionDetailSchema, revisionSummarySchema } from '$lib/schemas/api';
import type { Design, Revision } from '../designs/design-model';
import type { DesignSummary } from '../designs/find-designs';

export type ApiDesignSummary = z.input<typeof designSummarySchema>;
export type ApiDesign = z.input<typeof designDetailSchema>;
export type ApiRevisionSummary = z.input<typeof revisionSummarySchema>;
export type ApiRevision = z.input<typeof revisionDetailSchema>;

export function toApiDesignSummary(teamId: string, d: DesignSummary): ApiDesignSummary {
	return { id: d.id, teamId, name: d.name, slug: d.slug, createdAt: d.createdAt.toISOString(), latestLabel: d.latestLabel };
}

export function toApiRevisionSummary(r: Revision): ApiRevisionSummary {
	return { label: r.label, parentLabel: r.parentLabel, note: r.note, createdAt: r.createdAt.toISOString(), createdBy: r.createdByName };
}

export function toApiDesign(design: Design, revisions: Revision[]): ApiDesign {
	return {
		id: design.id,
		teamId: design.teamId,
		name: design.name,
		slug: design.slug,
		createdAt: design.createdAt.toISOString(),
		latestLabel: revisions.at(-1)?.label ?? null,
		revisions: revisions.map(toApiRevisionSummary)
	};
}

export function toApiRevision(design: Design, r: Revision): ApiRevision {
	return { ...toApiRevisionSummary(r), designId: design.id, designName: design.name, input: r.input, results: r.results as unknown as ApiRevision['results'] };
}
