// Laminate library queries: a team's own laminates (the built-in presets live in code, not here).
import type { Kysely } from 'kysely';
import type { Database } from './database';
import type { InsertableLaminateRow } from './laminate.table';

export async function listLaminatesByTeam(db: Kysely<Database>, teamId: string) {
	return db
		.selectFrom('laminate')
		.select(['id', 'team_id', 'name', 'properties', 'created_by', 'created_at'])
		.where('team_id', '=', teamId)
		.orderBy('name')
		.execute();
}

export async function findLaminateByTeamAndName(db: Kysely<Database>, teamId: string, name: string) {
	return db.selectFrom('laminate').select(['id']).where('team_id', '=', teamId).where('name', '=', name).executeTakeFirst();
}

export async function insertLaminate(db: Kysely<Database>, row: InsertableLaminateRow): Promise<void> {
	await db.insertInto('laminate').values(row).execute();
}
