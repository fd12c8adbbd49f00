// Row counts of everything a workspace's people and teams own, so "nothing was written" can be checked
// in a database other engineers write to at the same time.
import { sql } from 'kysely';
import { getDb } from '../../../../src/lib/server/db';

export type RowCounts = Record<string, number>;

export async function workspaceRowCounts(teamIds: string[], userIds: string[], domain: string): Promise<RowCounts> {
	const db = getDb();
	const r = await sql<RowCounts>`
		select
			(select count(*) from app_user where email like ${'%@' + domain})::int as app_user,
			(select count(*) from team_member where user_id = any(${userIds}) or team_id = any(${teamIds}))::int as team_member,
			(select count(*) from team t join team_member m on m.team_id = t.id where m.user_id = any(${userIds}))::int as team,
			(select count(*) from team_invite where team_id = any(${teamIds}))::int as team_invite,
			(select count(*) from password_reset where user_id = any(${userIds}))::int as password_reset,
			(select count(*) from laminate where team_id = any(${teamIds}))::int as laminate,
			(select count(*) from design where team_id = any(${teamIds}))::int as design,
			(select count(*) from revision r join design d on d.id = r.design_id where d.team_id = any(${teamIds}))::int as revision,
			(select count(*) from sweep_plan p join revision r on r.id = p.revision_id join design d on d.id = r.design_id where d.team_id = any(${teamIds}))::int as sweep_plan,
			(select count(*) from measurement m join revision r on r.id = m.revision_id join design d on d.id = r.design_id where d.team_id = any(${teamIds}))::int as measurement,
			(select count(*) from export_record where team_id = any(${teamIds}))::int as export_record,
			(select count(*) from api_token where user_id = any(${userIds}) and revoked_at is null)::int as live_api_token
	`.execute(db);
	return r.rows[0];
}
