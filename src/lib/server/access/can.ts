// The one place that decides who may do what. Every page load, form action and API route asks here.
import type { TeamRole } from '../db/team.table';

export const actions = [
	'team.read', // see the team, its designs, revisions, laminates, export log
	'team.manage', // rename the team, invite, change roles, remove members, read the audit log
	'design.create',
	'revision.create', // save a new revision (editing never changes an old one)
	'laminate.write',
	'fab-profile.write', // add the team's own fab capability profiles
	'sweep.write', // save sweep plans
	'measurement.upload',
	'field-check.start', // start a full-wave field check or a Homing study of a revision (viewers see the results)
	'field-check.cancel', // cancel a queued or running one
	'export.download', // download any format or the bundle, from the UI or the API
	'export.waive', // record a waiver for design-rule violations
	'token.manage-own' // create and revoke one's own API tokens for this team
] as const;
export type Action = (typeof actions)[number];

const viewer: readonly Action[] = ['team.read', 'export.download', 'token.manage-own'];
const editor: readonly Action[] = [...viewer, 'design.create', 'revision.create', 'laminate.write', 'fab-profile.write', 'sweep.write', 'measurement.upload', 'field-check.start', 'field-check.cancel', 'export.waive'];
const owner: readonly Action[] = [...editor, 'team.manage'];

const grants: Record<TeamRole, ReadonlySet<Action>> = {
	viewer: new Set(viewer),
	editor: new Set(editor),
	owner: new Set(owner)
};

/** `role` is the caller's role in the team that owns the thing; null for a non-member or anonymous. */
export function can(role: TeamRole | null | undefined, action: Action): boolean {
	return role ? grants[role].has(action) : false;
}
