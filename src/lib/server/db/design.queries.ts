// Design and revision queries. Revisions are only ever inserted: there is no update here by design.
import type { Kysely } from 'kysely';
import type { Database } from './database';
import type { InsertableDesignRow, InsertableRevisionRow } from './design.table';

export async function insertDesign(db: Kysely<Database>, row: InsertableDesignRow): Promise<void> {
	await db.insertInto('design').values(row).execute();
}

export async function findDesignById(db: Kysely<Database>, id: string) {
	return db.selectFrom('design').selectAll().where('id', '=', id).executeTakeFirst();
}

export async function findDesignByTeamAndSlug(db: Kysely<Database>, teamId: string, slug: string) {
	return db.selectFrom('design').selectAll().where('team_id', '=', teamId).where('slug', '=', slug).executeTakeFirst();
}

/** Slugs in a team equal to `base` or of the form `base-N`. */
export async function listSlugsByTeamAndBase(db: Kysely<Database>, teamId: string, base: string): Promise<string[]> {
	const rows = await db
		.selectFrom('design')
		.select('slug')
		.where('team_id', '=', teamId)
		.where((eb) => eb.or([eb('slug', '=', base), eb('slug', 'like', `${base}-%`)]))
		.execute();
	return rows.map((r) => r.slug);
}

/** A team's designs with their revision count and latest revision, newest activity first. */
export async function listDesignsByTeam(db: Kysely<Database>, teamId: string) {
	return db
		.selectFrom('design')
		.innerJoin('app_user', 'app_user.id', 'design.created_by')
		.select((eb) => [
			'design.id',
			'design.slug',
			'design.name',
			'design.created_at',
			'app_user.display_name as created_by_name',
			eb.selectFrom('revision').select(eb.fn.countAll<string>().as('n')).whereRef('revision.design_id', '=', 'design.id').as('revision_count'),
			eb.selectFrom('revision').select('revision.label').whereRef('revision.design_id', '=', 'design.id').orderBy('revision.seq', 'desc').limit(1).as('latest_label'),
			eb.selectFrom('revision').select('revision.created_at').whereRef('revision.design_id', '=', 'design.id').orderBy('revision.seq', 'desc').limit(1).as('latest_at'),
			eb.selectFrom('revision').select('revision.input').whereRef('revision.design_id', '=', 'design.id').orderBy('revision.seq', 'desc').limit(1).as('latest_input')
		])
		.where('design.team_id', '=', teamId)
		.orderBy('latest_at', 'desc')
		.orderBy('design.name')
		.execute();
}

/** Locks the design row until the transaction ends, so revisions of one design get their labels one at a time. */
export async function lockDesignById(db: Kysely<Database>, id: string) {
	return db.selectFrom('design').select(['id', 'team_id']).where('id', '=', id).forUpdate().executeTakeFirst();
}

export async function findMaxRevisionSeqByDesign(db: Kysely<Database>, designId: string): Promise<number> {
	const row = await db.selectFrom('revision').select((eb) => eb.fn.max('seq').as('max_seq')).where('design_id', '=', designId).executeTakeFirst();
	return Number(row?.max_seq ?? 0);
}

export async function insertRevision(db: Kysely<Database>, row: InsertableRevisionRow): Promise<void> {
	await db.insertInto('revision').values(row).execute();
}

const revisionColumns = [
	'revision.id',
	'revision.design_id',
	'revision.label',
	'revision.seq',
	'revision.parent_id',
	'revision.input',
	'revision.results',
	'revision.note',
	'revision.created_by',
	'revision.created_at',
	'app_user.display_name as created_by_name'
] as const;

export async function listRevisionsByDesign(db: Kysely<Database>, designId: string) {
	return db
		.selectFrom('revision')
		.innerJoin('app_user', 'app_user.id', 'revision.created_by')
		.select(revisionColumns)
		.where('revision.design_id', '=', designId)
		.orderBy('revision.seq')
		.execute();
}

export async function findRevisionByDesignAndLabel(db: Kysely<Database>, designId: string, label: string) {
	return db
		.selectFrom('revision')
		.innerJoin('app_user', 'app_user.id', 'revision.created_by')
		.select(revisionColumns)
		.where('revision.design_id', '=', designId)
		.where('revision.label', '=', label)
		.executeTakeFirst();
}

export async function findRevisionLabelById(db: Kysely<Database>, id: string) {
	return db.selectFrom('revision').select(['label', 'design_id']).where('id', '=', id).executeTakeFirst();
}
