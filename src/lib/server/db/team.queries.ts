// Team and membership queries.
import type { Kysely } from 'kysely';
import type { Database } from './database';
import type { TeamRole } from './team.table';

export async function findRoleByTeamAndUser(db: Kysely<Database>, teamId: string, userId: string): Promise<TeamRole | null> {
	const row = await db.selectFrom('team_member').select('role').where('team_id', '=', teamId).where('user_id', '=', userId).executeTakeFirst();
	return row?.role ?? null;
}

export async function listTeamsByUser(db: Kysely<Database>, userId: string) {
	return db
		.selectFrom('team_member')
		.innerJoin('team', 'team.id', 'team_member.team_id')
		.select(['team.id', 'team.name', 'team_member.role'])
		.where('team_member.user_id', '=', userId)
		.orderBy('team.name')
		.execute();
}
