// Teams, roles, invites, password resets, laminates, designs with immutable revisions, export records, API tokens.
import { sql, type Kysely } from 'kysely';

export async function up(db: Kysely<any>): Promise<void> {
	await db.schema
		.createTable('team')
		.addColumn('id', 'text', (c) => c.primaryKey())
		.addColumn('name', 'text', (c) => c.notNull())
		.addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
		.execute();

	await db.schema
		.createTable('team_member')
		.addColumn('team_id', 'text', (c) => c.notNull().references('team.id').onDelete('cascade'))
		.addColumn('user_id', 'text', (c) => c.notNull().references('app_user.id').onDelete('cascade'))
		.addColumn('role', 'text', (c) => c.notNull())
		.addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
		.addPrimaryKeyConstraint('team_member_pk', ['team_id', 'user_id'])
		.addCheckConstraint('team_member_role', sql`role in ('owner', 'editor', 'viewer')`)
		.execute();
	await db.schema.createIndex('team_member_user_id').on('team_member').column('user_id').execute();

	await db.schema
		.createTable('team_invite')
		.addColumn('id', 'text', (c) => c.primaryKey())
		.addColumn('team_id', 'text', (c) => c.notNull().references('team.id').onDelete('cascade'))
		.addColumn('email', 'text', (c) => c.notNull())
		.addColumn('role', 'text', (c) => c.notNull())
		.addColumn('token_hash', 'text', (c) => c.notNull().unique())
		.addColumn('invited_by', 'text', (c) => c.notNull().references('app_user.id'))
		.addColumn('expires_at', 'timestamptz', (c) => c.notNull())
		.addColumn('accepted_at', 'timestamptz')
		.addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
		.addCheckConstraint('team_invite_role', sql`role in ('owner', 'editor', 'viewer')`)
		.execute();

	await db.schema
		.createTable('password_reset')
		.addColumn('id', 'text', (c) => c.primaryKey())
		.addColumn('user_id', 'text', (c) => c.notNull().references('app_user.id').onDelete('cascade'))
		.addColumn('token_hash', 'text', (c) => c.notNull().unique())
		.addColumn('expires_at', 'timestamptz', (c) => c.notNull())
		.addColumn('used_at', 'timestamptz')
		.addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
		.execute();

	await db.schema
		.createTable('laminate')
		.addColumn('id', 'text', (c) => c.primaryKey())
		.addColumn('team_id', 'text', (c) => c.notNull().references('team.id').onDelete('cascade'))
		.addColumn('name', 'text', (c) => c.notNull())
		.addColumn('properties', 'jsonb', (c) => c.notNull())
		.addColumn('created_by', 'text', (c) => c.notNull().references('app_user.id'))
		.addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
		.addUniqueConstraint('laminate_team_name', ['team_id', 'name'])
		.execute();

	await db.schema
		.createTable('design')
		.addColumn('id', 'text', (c) => c.primaryKey())
		.addColumn('team_id', 'text', (c) => c.notNull().references('team.id').onDelete('cascade'))
		.addColumn('slug', 'text', (c) => c.notNull())
		.addColumn('name', 'text', (c) => c.notNull())
		.addColumn('created_by', 'text', (c) => c.notNull().references('app_user.id'))
		.addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
		.addUniqueConstraint('design_team_slug', ['team_id', 'slug'])
		.execute();

	await db.schema
		.createTable('revision')
		.addColumn('id', 'text', (c) => c.primaryKey())
		.addColumn('design_id', 'text', (c) => c.notNull().references('design.id').onDelete('cascade'))
		.addColumn('label', 'text', (c) => c.notNull())
		.addColumn('seq', 'integer', (c) => c.notNull())
		.addColumn('parent_id', 'text', (c) => c.references('revision.id'))
		.addColumn('input', 'jsonb', (c) => c.notNull())
		.addColumn('results', 'jsonb', (c) => c.notNull())
		.addColumn('note', 'text', (c) => c.notNull().defaultTo(''))
		.addColumn('created_by', 'text', (c) => c.notNull().references('app_user.id'))
		.addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`date_trunc('second', now())`))
		.addUniqueConstraint('revision_design_label', ['design_id', 'label'])
		.addUniqueConstraint('revision_design_seq', ['design_id', 'seq'])
		.execute();
	// A revision is immutable: no update path in the code, and the database refuses one too.
	// (Deleting the whole design cascades; deleting a single revision is refused.)
	await sql`
		create function revision_is_immutable() returns trigger language plpgsql as $$
		begin
			if tg_op = 'DELETE' and pg_trigger_depth() > 1 then return old; end if;
			raise exception 'revisions are immutable: % refused on revision %', tg_op, old.id using errcode = 'check_violation';
		end $$`.execute(db);
	await sql`create trigger revision_no_update before update on revision for each row execute function revision_is_immutable()`.execute(db);
	await sql`create trigger revision_no_delete before delete on revision for each row execute function revision_is_immutable()`.execute(db);

	await db.schema
		.createTable('export_record')
		.addColumn('id', 'text', (c) => c.primaryKey())
		.addColumn('team_id', 'text', (c) => c.notNull().references('team.id').onDelete('cascade'))
		.addColumn('design_id', 'text', (c) => c.notNull().references('design.id').onDelete('cascade'))
		.addColumn('revision_id', 'text', (c) => c.notNull().references('revision.id').onDelete('cascade'))
		.addColumn('user_id', 'text', (c) => c.notNull().references('app_user.id'))
		.addColumn('via', 'text', (c) => c.notNull())
		.addColumn('kind', 'text', (c) => c.notNull())
		.addColumn('files', 'jsonb', (c) => c.notNull())
		.addColumn('sha256', 'text', (c) => c.notNull())
		.addColumn('waiver', 'text')
		.addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
		.addCheckConstraint('export_record_via', sql`via in ('ui', 'api', 'cli')`)
		.execute();
	await db.schema.createIndex('export_record_team_created').on('export_record').columns(['team_id', 'created_at']).execute();
	await db.schema.createIndex('export_record_design').on('export_record').column('design_id').execute();

	await db.schema
		.createTable('api_token')
		.addColumn('id', 'text', (c) => c.primaryKey())
		.addColumn('team_id', 'text', (c) => c.notNull().references('team.id').onDelete('cascade'))
		.addColumn('user_id', 'text', (c) => c.notNull().references('app_user.id').onDelete('cascade'))
		.addColumn('name', 'text', (c) => c.notNull())
		.addColumn('token_hash', 'text', (c) => c.notNull().unique())
		.addColumn('last_used_at', 'timestamptz')
		.addColumn('revoked_at', 'timestamptz')
		.addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
		.execute();
}

export async function down(db: Kysely<any>): Promise<void> {
	for (const t of ['api_token', 'export_record']) await db.schema.dropTable(t).execute();
	await sql`drop trigger if exists revision_no_update on revision`.execute(db);
	await sql`drop trigger if exists revision_no_delete on revision`.execute(db);
	await db.schema.dropTable('revision').execute();
	await sql`drop function if exists revision_is_immutable()`.execute(db);
	for (const t of ['design', 'laminate', 'password_reset', 'team_invite', 'team_member', 'team']) await db.schema.dropTable(t).execute();
}
