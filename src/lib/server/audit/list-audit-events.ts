// A team's security events for its owners' audit page, newest first.
import { getDb } from '../db';
import * as auditQueries from '../db/audit-event.queries';
import { auditKindLabel, type AuditKind } from './audit-kind';

export const AUDIT_PAGE_SIZE = 200;

export interface AuditEventView {
	id: string;
	kind: string;
	label: string;
	actor: string;
	details: Record<string, unknown>;
	createdAt: Date;
}

export async function listTeamAuditEvents(teamId: string): Promise<AuditEventView[]> {
	const rows = await auditQueries.listAuditEventsByTeam(getDb(), teamId, AUDIT_PAGE_SIZE);
	return rows.map((r) => ({
		id: r.id,
		kind: r.kind,
		label: auditKindLabel[r.kind as AuditKind] ?? r.kind,
		// A failed sign-in's account is the one tried, not who tried it.
		actor: !r.actor_name ? 'nobody identified' : r.kind === 'signin.failed' ? `someone, as ${r.actor_name} <${r.actor_email}>` : `${r.actor_name} <${r.actor_email}>`,
		details: r.details,
		createdAt: r.created_at
	}));
}
