// Designs and revisions as the rest of the app sees them: camelCase, parsed json, one mapping per entity.
import type { SizedDesign } from '../../rf';
import type { DesignInput } from '../../schemas';
import type { DesignRow } from '../db/design.table';
import { parseStoredInput, parseStoredResults } from './stored-revision';

export interface Design {
	id: string;
	teamId: string;
	slug: string;
	name: string;
	createdBy: string;
	createdAt: Date;
}

export interface Revision {
	id: string;
	designId: string;
	label: string;
	seq: number;
	parentId: string | null;
	/** Label of the parent revision (null for the first). */
	parentLabel: string | null;
	/** The complete design-input document, every default filled. */
	input: DesignInput;
	/** The sized design computed when this revision was saved. */
	results: SizedDesign;
	note: string;
	createdBy: string;
	createdByName: string;
	createdAt: Date;
}

export interface RevisionRecord {
	id: string;
	design_id: string;
	label: string;
	seq: number;
	parent_id: string | null;
	input: unknown;
	results: unknown;
	note: string;
	created_by: string;
	created_at: Date;
	created_by_name: string;
}

export function toDesign(row: DesignRow): Design {
	return { id: row.id, teamId: row.team_id, slug: row.slug, name: row.name, createdBy: row.created_by, createdAt: row.created_at };
}

export function toRevision(row: RevisionRecord, parentLabel: string | null): Revision {
	return {
		id: row.id,
		designId: row.design_id,
		label: row.label,
		seq: row.seq,
		parentId: row.parent_id,
		parentLabel,
		input: parseStoredInput(row.input, row),
		results: parseStoredResults(row.results, row),
		note: row.note,
		createdBy: row.created_by,
		createdByName: row.created_by_name,
		createdAt: row.created_at
	};
}
