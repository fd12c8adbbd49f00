// The typed Database: one entry per table, each defined in its own <table>.table.ts.
import type { ApiTokenTable } from './api-token.table';
import type { AppUserTable } from './app-user.table';
import type { DesignTable, RevisionTable } from './design.table';
import type { EmailVerificationTable } from './email-verification.table';
import type { ExportRecordTable } from './export-record.table';
import type { FabProfileTable } from './fab-profile.table';
import type { FieldCheckTable } from './field-check.table';
import type { LaminateTable } from './laminate.table';
import type { MeasurementTable } from './measurement.table';
import type { PasswordResetTable } from './password-reset.table';
import type { RateLimitTable } from './rate-limit.table';
import type { SweepPlanTable } from './sweep-plan.table';
import type { TeamInviteTable } from './team-invite.table';
import type { TeamMemberTable, TeamTable } from './team.table';
import type { UserSessionTable } from './user-session.table';

export interface Database {
	app_user: AppUserTable;
	user_session: UserSessionTable;
	team: TeamTable;
	team_member: TeamMemberTable;
	team_invite: TeamInviteTable;
	password_reset: PasswordResetTable;
	email_verification: EmailVerificationTable;
	laminate: LaminateTable;
	design: DesignTable;
	revision: RevisionTable;
	export_record: ExportRecordTable;
	api_token: ApiTokenTable;
	sweep_plan: SweepPlanTable;
	measurement: MeasurementTable;
	fab_profile: FabProfileTable;
	rate_limit: RateLimitTable;
	field_check: FieldCheckTable;
}
