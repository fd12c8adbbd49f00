// A team's members: list them, change a role, remove one. A team always keeps at least one owner; the
// check runs under a row lock on the team, so two owners demoting each other at once cannot both succeed.
import type { TeamRole } from '../db/team.table';
import { getDb } from '../db';
import * as memberQueries from '../db/member.queries';
import * as tokenQueries from '../db/token.queries';
import * as inviteQueries from '../db/invite.queries';
import { recordAuditEvent } from '../audit/record-audit-event';
import { parseWith } from '$lib/schemas/input-error';
import { changeRoleSchema, memberRefSchema } from '$lib/schemas/account';
import { AccountError } from './account-error';

export interface TeamMember {
	userId: string;
	email: string;
	displayName: string;
	role: TeamRole;
	joinedAt: Date;
}

export async function listTeamMembers(teamId: string): Promise<TeamMember[]> {
	const rows = await memberQueries.listMembersByTeam(getDb(), teamId);
	return rows.map((r) => ({ userId: r.id, email: r.email, displayName: r.display_name, role: r.role, joinedAt: r.created_at }));
}

const LAST_OWNER = 'A team needs at least one owner: make someone else an owner first.';

/** `actorId`: who made the change, for the team's audit log. */
export async function changeMemberRole(teamId: string, raw: { userId: unknown; role: unknown }, actorId: string | null = null): Promise<void> {
	const { userId, role } = parseWith(changeRoleSchema, raw);
	await getDb()
		.transaction()
		.execute(async (trx) => {
			await memberQueries.lockTeamById(trx, teamId);
			const current = (await memberQueries.listMembersByTeam(trx, teamId)).find((m) => m.id === userId);
			if (!current) throw new AccountError('not-member', 'That person is not a member of this team.');
			if (current.role === 'owner' && role !== 'owner' && (await memberQueries.countOwnersByTeam(trx, teamId)) <= 1) {
				throw new AccountError('last-owner', LAST_OWNER);
			}
			await memberQueries.updateMemberRole(trx, teamId, userId, role);
			if (current.role !== role) await recordAuditEvent({ kind: 'member.role-changed', teamId, actorUserId: actorId, details: { memberId: userId, memberEmail: current.email, from: current.role, to: role } }, trx);
		});
}

/**
 * Removes a member, revokes the API tokens they made for this team, and withdraws the team's pending
 * invitations they sent or that name their address (so nobody comes back through an earlier invitation).
 */
export async function removeMember(teamId: string, raw: { userId: unknown }, now = new Date(), actorId: string | null = null): Promise<void> {
	const { userId } = parseWith(memberRefSchema, raw);
	await getDb()
		.transaction()
		.execute(async (trx) => {
			await memberQueries.lockTeamById(trx, teamId);
			const current = (await memberQueries.listMembersByTeam(trx, teamId)).find((m) => m.id === userId);
			if (!current) throw new AccountError('not-member', 'That person is not a member of this team.');
			if (current.role === 'owner' && (await memberQueries.countOwnersByTeam(trx, teamId)) <= 1) throw new AccountError('last-owner', LAST_OWNER);
			await memberQueries.deleteMember(trx, teamId, userId);
			await tokenQueries.revokeTokensByTeamAndUser(trx, teamId, userId, now);
			const invites = await inviteQueries.deletePendingInvitesByTeamAndPerson(trx, teamId, userId, current.email);
			for (const i of invites) {
				const reason = i.invited_by === userId ? 'sender removed from the team' : 'invited person removed from the team';
				await recordAuditEvent({ kind: 'invite.revoked', teamId, actorUserId: actorId, details: { inviteId: i.id, email: i.email, role: i.role, reason } }, trx);
			}
			await recordAuditEvent({ kind: 'member.removed', teamId, actorUserId: actorId, details: { memberId: userId, memberEmail: current.email, role: current.role } }, trx);
		});
}
