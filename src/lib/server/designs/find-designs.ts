// Reading designs and revisions: a team's list, one design with its history, one revision by label.
import type { Kysely } from 'kysely';
import type { DesignInput } from '../../schemas';
import type { Database } from '../db/database';
import * as designQueries from '../db/design.queries';
import { toDesign, toRevision, type Design, type Revision } from './design-model';

export interface DesignSummary {
	id: string;
	slug: string;
	name: string;
	createdAt: Date;
	createdByName: string;
	revisionCount: number;
	latestLabel: string | null;
	latestAt: Date | null;
	/** Shape, feed and frequency of the latest revision, for the list. */
	latest: Pick<DesignInput, 'shape' | 'feed' | 'frequencyHz'> | null;
}

export async function listDesigns(db: Kysely<Database>, teamId: string): Promise<DesignSummary[]> {
	const rows = await designQueries.listDesignsByTeam(db, teamId);
	return rows.map((r) => {
		const input = r.latest_input as DesignInput | null;
		return {
			id: r.id,
			slug: r.slug,
			name: r.name,
			createdAt: r.created_at,
			createdByName: r.created_by_name,
			revisionCount: Number(r.revision_count ?? 0),
			latestLabel: r.latest_label ?? null,
			latestAt: r.latest_at ? new Date(r.latest_at) : null,
			latest: input ? { shape: input.shape, feed: input.feed, frequencyHz: input.frequencyHz } : null
		};
	});
}

export async function findDesign(db: Kysely<Database>, designId: string): Promise<Design | null> {
	const row = await designQueries.findDesignById(db, designId);
	return row ? toDesign(row) : null;
}

export interface DesignWithRevisions {
	design: Design;
	/** Oldest first. */
	revisions: Revision[];
}

export async function findDesignWithRevisions(db: Kysely<Database>, designId: string): Promise<DesignWithRevisions | null> {
	const design = await findDesign(db, designId);
	if (!design) return null;
	const rows = await designQueries.listRevisionsByDesign(db, designId);
	const labelById = new Map(rows.map((r) => [r.id, r.label]));
	return { design, revisions: rows.map((r) => toRevision(r, r.parent_id ? (labelById.get(r.parent_id) ?? null) : null)) };
}

export async function findRevision(db: Kysely<Database>, designId: string, label: string): Promise<Revision | null> {
	const row = await designQueries.findRevisionByDesignAndLabel(db, designId, label);
	if (!row) return null;
	const parent = row.parent_id ? await designQueries.findRevisionLabelById(db, row.parent_id) : undefined;
	return toRevision(row, parent?.label ?? null);
}
