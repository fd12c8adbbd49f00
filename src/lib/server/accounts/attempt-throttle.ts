// Slowing down guessing: at most 10 failed sign-ins per e-mail and 50 per client
// address in 15 minutes, and at most
// 5 reset mails per e-mail and 20 reset requests per client address an hour. Counted per process in memory (several app servers would share a
// PostgreSQL-backed limiter instead). The same rule applies to every e-mail, so it reveals no accounts.
import { RateLimiterMemory, RateLimiterRes } from 'rate-limiter-flexible';

const signInFailuresByEmail = new RateLimiterMemory({ keyPrefix: 'signin-e', points: 10, duration: 15 * 60 });
const signInFailuresByAddress = new RateLimiterMemory({ keyPrefix: 'signin-a', points: 50, duration: 15 * 60 });
const resetMails = new RateLimiterMemory({ keyPrefix: 'reset', points: 5, duration: 60 * 60 });
const resetRequestsByAddress = new RateLimiterMemory({ keyPrefix: 'reset-a', points: 20, duration: 60 * 60 });

export interface Throttle {
	/** Seconds to wait, or 0 when the attempt may go ahead. */
	retryAfterSeconds: number;
}

type Keyed = [RateLimiterMemory, string];

async function waitOf(keys: Keyed[]): Promise<number> {
	let wait = 0;
	for (const [limiter, key] of keys) {
		const res = await limiter.get(key);
		if (res && res.remainingPoints <= 0) wait = Math.max(wait, Math.ceil(res.msBeforeNext / 1000));
	}
	return wait;
}

async function consume(keys: Keyed[]): Promise<void> {
	for (const [limiter, key] of keys) {
		await limiter.consume(key).catch((err: unknown) => {
			if (!(err instanceof RateLimiterRes)) throw err;
		});
	}
}

const emailKey = (email: string) => email.trim().toLowerCase();
const signInKeys = (email: string, clientAddress: string): Keyed[] => [
	[signInFailuresByEmail, emailKey(email)],
	[signInFailuresByAddress, clientAddress]
];

export async function signInThrottle(email: string, clientAddress: string): Promise<Throttle> {
	return { retryAfterSeconds: await waitOf(signInKeys(email, clientAddress)) };
}

export async function recordSignInFailure(email: string, clientAddress: string): Promise<void> {
	await consume(signInKeys(email, clientAddress));
}

export async function clearSignInFailures(email: string): Promise<void> {
	await signInFailuresByEmail.delete(emailKey(email));
}

/**
 * Counts one reset request for this e-mail and this client address; returns the wait when either hourly
 * allowance is used up (one address asking for many e-mails is stopped too).
 */
export async function takeResetMailAllowance(email: string, clientAddress = ''): Promise<Throttle> {
	const keys: Keyed[] = [[resetMails, emailKey(email)]];
	if (clientAddress) keys.push([resetRequestsByAddress, clientAddress]);
	const wait = await waitOf(keys);
	if (wait > 0) return { retryAfterSeconds: wait };
	await consume(keys);
	return { retryAfterSeconds: 0 };
}
