// Fab profile queries: a team's own profiles (the built-in one lives in code), and the profile a revision recorded.
import type { Kysely } from 'kysely';
import type { Database } from './database';
import type { InsertableFabProfileRow } from './fab-profile.table';

export async function listFabProfilesByTeam(db: Kysely<Database>, teamId: string) {
	return db.selectFrom('fab_profile').select(['id', 'team_id', 'name', 'properties', 'created_at']).where('team_id', '=', teamId).orderBy('name').execute();
}

export async function findFabProfileByTeamAndId(db: Kysely<Database>, teamId: string, id: string) {
	return db.selectFrom('fab_profile').select(['id', 'name', 'properties']).where('team_id', '=', teamId).where('id', '=', id).executeTakeFirst();
}

export async function findFabProfileByTeamAndName(db: Kysely<Database>, teamId: string, name: string) {
	return db.selectFrom('fab_profile').select(['id']).where('team_id', '=', teamId).where('name', '=', name).executeTakeFirst();
}

export async function insertFabProfile(db: Kysely<Database>, row: InsertableFabProfileRow): Promise<void> {
	await db.insertInto('fab_profile').values(row).execute();
}

/** The recorded profile of one revision (null for revisions older than the gate). */
export async function findFabProfileByRevisionId(db: Kysely<Database>, revisionId: string): Promise<unknown> {
	const row = await db.selectFrom('revision').select('fab_profile').where('id', '=', revisionId).executeTakeFirst();
	return row?.fab_profile ?? null;
}
