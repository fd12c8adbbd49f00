// A plan's sweep download gets its own export kind, 'sweep-plan', and names its plan (export_record.sweep_plan_id);
// 'sweep' stays the revision's own sweep definition. Before, both were 'sweep', so the export log compared a plan's
// file with the design sweep (or another plan's) and reported "differs from earlier export".
// Existing plan downloads are found by their file name, "<design>-<label>.sweep-<plan slug>.sweep.json" (the design
// sweep is "<design>-<label>.sweep.json"), and linked to the plan of their revision whose name gives that slug; when
// two plans of one revision share a slug the link stays NULL and the log compares such rows by file name.
import { sql, type Kysely } from 'kysely';

export async function up(db: Kysely<any>): Promise<void> {
	// No ON DELETE action: plans and their export records only go away together, with their revision's design.
	await db.schema
		.alterTable('export_record')
		.addColumn('sweep_plan_id', 'text', (c) => c.references('sweep_plan.id'))
		.execute();
	await db.schema.createIndex('export_record_sweep_plan').on('export_record').column('sweep_plan_id').execute();

	await sql`
		update export_record set kind = 'sweep-plan'
		where kind = 'sweep' and files->0->>'name' like '%.sweep-%.sweep.json'
	`.execute(db);

	// The plan's slug as the app makes it (formats/export-meta.ts toSlug(name, 40, 'plan')): accents dropped,
	// lowercase, runs of other characters one hyphen, trimmed, at most 40 characters.
	await sql`
		with slugged as (
			select p.id, p.revision_id,
				coalesce(nullif(regexp_replace(left(trim(both '-' from regexp_replace(lower(regexp_replace(normalize(p.name, NFKD), '[\u0300-\u036f]', '', 'g')), '[^a-z0-9]+', '-', 'g')), 40), '-+$', ''), ''), 'plan') as slug
			from sweep_plan p
		),
		matched as (
			select e.id as export_id, min(s.id) as plan_id, count(*) as candidates
			from export_record e
			join slugged s on s.revision_id = e.revision_id and e.files->0->>'name' like '%.sweep-' || s.slug || '.sweep.json'
			where e.kind = 'sweep-plan'
			group by e.id
		)
		update export_record e set sweep_plan_id = m.plan_id
		from matched m
		where e.id = m.export_id and m.candidates = 1
	`.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
	await sql`update export_record set kind = 'sweep' where kind = 'sweep-plan'`.execute(db);
	await db.schema.dropIndex('export_record_sweep_plan').execute();
	await db.schema.alterTable('export_record').dropColumn('sweep_plan_id').execute();
}
