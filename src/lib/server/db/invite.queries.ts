// Team invitations: only the sha256 of the token is stored; an invitation is accepted at most once.
import type { Kysely } from 'kysely';
import type { Database } from './database';
import type { InsertableTeamInviteRow } from './team-invite.table';

export async function insertTeamInvite(db: Kysely<Database>, row: InsertableTeamInviteRow): Promise<void> {
	await db.insertInto('team_invite').values(row).execute();
}

/** An invitation with its team and inviter, whatever its state (the caller judges used/expired). */
export async function findInviteByHash(db: Kysely<Database>, tokenHash: string) {
	return db
		.selectFrom('team_invite')
		.innerJoin('team', 'team.id', 'team_invite.team_id')
		.innerJoin('app_user', 'app_user.id', 'team_invite.invited_by')
		.select([
			'team_invite.id',
			'team_invite.team_id',
			'team_invite.email',
			'team_invite.role',
			'team_invite.expires_at',
			'team_invite.accepted_at',
			'team.name as team_name',
			'app_user.display_name as inviter_name'
		])
		.where('team_invite.token_hash', '=', tokenHash)
		.executeTakeFirst();
}

/** Marks a live invitation accepted in one statement; returns its team and role. */
export async function consumeInviteByHash(db: Kysely<Database>, tokenHash: string, now: Date) {
	return db
		.updateTable('team_invite')
		.set({ accepted_at: now })
		.where('token_hash', '=', tokenHash)
		.where('accepted_at', 'is', null)
		.where('expires_at', '>', now)
		.returning(['id', 'team_id', 'role'])
		.executeTakeFirst();
}

export async function listPendingInvitesByTeam(db: Kysely<Database>, teamId: string, now: Date) {
	return db
		.selectFrom('team_invite')
		.select(['id', 'email', 'role', 'expires_at', 'created_at'])
		.where('team_id', '=', teamId)
		.where('accepted_at', 'is', null)
		.where('expires_at', '>', now)
		.orderBy('created_at', 'desc')
		.execute();
}

/** Withdraws a pending invitation of a team; returns whether one was withdrawn. */
export async function deletePendingInviteByTeamAndId(db: Kysely<Database>, teamId: string, id: string): Promise<boolean> {
	const result = await db.deleteFrom('team_invite').where('team_id', '=', teamId).where('id', '=', id).where('accepted_at', 'is', null).executeTakeFirst();
	return Number(result.numDeletedRows) > 0;
}

/** Withdraws a pending invitation of a team; returns what was withdrawn, or undefined. */
export async function deletePendingInviteByTeamAndIdReturning(db: Kysely<Database>, teamId: string, id: string) {
	return db.deleteFrom('team_invite').where('team_id', '=', teamId).where('id', '=', id).where('accepted_at', 'is', null).returning(['id', 'email', 'role']).executeTakeFirst();
}

/** Withdraws a team's pending invitations sent by a person or naming their address; returns them. */
export async function deletePendingInvitesByTeamAndPerson(db: Kysely<Database>, teamId: string, userId: string, email: string) {
	return db
		.deleteFrom('team_invite')
		.where('team_id', '=', teamId)
		.where('accepted_at', 'is', null)
		.where((eb) => eb.or([eb('invited_by', '=', userId), eb('email', '=', email)]))
		.returning(['id', 'email', 'role', 'invited_by'])
		.execute();
}
