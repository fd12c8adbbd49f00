// /api/v1 teams: the caller's teams (an API token sees only its own) and a team's designs.
import { getDb } from '../db';
import * as teamQueries from '../db/team.queries';
import type { RequestIdentity, RequestUser } from '../auth/request-identity';
import { createDesign } from '../designs/create-design';
import { findDesignWithRevisions, listDesigns } from '../designs/find-designs';
import type { CreateDesignBody } from '$lib/schemas/api';
import { toApiDesign, toApiDesignSummary } from './api-views';
import { withInputPrefix } from './prefix-input-error';

export async function listMyTeams(identity: RequestIdentity & { user: RequestUser }) {
	const teams = await teamQueries.listTeamsByUser(getDb(), identity.user.id);
	const reachable = identity.apiToken ? teams.filter((t) => t.id === identity.apiToken!.teamId) : teams;
	return { teams: reachable.map((t) => ({ id: t.id, name: t.name, role: t.role })) };
}

export async function listTeamDesigns(teamId: string) {
	const designs = await listDesigns(getDb(), teamId);
	return { designs: designs.map((d) => toApiDesignSummary(teamId, d)) };
}

/** A design with revision A; the body's name (when given) names the design. */
export async function createTeamDesign(teamId: string, userId: string, body: CreateDesignBody) {
	const raw = body.name ? { ...body.input, name: body.name } : body.input;
	const created = await withInputPrefix({}, () => createDesign(getDb(), { teamId, userId, raw, note: body.note }));
	const full = await findDesignWithRevisions(getDb(), created.design.id);
	return toApiDesign(full!.design, full!.revisions);
}
