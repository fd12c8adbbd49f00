// Export records: one row per download, and the team's export log (filtered, sorted, paged, each row with its earliest twin).
import { sql, type Kysely } from 'kysely';
import type { ExportLogQuery } from '$lib/schemas/api';
import type { Database } from './database';
import type { ExportedFile, ExportVia, InsertableExportRecordRow } from './export-record.table';

export async function insertExportRecord(db: Kysely<Database>, row: Omit<InsertableExportRecordRow, 'files'> & { files: ExportedFile[] }) {
	return db
		.insertInto('export_record')
		.values({ ...row, files: JSON.stringify(row.files) })
		.returning(['id', 'created_at'])
		.executeTakeFirstOrThrow();
}

export async function findExportById(db: Kysely<Database>, id: string) {
	return db.selectFrom('export_record').selectAll().where('id', '=', id).executeTakeFirst();
}

export async function countExportsByRevision(db: Kysely<Database>, revisionId: string): Promise<number> {
	const row = await db.selectFrom('export_record').select((eb) => eb.fn.countAll<string>().as('n')).where('revision_id', '=', revisionId).executeTakeFirstOrThrow();
	return Number(row.n);
}

/** One log row as the database gives it (snake_case; mapped to the domain in server/exports). */
export interface ExportLogRow {
	id: string;
	created_at: Date;
	design_id: string;
	design_name: string;
	revision_label: string;
	kind: string;
	sweep_plan_id: string | null;
	sweep_plan_name: string | null;
	via: ExportVia;
	user_display_name: string;
	files: ExportedFile[];
	/** Length of the delivered bytes (what sha256 covers); null for a zip recorded before the length was stored. */
	size_bytes: number | null;
	sha256: string;
	/** The reason given when the export went out despite design-rule violations; null when it was clean. */
	waiver: string | null;
	earlier_id: string | null;
	earlier_created_at: Date | null;
	earlier_matches: boolean | null;
}

/** `%` and `_` are wildcards in LIKE; a searched text means itself. */
function likePattern(text: string): string {
	return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

export async function listExportsByTeam(db: Kysely<Database>, teamId: string, query: ExportLogQuery): Promise<{ rows: ExportLogRow[]; total: number }> {
	let base = db
		.selectFrom('export_record as e')
		.innerJoin('design as d', 'd.id', 'e.design_id')
		.innerJoin('revision as r', 'r.id', 'e.revision_id')
		.innerJoin('app_user as u', 'u.id', 'e.user_id')
		.leftJoin('sweep_plan as sp', 'sp.id', 'e.sweep_plan_id')
		.where('e.team_id', '=', teamId);
	if (query.designId) base = base.where('e.design_id', '=', query.designId);
	if (query.kind) base = base.where('e.kind', '=', query.kind);
	if (query.via) base = base.where('e.via', '=', query.via);
	if (query.q) {
		const pattern = likePattern(query.q);
		base = base.where((eb) =>
			eb.or([
				eb('d.name', 'ilike', pattern),
				eb('r.label', 'ilike', pattern),
				eb('u.display_name', 'ilike', pattern),
				eb('e.kind', 'ilike', pattern),
				eb('e.sha256', 'ilike', pattern)
			])
		);
	}

	const totalRow = await base.select((eb) => eb.fn.countAll<string>().as('n')).executeTakeFirstOrThrow();

	const sortColumn = {
		createdAt: sql`e.created_at`,
		design: sql`lower(d.name)`,
		revision: sql`r.seq`,
		kind: sql`e.kind`,
		via: sql`e.via`,
		user: sql`lower(u.display_name)`,
		// Unknown sizes (old zips) sort after every known one, in both directions.
		sizeBytes: sql`e.size_bytes`
	}[query.sort];
	const direction = query.order === 'asc' ? sql`asc nulls last` : sql`desc nulls last`;

	const rows = await base
		.leftJoinLateral(
			(eb) =>
				eb
					.selectFrom('export_record as p')
					.select(['p.id', 'p.created_at', 'p.sha256', 'p.files'])
					.whereRef('p.revision_id', '=', 'e.revision_id')
					.whereRef('p.kind', '=', 'e.kind')
					// Like with like: a plan's sweep only with downloads of the same plan (rows of a plan the migration
					// could not tell apart from another of the same name are compared by file name).
					.where(sql<boolean>`p.sweep_plan_id is not distinct from e.sweep_plan_id`)
					.where(sql<boolean>`(e.kind <> 'sweep-plan' or e.sweep_plan_id is not null or p.files->0->>'name' = e.files->0->>'name')`)
					.where(sql<boolean>`(p.created_at, p.id) < (e.created_at, e.id)`)
					.orderBy('p.created_at', 'asc')
					.orderBy('p.id', 'asc')
					.limit(1)
					.as('p'),
			(join) => join.onTrue()
		)
		.select([
			'e.id',
			'e.created_at',
			'e.design_id',
			'd.name as design_name',
			'r.label as revision_label',
			'e.kind',
			'e.sweep_plan_id',
			'sp.name as sweep_plan_name',
			'e.via',
			'u.display_name as user_display_name',
			'e.files',
			'e.sha256',
			'e.size_bytes',
			'e.waiver',
			'p.id as earlier_id',
			'p.created_at as earlier_created_at'
		])
		.select(sql<boolean | null>`case when p.id is null then null else (p.sha256 = e.sha256 and p.files = e.files) end`.as('earlier_matches'))
		.orderBy(sql`${sortColumn} ${direction}`)
		.orderBy(sql`e.created_at ${direction}`)
		.orderBy(sql`e.id ${direction}`)
		.limit(query.pageSize)
		.offset((query.page - 1) * query.pageSize)
		.execute();

	return { rows: rows as ExportLogRow[], total: Number(totalRow.n) };
}
