// Invitations by e-mail: a single-use link valid for seven days; accepting makes you a member in the invited role.
import { randomUUID } from 'node:crypto';
import type { TeamRole } from '../db/team.table';
import { getDb } from '../db';
import * as inviteQueries from '../db/invite.queries';
import * as memberQueries from '../db/member.queries';
import * as userQueries from '../db/user.queries';
import { appOrigin, sendMail } from '../mail';
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
	const { token, tokenHash } = createLinkToken();
	const inviteId = randomUUID();
	const expiresAt = new Date(now.getTime() + INVITE_LIFETIME_MS);
	await inviteQueries.insertTeamInvite(db, { id: inviteId, team_id: teamId, email, role, token_hash: tokenHash, invited_by: invitedBy, expires_at: expiresAt });
	try {
		await sendMail(email, 'invite', {
			inviterName: inviter.display_name,
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
	return { inviteId };
}

export async function listPendingInvites(teamId: string, now = new Date()): Promise<PendingInvite[]> {
	const rows = await inviteQueries.listPendingInvitesByTeam(getDb(), teamId, now);
	return rows.map((r) => ({ id: r.id, email: r.email, role: r.role, expiresAt: r.expires_at, createdAt: r.created_at }));
}

export async function withdrawInvite(teamId: string, inviteId: string): Promise<void> {
	if (!(await inviteQueries.deletePendingInviteByTeamAndId(getDb(), teamId, inviteId))) throw new AccountError('not-found', 'That invitation is not pending any more.');
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
			const joined = await memberQueries.insertMember(trx, invite.team_id, userId, invite.role);
			return { teamId: invite.team_id, role: invite.role, joined };
		});
}
