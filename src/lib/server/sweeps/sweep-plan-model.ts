// A saved sweep plan as the app sees it.
import type { SweepPlan } from '../../formats/sweep';

export interface SavedSweepPlan {
	id: string;
	revisionId: string;
	name: string;
	plan: SweepPlan;
	pointCount: number;
	createdBy: string;
	createdByName: string;
	createdAt: Date;
}

export function toSavedSweepPlan(row: {
	id: string;
	revision_id: string;
	name: string;
	plan: unknown;
	point_count: number;
	created_by: string;
	created_by_name: string;
	created_at: Date;
}): SavedSweepPlan {
	return {
		id: row.id,
		revisionId: row.revision_id,
		name: row.name,
		plan: row.plan as SweepPlan,
		pointCount: row.point_count,
		createdBy: row.created_by,
		createdByName: row.created_by_name,
		createdAt: row.created_at
	};
}
