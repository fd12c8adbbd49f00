// Slowing down guessing and mail abuse, with counters in PostgreSQL (the rate_limit table, through
// rate-limiter-flexible's RateLimiterPostgres) so every app process shares them:
// - sign-in: at most 10 attempts per e-mail and 50 per client address in 15 minutes. An attempt is
//   counted *before* the password is checked (one atomic upsert), so parallel guesses cannot all slip
//   under the limit; a successful sign-in clears the e-mail's count and gives the address its point back,
//   and a completed password reset clears the e-mail's count.
// - reset mails: 5 per e-mail and 20 per client address an hour.
// - invitations: 10 per person and 20 per team an hour.
// - sign-up mails (the confirmation link, or "someone tried to sign up with your address"): 5 per e-mail an hour.
// The per-address limits leave loopback addresses alone: behind a reverse proxy without ADDRESS_HEADER every
// client looks like 127.0.0.1, and one shared count would let anyone lock everybody out.
// The same rule applies to every e-mail, so being throttled reveals no account. Keys hold the sha256 of the
// e-mail, address or id, never the value itself.
import { createHash } from 'node:crypto';
import { RateLimiterPostgres, RateLimiterRes } from 'rate-limiter-flexible';
import { getPool } from '../db';

/** The allowances (common practice, no source: the sizes sign-in forms and mailers use to slow guessing and spam). */
export const THROTTLE_LIMITS = {
	signInPerEmail: { points: 10, durationSeconds: 15 * 60 },
	signInPerAddress: { points: 50, durationSeconds: 15 * 60 },
	resetMailsPerEmail: { points: 5, durationSeconds: 60 * 60 },
	resetRequestsPerAddress: { points: 20, durationSeconds: 60 * 60 },
	invitesPerPerson: { points: 10, durationSeconds: 60 * 60 },
	invitesPerTeam: { points: 20, durationSeconds: 60 * 60 },
	confirmMailsPerEmail: { points: 5, durationSeconds: 60 * 60 }
} as const;
type LimiterName = keyof typeof THROTTLE_LIMITS;

export const RATE_LIMIT_TABLE = 'rate_limit';

const limiters = new Map<LimiterName, RateLimiterPostgres>();

function limiter(name: LimiterName): RateLimiterPostgres {
	let l = limiters.get(name);
	if (!l) {
		const { points, durationSeconds } = THROTTLE_LIMITS[name];
		l = new RateLimiterPostgres({
			// Through the process's current pool on every query (tests and scripts may close and reopen it);
			// errors become the usual 503 "try again shortly" there.
			storeClient: { query: (q: unknown) => getPool().query(q as string) },
			storeType: 'client',
			tableName: RATE_LIMIT_TABLE,
			// Made by migrations/2026-12-02T0630_create_rate_limit.ts, never by the library at run time.
			tableCreated: true,
			keyPrefix: name,
			points,
			duration: durationSeconds
		});
		limiters.set(name, l);
	}
	return l;
}

export interface Throttle {
	/** Seconds to wait, or 0 when the attempt may go ahead. */
	retryAfterSeconds: number;
}

type Keyed = [LimiterName, string];

const subject = (value: string) => createHash('sha256').update(value).digest('hex');

/** The rate_limit row key of one limiter and subject (tests read and clear rows by it). */
export function throttleKey(name: LimiterName, value: string): string {
	return `${name}:${subject(name.includes('Email') ? value.trim().toLowerCase() : value)}`;
}
const emailKey = (email: string) => subject(email.trim().toLowerCase());

/**
 * Takes one point from each key in order and stops at the first that is used up (its wait is returned):
 * a person over their own allowance does not spend the team's or the address's.
 */
async function take(keys: Keyed[]): Promise<Throttle> {
	for (const [name, key] of keys) {
		try {
			await limiter(name).consume(key);
		} catch (err) {
			if (!(err instanceof RateLimiterRes)) throw err;
			return { retryAfterSeconds: Math.max(1, Math.ceil(err.msBeforeNext / 1000)) };
		}
	}
	return { retryAfterSeconds: 0 };
}

/** 127.0.0.0/8 and ::1, also IPv4-mapped (RFC 5735 §3 and RFC 4291 §2.5.3, §2.5.5.2). */
export function isLoopbackAddress(address: string): boolean {
	const a = address.trim().toLowerCase().replace(/^::ffff:/, '');
	return a === '::1' || /^127\.\d{1,3}\.\d{1,3}\.\d{1,3}$/.test(a);
}

const addressLimited = (clientAddress: string) => clientAddress !== '' && !isLoopbackAddress(clientAddress);

const signInKeys = (email: string, clientAddress: string): Keyed[] => [
	['signInPerEmail', emailKey(email)],
	...(addressLimited(clientAddress) ? [['signInPerAddress', subject(clientAddress)] as Keyed] : [])
];

/**
 * Counts one sign-in attempt before the password is checked. A wait above 0 means: refuse without
 * checking (the attempt was counted all the same).
 */
export async function takeSignInAttempt(email: string, clientAddress: string): Promise<Throttle> {
	return take(signInKeys(email, clientAddress));
}

/** After a successful sign-in: the e-mail's failures are forgotten and the address gets its point back. */
export async function settleSuccessfulSignIn(email: string, clientAddress: string): Promise<void> {
	await limiter('signInPerEmail').delete(emailKey(email));
	if (addressLimited(clientAddress)) await limiter('signInPerAddress').reward(subject(clientAddress), 1);
}

/** Forgets an e-mail's sign-in attempts (a completed password reset proves the person holds the mailbox). */
export async function clearSignInFailures(email: string): Promise<void> {
	await limiter('signInPerEmail').delete(emailKey(email));
}

/**
 * Counts one reset request for this e-mail and this client address; returns the wait when either hourly
 * allowance is used up (one address asking for many e-mails is stopped too).
 */
export async function takeResetMailAllowance(email: string, clientAddress = ''): Promise<Throttle> {
	const keys: Keyed[] = [['resetMailsPerEmail', emailKey(email)]];
	if (addressLimited(clientAddress)) keys.push(['resetRequestsPerAddress', subject(clientAddress)]);
	return take(keys);
}

/** Counts one invitation by this person from this team; returns the wait when either hourly allowance is used up. */
export async function takeInviteAllowance(teamId: string, userId: string): Promise<Throttle> {
	return take([
		['invitesPerPerson', subject(userId)],
		['invitesPerTeam', subject(teamId)]
	]);
}

/** Counts one confirmation or "someone tried to sign up" mail to this address; the wait when the hourly allowance is used up. */
export async function takeConfirmMailAllowance(email: string): Promise<Throttle> {
	return take([['confirmMailsPerEmail', emailKey(email)]]);
}
