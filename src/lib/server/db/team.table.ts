// team and team_member: who belongs to which team, in which role.
import type { ColumnType, Insertable, Selectable } from 'kysely';

export type TeamRole = 'owner' | 'editor' | 'viewer';

export interface TeamTable {
	id: string;
	name: string;
	created_at: ColumnType<Date, Date | string | undefined, never>;
}
export type TeamRow = Selectable<TeamTable>;
export type InsertableTeamRow = Insertable<TeamTable>;

export interface TeamMemberTable {
	team_id: string;
	user_id: string;
	role: TeamRole;
	created_at: ColumnType<Date, Date | string | undefined, never>;
}
export type TeamMemberRow = Selectable<TeamMemberTable>;
