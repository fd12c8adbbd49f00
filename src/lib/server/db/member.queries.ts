// Teams and their members: creating a team, listing, locking and changing memberships.
import type { Kysely } from 'kysely';
import type { Database } from './database';
import type { TeamRole } from './team.table';

export async function insertTeam(db: Kysely<Database>, id: string, name: string): Promise<void> {
	await db.insertInto('team').values({ id, name }).execute();
}

export async function findTeamById(db: Kysely<Database>, id: string) {
	return db.selectFrom('team').select(['id', 'name', 'created_at']).where('id', '=', id).executeTakeFirst();
}

export async function renameTeamById(db: Kysely<Database>, id: string, name: string): Promise<void> {
	await db.updateTable('team').set({ name }).where('id', '=', id).execute();
}

/** Serialises membership changes of one team (the last-owner rule is checked under this lock). */
export async function lockTeamById(db: Kysely<Database>, id: string): Promise<boolean> {
	const row = await db.selectFrom('team').select('id').where('id', '=', id).forUpdate().executeTakeFirst();
	return row !== undefined;
}

/** Adds a member; returns false when the person already belongs to the team (their role is kept). */
export async function insertMember(db: Kysely<Database>, teamId: string, userId: string, role: TeamRole): Promise<boolean> {
	const row = await db
		.insertInto('team_member')
		.values({ team_id: teamId, user_id: userId, role })
		.onConflict((oc) => oc.columns(['team_id', 'user_id']).doNothing())
		.returning('user_id')
		.executeTakeFirst();
	return row !== undefined;
}

export async function listMembersByTeam(db: Kysely<Database>, teamId: string) {
	return db
		.selectFrom('team_member')
		.innerJoin('app_user', 'app_user.id', 'team_member.user_id')
		.select(['app_user.id', 'app_user.email', 'app_user.display_name', 'team_member.role', 'team_member.created_at'])
		.where('team_member.team_id', '=', teamId)
		.orderBy('team_member.created_at')
		.orderBy('app_user.email')
		.execute();
}

export async function countOwnersByTeam(db: Kysely<Database>, teamId: string): Promise<number> {
	const row = await db
		.selectFrom('team_member')
		.select((eb) => eb.fn.countAll<string>().as('n'))
		.where('team_id', '=', teamId)
		.where('role', '=', 'owner')
		.executeTakeFirstOrThrow();
	return Number(row.n);
}

export async function updateMemberRole(db: Kysely<Database>, teamId: string, userId: string, role: TeamRole): Promise<boolean> {
	const result = await db.updateTable('team_member').set({ role }).where('team_id', '=', teamId).where('user_id', '=', userId).executeTakeFirst();
	return Number(result.numUpdatedRows) > 0;
}

export async function deleteMember(db: Kysely<Database>, teamId: string, userId: string): Promise<boolean> {
	const result = await db.deleteFrom('team_member').where('team_id', '=', teamId).where('user_id', '=', userId).executeTakeFirst();
	return Number(result.numDeletedRows) > 0;
}
