// The access checks every design page and action makes: who is signed in, and their role in the design's team.
import { error, redirect } from '@sveltejs/kit';
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

/** The signed-in person, or a redirect to sign-in that comes back here. */
export function requireUser(event: AccessEvent): RequestUser {
	if (!event.locals.user) redirect(303, `/signin?next=${encodeURIComponent(event.url.pathname + event.url.search)}`);
	return event.locals.user;
}

export interface DesignAccess {
	user: RequestUser;
	design: Design;
	role: TeamRole;
	canEdit: boolean;
}

/** Loads a design the caller may `action`: 404 for a missing design or a non-member, 403 for a member lacking the right. */
export async function requireDesign(event: AccessEvent, designId: string, action: Action): Promise<DesignAccess> {
	const user = requireUser(event);
	const design = await findDesign(getDb(), designId);
	if (!design) error(404, 'Design not found');
	const role = await roleInTeam(event.locals.identity, design.teamId);
	authorize(role, action, 'Design not found');
	return { user, design, role: role!, canEdit: can(role, 'revision.create') };
}

/** The caller's role in a team named by a posted form (404 for a non-member, 403 for a member lacking the right). */
export async function requireTeamRole(event: AccessEvent, teamId: string, action: Action): Promise<{ user: RequestUser; role: TeamRole }> {
	const user = requireUser(event);
	const role = await roleInTeam(event.locals.identity, teamId);
	authorize(role, action, 'Team not found');
	return { user, role: role! };
}
