// Security events: written by the services that make the change, read by team owners.
export { recordAuditEvent, type AuditEventInput } from './record-audit-event';
export { listTeamAuditEvents, AUDIT_PAGE_SIZE, type AuditEventView } from './list-audit-events';
export { auditKinds, auditKindLabel, type AuditKind } from './audit-kind';
