// fab_profile: a team's own fab capability profiles (properties checked by the app's fab-profile schema; the
// built-in profile lives in code, not here). revision.fab_profile: the profile values a revision is checked
// against, written when the revision is inserted (the immutability trigger refuses any later update).
import { sql, type Kysely } from 'kysely';

/**
 * What a new revision records when the app names no profile: the built-in "standard quick-turn two-layer"
 * values as they were when this migration landed (a copy, since migrations import nothing from src/;
 * tests/integration/drc/fab-profiles.test.ts fails if the code's built-in drifts from it). Revisions made
 * before this migration keep NULL: they were never checked, and the app reads NULL as the built-in.
 */
const BUILT_IN_AT_LANDING = {
	name: 'standard quick-turn two-layer',
	minTraceWidthMm: 0.15,
	minSpacingMm: 0.15,
	minDrillMm: 0.3,
	minAnnularRingMm: 0.15,
	copperToEdgeMm: 0.3,
	minSlotWidthMm: 0.2,
	etchToleranceMm: 0.05,
	platedDrillToleranceMm: 0.075,
	nonPlatedDrillToleranceMm: 0.05
};

export async function up(db: Kysely<any>): Promise<void> {
	await db.schema
		.createTable('fab_profile')
		.addColumn('id', 'text', (c) => c.primaryKey())
		.addColumn('team_id', 'text', (c) => c.notNull().references('team.id').onDelete('cascade'))
		.addColumn('name', 'text', (c) => c.notNull())
		.addColumn('properties', 'jsonb', (c) => c.notNull())
		.addColumn('created_by', 'text', (c) => c.notNull().references('app_user.id'))
		.addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
		.addUniqueConstraint('fab_profile_team_name', ['team_id', 'name'])
		.addCheckConstraint('fab_profile_properties_object', sql`jsonb_typeof(properties) = 'object'`)
		.execute();

	// Added without a default first, so existing revisions stay NULL (ADD COLUMN … DEFAULT would fill them).
	await db.schema.alterTable('revision').addColumn('fab_profile', 'jsonb').execute();
	await sql`alter table revision alter column fab_profile set default ${sql.lit(JSON.stringify(BUILT_IN_AT_LANDING))}::jsonb`.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
	await db.schema.alterTable('revision').dropColumn('fab_profile').execute();
	await db.schema.dropTable('fab_profile').execute();
}
