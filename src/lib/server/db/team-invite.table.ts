// team_invite: single-use, expiring invitations sent by e-mail (only the token's hash is stored).
import type { ColumnType, Insertable, Selectable } from 'kysely';
import type { TeamRole } from './team.table';

export interface TeamInviteTable {
	id: string;
	team_id: string;
	email: string;
	role: TeamRole;
	token_hash: string;
	invited_by: string;
	expires_at: Date;
	accepted_at: Date | null;
	created_at: ColumnType<Date, Date | string | undefined, never>;
}
export type TeamInviteRow = Selectable<TeamInviteTable>;
export type InsertableTeamInviteRow = Insertable<TeamInviteTable>;
