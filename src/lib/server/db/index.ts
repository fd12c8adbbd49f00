// The one pool and the one Kysely instance of this process, created on first use. Every way into the
// pool (connect, query, and the queries of a checked-out client) turns connection-class errors into
// HttpError 503 (database-unavailable.ts), so a stopped PostgreSQL answers "try again shortly", and
// the pool reconnects by itself once the server is back.
import { Kysely, PostgresDialect } from 'kysely';
import pg from 'pg';
import type { Database } from './database';
import { toDataExceptionRefusal, toDatabaseUnavailable } from './database-unavailable';

export type { Database } from './database';
export { isDatabaseBusy, isDatabaseUnavailable, DATABASE_UNAVAILABLE_MESSAGE, DATABASE_BUSY_MESSAGE } from './database-unavailable';

let pool: pg.Pool | undefined;
let db: Kysely<Database> | undefined;

function databaseUrl(): string {
	const url = process.env.DATABASE_URL;
	if (!url) throw new Error('DATABASE_URL is not set (npm start and npm test set it; see README)');
	return url;
}

const guarded = Symbol('fringefield.guarded');

type Queryable = { query: (...args: unknown[]) => unknown; [guarded]?: true };

/** Wraps `target.query` (promise form only; the callback form is left to pg) once. */
function guardQuery(target: Queryable): void {
	if (target[guarded]) return;
	target[guarded] = true;
	const query = target.query.bind(target);
	target.query = (...args: unknown[]) => {
		const result = query(...args);
		if (result && typeof (result as Promise<unknown>).then === 'function' && typeof (result as Promise<unknown>).catch === 'function') {
			return (result as Promise<unknown>).catch((err: unknown) => {
				throw toDataExceptionRefusal(toDatabaseUnavailable(err));
			});
		}
		return result;
	};
}

function guardPool(p: pg.Pool): pg.Pool {
	const connect = p.connect.bind(p) as (cb?: unknown) => unknown;
	(p as unknown as { connect: (cb?: unknown) => unknown }).connect = (cb?: unknown) => {
		if (typeof cb === 'function') return connect(cb);
		return (connect() as Promise<pg.PoolClient>).then(
			(client) => {
				guardQuery(client as unknown as Queryable);
				return client;
			},
			(err: unknown) => {
				throw toDatabaseUnavailable(err);
			}
		);
	};
	guardQuery(p as unknown as Queryable);
	return p;
}

/**
 * No statement of this process waits on PostgreSQL for ever: one that runs past `DATABASE_STATEMENT_TIMEOUT_MS`, or
 * waits past `DATABASE_LOCK_TIMEOUT_MS` for a row or table lock, is stopped by the server (PostgreSQL docs §20.11.1,
 * statement_timeout and lock_timeout) and answered 503 "did not answer in time". 0 turns either off.
 */
export const DATABASE_TIMEOUT_DEFAULTS = { statementTimeoutMs: 20_000, lockTimeoutMs: 10_000 } as const;

function timeoutMs(name: string, fallback: number): number {
	const raw = process.env[name];
	if (raw === undefined || raw === '') return fallback;
	const ms = Number(raw);
	if (!Number.isInteger(ms) || ms < 0) throw new Error(`${name}: ${JSON.stringify(raw)} is not a whole number of milliseconds (0 turns the timeout off)`);
	return ms;
}

export function getPool(): pg.Pool {
	if (!pool) {
		pool = guardPool(
			new pg.Pool({
				connectionString: databaseUrl(),
				max: Number(process.env.DATABASE_POOL_SIZE || 10),
				connectionTimeoutMillis: 5000,
				idleTimeoutMillis: 30_000,
				// pg sends these as session settings at connect; 0 (off) is left out, which is PostgreSQL's own default
				statement_timeout: timeoutMs('DATABASE_STATEMENT_TIMEOUT_MS', DATABASE_TIMEOUT_DEFAULTS.statementTimeoutMs) || undefined,
				lock_timeout: timeoutMs('DATABASE_LOCK_TIMEOUT_MS', DATABASE_TIMEOUT_DEFAULTS.lockTimeoutMs) || undefined
			})
		);
		// A dropped connection must not crash the process; the next query reconnects. pg-pool listens for
		// errors only on idle clients: a client checked out when PostgreSQL goes away would emit an
		// unhandled 'error' and end the process, so every client gets a listener of its own.
		pool.on('error', (err) => console.error(`database pool: ${err.message}`));
		pool.on('connect', (client) => client.on('error', (err) => console.error(`database connection: ${err.message}`)));
	}
	return pool;
}

export function getDb(): Kysely<Database> {
	db ??= new Kysely<Database>({ dialect: new PostgresDialect({ pool: getPool() }) });
	return db;
}

/** Ends the pool (tests and scripts). */
export async function closeDb(): Promise<void> {
	const current = db;
	const currentPool = pool;
	db = undefined;
	pool = undefined;
	if (current) await current.destroy();
	else await currentPool?.end();
}
