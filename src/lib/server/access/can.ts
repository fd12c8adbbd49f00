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
	'measurement.delete', // delete a measured S11 file (recorded in the security log)
	'field-check.start', // start a full-wave field check or a Homing study of a revision (viewers see the results)
	'field-check.cancel', // cancel a queued or running one
	'export.download', // download any format or the bundle, from the UI or the API
	'export.waive', // record a waiver for design-rule violations
	'token.manage-own' // create and revoke one's own API tokens for this team
] as const;
export type Action = (typeof actions)[number];

const viewer: readonly Action[] = ['team.read', 'export.download', 'token.manage-own'];
const editor: readonly Action[] = [...viewer, 'design.create', 'revision.create', 'laminate.write', 'fab-profile.write', 'sweep.write', 'measurement.upload', 'measurement.delete', 'field-check.start', 'field-check.cancel', 'export.waive'];
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

/**
 * Steps that need a confirmed e-mail address on top of any role: an address nobody has shown to be theirs
 * must not hold a team's keys, mint API tokens or send mail in our name.
 */
export const confirmedEmailSteps = [
	'token.create', // make a personal API token
	'invite.send', // send an invitation (the mail shows the sender's address)
	'invite.accept-owner', // accept an invitation as owner
	'invite.receive-owner' // be invited as owner (when the address already has an account)
] as const;
export type ConfirmedEmailStep = (typeof confirmedEmailSteps)[number];

export interface AccountState {
	emailVerified: boolean;
}

/** Whether the account itself (not its role) may take `step`. */
export function canAsAccount(account: AccountState | null | undefined, step: ConfirmedEmailStep): boolean {
	return !!account?.emailVerified && (confirmedEmailSteps as readonly string[]).includes(step);
}

/** The sentence shown when an unconfirmed account is refused, next to a "send the link again" button. */
export const CONFIRM_EMAIL_FIRST: Record<ConfirmedEmailStep, string> = {
	'token.create': 'Confirm your e-mail address before making API tokens: follow the link we mailed you when you signed up.',
	'invite.send': 'Confirm your e-mail address before inviting people: the invitation shows it to them. Follow the link we mailed you when you signed up.',
	'invite.accept-owner': 'Confirm your e-mail address before joining a team as owner: follow the link we mailed you when you signed up.',
	'invite.receive-owner': 'That person has not confirmed their e-mail address yet, so they cannot be made an owner by invitation. Invite them as editor or viewer, or ask them to confirm first.'
};
