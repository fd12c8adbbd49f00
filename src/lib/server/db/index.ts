// The one pool and the one Kysely instance of this process, created on first use.
import { Kysely, PostgresDialect } from 'kysely';
import pg from 'pg';
import type { Database } from './database';

export type { Database } from './database';

let pool: pg.Pool | undefined;
let db: Kysely<Database> | undefined;

function databaseUrl(): string {
	const url = process.env.DATABASE_URL;
	if (!url) throw new Error('DATABASE_URL is not set (npm start and npm test set it; see README)');
	return url;
}

export function getPool(): pg.Pool {
	pool ??= new pg.Pool({
		connectionString: databaseUrl(),
		max: Number(process.env.DATABASE_POOL_SIZE || 10),
		connectionTimeoutMillis: 5000,
		idleTimeoutMillis: 30_000
	});
	// A dropped connection must not crash the process; the next query reconnects.
	pool.on('error', (err) => console.error(`database pool: ${err.message}`));
	return pool;
}

export function getDb(): Kysely<Database> {
	db ??= new Kysely<Database>({ dialect: new PostgresDialect({ pool: getPool() }) });
	return db;
}

/** Ends the pool (tests and scripts). */
export async function closeDb(): Promise<void> {
	const current = db;
	db = undefined;
	pool = undefined;
	await current?.destroy();
}
