// The access checks every design page and action makes: who is signed in, and their role in the design's team.
import { error } from '@sveltejs/kit';
import { requireUser } from '../accounts/request-user';
import { authorize, can, type Action } from '../access';
import { roleInTeam } from '../access/team-role';
import type { RequestIdentity, RequestUser } from '../auth/request-identity';
import { getDb } from '../db';
import type { TeamRole } from '../db/team.table';
import type { Design } from './design-model';
import { findDesign } from './find-designs';

export interface AccessEvent {
	locals: { user: RequestUser | null; identity: RequestIdentity };
	url: URL;
}

/** A design the caller was allowed to act on, with who they are and their role in its team. */
export interface DesignAccess {
	user: RequestUser;
	design: Design;
	role: TeamRole;
	canEdit: boolean;
}

/** A design looked up with the caller's role in its team, before any decision (role null when the design is missing or out of reach). */
export interface DesignLookup {
	design: Design | null;
	role: TeamRole | null;
}

/** Finds a design and the caller's role in the team that owns it; the caller decides with `authorize` (the API answers in its own words). */
export async function lookupDesign(identity: RequestIdentity, designId: string): Promise<DesignLookup> {
	const design = await findDesign(getDb(), designId);
	if (!design) return { design: null, role: null };
	return { design, role: await roleInTeam(identity, design.teamId) };
}

/** Loads a design the caller may `action`: 404 for a missing design or a non-member, 403 for a member lacking the right. */
export async function requireDesign(event: AccessEvent, designId: string, action: Action): Promise<DesignAccess> {
	const user = requireUser(event.locals, event.url);
	const { design, role } = await lookupDesign(event.locals.identity, designId);
	if (!design) error(404, 'Design not found');
	authorize(role, action, 'Design not found');
	return { user, design, role: role!, canEdit: can(role, 'revision.create') };
}

/** The caller's role in a team named by a posted form (404 for a non-member, 403 for a member lacking the right). */
export async function requireTeamRole(event: AccessEvent, teamId: string, action: Action): Promise<{ user: RequestUser; role: TeamRole }> {
	const user = requireUser(event.locals, event.url);
	const role = await roleInTeam(event.locals.identity, teamId);
	authorize(role, action, 'Team not found');
	return { user, role: role! };
}
