// Errors of the "cannot talk to PostgreSQL" class (refused, reset, terminated, shutting down, the
// 08xxx connection-exception class) become one HttpError 503 with a message people can act on; so do the
// statement and lock timeouts of the app's pool (a request that waited too long on the database).
import { error, isHttpError, type HttpError } from '@sveltejs/kit';

export const DATABASE_UNAVAILABLE_MESSAGE = 'The database is unavailable; try again shortly';
export const DATABASE_BUSY_MESSAGE = 'The database did not answer in time; try again shortly';

const NODE_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EPIPE', 'EHOSTUNREACH', 'ENETUNREACH', 'EAI_AGAIN', 'ENOTFOUND']);
// PostgreSQL SQLSTATE: 57P01 admin_shutdown, 57P02 crash_shutdown, 57P03 cannot_connect_now, 53300 too_many_connections (PostgreSQL docs, Appendix A).
const SQLSTATES = new Set(['57P01', '57P02', '57P03', '53300']);
// 57014 query_canceled (statement_timeout), 55P03 lock_not_available (lock_timeout) (PostgreSQL docs, Appendix A; §20.11.1).
const BUSY_SQLSTATES = new Set(['57014', '55P03']);
const MESSAGES = [/connection terminated/i, /timeout exceeded when trying to connect/i, /not queryable/i, /connection error/i, /the database system is (starting up|shutting down|in recovery mode)/i];

/** True for a statement or lock that waited past the pool's timeout. */
export function isDatabaseBusy(err: unknown): boolean {
	const code = (err as { code?: unknown } | null)?.code;
	return typeof code === 'string' && BUSY_SQLSTATES.has(code);
}

/** True for errors meaning the database cannot be reached, or did not answer in time, right now (not for other SQL errors). */
export function isDatabaseUnavailable(err: unknown): boolean {
	if (isHttpError(err)) return err.status === 503 && (err.body.message === DATABASE_UNAVAILABLE_MESSAGE || err.body.message === DATABASE_BUSY_MESSAGE);
	if (!err || typeof err !== 'object') return false;
	const code = (err as { code?: unknown }).code;
	if (typeof code === 'string' && (NODE_CODES.has(code) || SQLSTATES.has(code) || BUSY_SQLSTATES.has(code) || /^08/.test(code))) return true;
	// AggregateError (several addresses refused) carries the codes of its parts.
	const inner = (err as { errors?: unknown }).errors;
	if (Array.isArray(inner) && inner.some(isDatabaseUnavailable)) return true;
	const message = (err as { message?: unknown }).message;
	return typeof message === 'string' && MESSAGES.some((m) => m.test(message));
}

let lastLogged = 0;

/** The 503 to throw in place of `err` when it is of the connection class; `err` itself otherwise. */
export function toDatabaseUnavailable(err: unknown): unknown {
	if (isHttpError(err) || !isDatabaseUnavailable(err)) return err;
	const now = Date.now();
	// One log line per second at most, so an outage does not flood the log.
	if (now - lastLogged > 1000) {
		lastLogged = now;
		console.error(`database unavailable: ${(err as Error).message || (err as { code?: string }).code}`);
	}
	try {
		error(503, isDatabaseBusy(err) ? DATABASE_BUSY_MESSAGE : DATABASE_UNAVAILABLE_MESSAGE);
	} catch (thrown) {
		return thrown as HttpError;
	}
}

/**
 * The last guard for input (SQLSTATE class 22, data exception: text PostgreSQL cannot store, a number out
 * of a column's range): a 400 instead of a 500. The request guards in http/ should refuse such input first.
 */
export function toDataExceptionRefusal(err: unknown): unknown {
	const code = (err as { code?: unknown } | null)?.code;
	if (typeof code !== 'string' || !code.startsWith('22')) return err;
	try {
		error(400, `A value in the request cannot be stored (${(err as Error).message})`);
	} catch (thrown) {
		return thrown as HttpError;
	}
}
