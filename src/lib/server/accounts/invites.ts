// Invitations by e-mail: a single-use link valid for seven days; accepting makes you a member in the invited role.
// Only a confirmed address may invite (the mail shows it), within an hourly allowance per person and per team; the
// subject is fixed (no team name, no link). Sending, withdrawing and accepting are written to the team's security log.
import { randomUUID } from 'node:crypto';
import type { TeamRole } from '../db/team.table';
import { getDb } from '../db';
import * as inviteQueries from '../db/invite.queries';
import * as memberQueries from '../db/member.queries';
import * as userQueries from '../db/user.queries';
import { appOrigin, sendMail } from '../mail';
import * as verificationQueries from '../db/verification.queries';
import { recordAuditEvent } from '../audit/record-audit-event';
import { canAsAccount, CONFIRM_EMAIL_FIRST } from '../access/can';
import { takeInviteAllowance } from './attempt-throttle';
import { parseWith } from '$lib/schemas/input-error';
import { inviteSchema } from '$lib/schemas/account';
import { AccountError } from './account-error';
import { createLinkToken, hashLinkToken } from './link-token';

export const INVITE_LIFETIME_MS = 7 * 24 * 60 * 60 * 1000;

export interface PendingInvite {
	id: string;
	email: string;
	role: TeamRole;
	expiresAt: Date;
	createdAt: Date;
}

/** Records an invitation and e-mails its link; if the mail cannot be sent, the invitation is withdrawn again. */
export async function inviteToTeam(teamId: string, invitedBy: string, raw: { email: unknown; role: unknown }, now = new Date()): Promise<{ inviteId: string }> {
	const { email, role } = parseWith(inviteSchema, raw);
	const db = getDb();
	const [team, inviter] = await Promise.all([memberQueries.findTeamById(db, teamId), userQueries.findUserById(db, invitedBy)]);
	if (!team || !inviter) throw new AccountError('not-found', 'Team not found');
	if (!canAsAccount({ emailVerified: inviter.email_verified_at !== null }, 'invite.send')) throw new AccountError('email-unconfirmed', CONFIRM_EMAIL_FIRST['invite.send']);
	if (role === 'owner') {
		const invitee = await verificationQueries.findEmailVerifiedAtByEmail(db, email);
		if (invitee && !canAsAccount({ emailVerified: invitee.emailVerifiedAt !== null }, 'invite.receive-owner')) throw new AccountError('invitee-unconfirmed', CONFIRM_EMAIL_FIRST['invite.receive-owner']);
	}
	const { retryAfterSeconds } = await takeInviteAllowance(teamId, invitedBy);
	if (retryAfterSeconds > 0) throw new AccountError('too-many', `Many invitations were sent from this team or by you in the last hour; try again in ${Math.ceil(retryAfterSeconds / 60)} minute(s).`);
	const { token, tokenHash } = createLinkToken();
	const inviteId = randomUUID();
	const expiresAt = new Date(now.getTime() + INVITE_LIFETIME_MS);
	await inviteQueries.insertTeamInvite(db, { id: inviteId, team_id: teamId, email, role, token_hash: tokenHash, invited_by: invitedBy, expires_at: expiresAt });
	try {
		await sendMail(email, 'invite', {
			inviterName: inviter.display_name,
			inviterEmail: inviter.email,
			teamName: team.name,
			role,
			roleArticle: role === 'viewer' ? 'a' : 'an',
			link: `${appOrigin()}/invites/${token}`,
			expiresAt: expiresAt.toISOString().slice(0, 10)
		});
	} catch (err) {
		await inviteQueries.deletePendingInviteByTeamAndId(db, teamId, inviteId);
		throw err;
	}
	await recordAuditEvent({ kind: 'invite.sent', teamId, actorUserId: invitedBy, details: { inviteId, email, role } });
	return { inviteId };
}

export async function listPendingInvites(teamId: string, now = new Date()): Promise<PendingInvite[]> {
	const rows = await inviteQueries.listPendingInvitesByTeam(getDb(), teamId, now);
	return rows.map((r) => ({ id: r.id, email: r.email, role: r.role, expiresAt: r.expires_at, createdAt: r.created_at }));
}

/** `actorId`: who withdrew it, for the team's security log. */
export async function withdrawInvite(teamId: string, inviteId: string, actorId: string | null = null): Promise<void> {
	await getDb()
		.transaction()
		.execute(async (trx) => {
			const withdrawn = await inviteQueries.deletePendingInviteByTeamAndIdReturning(trx, teamId, inviteId);
			if (!withdrawn) throw new AccountError('not-found', 'That invitation is not pending any more.');
			await recordAuditEvent({ kind: 'invite.revoked', teamId, actorUserId: actorId, details: { inviteId, email: withdrawn.email, role: withdrawn.role, reason: 'withdrawn' } }, trx);
		});
}

export type InviteState = 'live' | 'used' | 'expired';

export interface InviteDescription {
	teamId: string;
	teamName: string;
	role: TeamRole;
	email: string;
	inviterName: string;
	expiresAt: Date;
	state: InviteState;
}

/** What a link invites to, for the page behind it; null when the token is unknown. */
export async function describeInvite(token: string, now = new Date()): Promise<InviteDescription | null> {
	const row = await inviteQueries.findInviteByHash(getDb(), hashLinkToken(token));
	if (!row) return null;
	const state: InviteState = row.accepted_at ? 'used' : row.expires_at.getTime() <= now.getTime() ? 'expired' : 'live';
	return { teamId: row.team_id, teamName: row.team_name, role: row.role, email: row.email, inviterName: row.inviter_name, expiresAt: row.expires_at, state };
}

/**
 * Uses the link once and makes `userId` a member in the invited role. Someone who already belongs
 * to the team keeps their role (`joined` is then false) — an invitation never demotes.
 */
export async function acceptInvite(token: string, userId: string, now = new Date()): Promise<{ teamId: string; role: TeamRole; joined: boolean }> {
	return getDb()
		.transaction()
		.execute(async (trx) => {
			const invite = await inviteQueries.consumeInviteByHash(trx, hashLinkToken(token), now);
			if (!invite) throw new AccountError('link-invalid', 'This invitation is not valid any more (used, expired or withdrawn). Ask the team owner for a new one.');
			if (invite.role === 'owner') {
				const verifiedAt = await verificationQueries.findEmailVerifiedAtById(trx, userId);
				// Thrown inside the transaction: the invitation stays unused for when the address is confirmed.
				if (!canAsAccount({ emailVerified: verifiedAt !== null }, 'invite.accept-owner')) throw new AccountError('email-unconfirmed', CONFIRM_EMAIL_FIRST['invite.accept-owner']);
			}
			const joined = await memberQueries.insertMember(trx, invite.team_id, userId, invite.role);
			await recordAuditEvent({ kind: 'invite.accepted', teamId: invite.team_id, actorUserId: userId, details: { inviteId: invite.id, role: invite.role, joined } }, trx);
			return { teamId: invite.team_id, role: invite.role, joined };
		});
}
