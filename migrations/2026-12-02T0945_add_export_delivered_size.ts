// export_record.size_bytes: the length of the bytes the record's sha256 covers (the zip for a bundle or a several-file
// format, the file itself for a single file). Before, the export log showed the sum of the files inside, which for a
// zip is not the size of what was hashed and delivered.
// Backfill: a record of exactly one file whose hash is the delivery's hash delivered that file, so its size is the
// file's size. A zip's length was never stored and cannot be told from its entries: those rows stay NULL ("—").
import { sql, type Kysely } from 'kysely';

export async function up(db: Kysely<any>): Promise<void> {
	await db.schema
		.alterTable('export_record')
		.addColumn('size_bytes', 'integer', (c) => c.check(sql`size_bytes >= 0`))
		.execute();
	await sql`
		update export_record set size_bytes = (files->0->>'sizeBytes')::integer
		where jsonb_array_length(files) = 1 and files->0->>'sha256' = sha256 and files->0->>'sizeBytes' ~ '^[0-9]{1,9}$'
	`.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
	await db.schema.alterTable('export_record').dropColumn('size_bytes').execute();
}
