// The security events we record, and a sentence for each on the team's audit page.
export const auditKinds = ['signin.failed', 'member.role-changed', 'member.removed', 'token.created', 'token.revoked', 'export.waived', 'measurement.deleted', 'invite.sent', 'invite.revoked', 'invite.accepted'] as const;
export type AuditKind = (typeof auditKinds)[number];

export const auditKindLabel: Record<AuditKind, string> = {
	'signin.failed': 'Failed sign-in',
	'member.role-changed': 'Role changed',
	'member.removed': 'Member removed',
	'token.created': 'API token created',
	'token.revoked': 'API token revoked',
	'export.waived': 'Design-rule waiver on an export',
	'measurement.deleted': 'Measurement deleted',
	'invite.sent': 'Invitation sent',
	'invite.revoked': 'Invitation revoked',
	'invite.accepted': 'Invitation accepted'
};
