// Writing one security event; pass a transaction to make it part of the change it describes.
import { randomUUID } from 'node:crypto';
import type { Kysely } from 'kysely';
import { getDb, type Database } from '../db';
import * as auditQueries from '../db/audit-event.queries';
import type { AuditKind } from './audit-kind';

export interface AuditEventInput {
	kind: AuditKind;
	teamId: string | null;
	actorUserId: string | null;
	details?: Record<string, unknown>;
}

export async function recordAuditEvent(event: AuditEventInput, db: Kysely<Database> = getDb()): Promise<void> {
	await auditQueries.insertAuditEvent(db, {
		id: randomUUID(),
		team_id: event.teamId,
		actor_user_id: event.actorUserId,
		kind: event.kind,
		details: JSON.stringify(event.details ?? {})
	});
}
