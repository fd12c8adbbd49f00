// Security events: insert one, list a team's newest first, count (tests and the fuzz check of "nothing written").
import type { Kysely } from 'kysely';
import type { Database } from './database';
import type { InsertableAuditEventRow } from './audit-event.table';
import './audit-event.table';

export async function insertAuditEvent(db: Kysely<Database>, row: InsertableAuditEventRow): Promise<void> {
	await db.insertInto('audit_event').values(row).execute();
}

export async function listAuditEventsByTeam(db: Kysely<Database>, teamId: string, limit: number) {
	return db
		.selectFrom('audit_event')
		.leftJoin('app_user', 'app_user.id', 'audit_event.actor_user_id')
		.select(['audit_event.id', 'audit_event.kind', 'audit_event.details', 'audit_event.created_at', 'audit_event.actor_user_id', 'app_user.email as actor_email', 'app_user.display_name as actor_name'])
		// The team's own events, and the team-less ones (failed sign-ins) against its members' accounts.
		.where((eb) =>
			eb.or([
				eb('audit_event.team_id', '=', teamId),
				eb.and([eb('audit_event.team_id', 'is', null), eb('audit_event.actor_user_id', 'in', eb.selectFrom('team_member').select('team_member.user_id').where('team_member.team_id', '=', teamId))])
			])
		)
		.orderBy('audit_event.created_at', 'desc')
		.orderBy('audit_event.id')
		.limit(limit)
		.execute();
}

export async function listAuditEventsByActor(db: Kysely<Database>, actorUserId: string) {
	return db.selectFrom('audit_event').selectAll().where('actor_user_id', '=', actorUserId).orderBy('created_at').execute();
}
