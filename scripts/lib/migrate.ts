// Runs every migration in migrations/ that has not run yet, printing each result.
import { promises as fs } from 'node:fs';
import path from 'node:path';
import { Kysely, PostgresDialect } from 'kysely';
import { Migrator, type Migration, type MigrationProvider } from 'kysely/migration';
import { tsImport } from 'tsx/esm/api';
import pg from 'pg';
import { rootDir } from './config.ts';

/** Every migrations/*.ts, loaded through tsx so that plain Node, tsx and vitest all read TypeScript. */
function migrationFolderProvider(folder: string): MigrationProvider {
	return {
		async getMigrations() {
			const migrations: Record<string, Migration> = {};
			for (const file of (await fs.readdir(folder)).filter((f) => f.endsWith('.ts')).sort()) {
				migrations[file.slice(0, -3)] = (await tsImport(path.join(folder, file), import.meta.url)) as Migration;
			}
			return migrations;
		}
	};
}

/** `folder`: where the migrations are (migrations/ by default; tests pass a scratch folder). */
export async function migrateToLatest(databaseUrl: string, log: (line: string) => void = console.log, folder = path.join(rootDir, 'migrations')): Promise<number> {
	const db = new Kysely<unknown>({ dialect: new PostgresDialect({ pool: new pg.Pool({ connectionString: databaseUrl, max: 1 }) }) });
	try {
		const migrator = new Migrator({
			db,
			provider: migrationFolderProvider(folder),
			migrationTableName: 'schema_migration',
			migrationLockTableName: 'schema_migration_lock'
		});
		const { error, results } = await migrator.migrateToLatest();
		for (const r of results ?? []) log(`migration ${r.migrationName}: ${r.status === 'Success' ? 'applied' : r.status.toLowerCase()}`);
		if (error) throw new Error(`migration failed: ${error instanceof Error ? error.message : String(error)}`);
		return (results ?? []).filter((r) => r.status === 'Success').length;
	} finally {
		await db.destroy();
	}
}
