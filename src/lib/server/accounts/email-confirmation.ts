// Confirming an e-mail address: a single-use link valid for two days, hashed like the reset links. Sign-up
// answers the same whether or not the address has an account: a new address gets the link, a taken one a
// note that someone tried to sign up with it. Mails go out after the answer, never awaited by the page.
import { randomUUID } from 'node:crypto';
import { getDb } from '../db';
import * as userQueries from '../db/user.queries';
import * as verificationQueries from '../db/verification.queries';
import { appOrigin, sendMail } from '../mail';
import { parseWith } from '$lib/schemas/input-error';
import { signUpSchema } from '$lib/schemas/account';
import { AccountError } from './account-error';
import { createLinkToken, hashLinkToken } from './link-token';
import { signUp } from './sign-up';
import { takeConfirmMailAllowance } from './attempt-throttle';
import { safeNextPath } from './request-user';

export const CONFIRM_LINK_LIFETIME_MS = 48 * 60 * 60 * 1000;

export interface Registration {
	/** The address in the form it was stored or compared in (lower case). */
	email: string;
	/** Settles when the mail has gone out (or was not sent because of the hourly allowance); never rejects. */
	delivery: Promise<void>;
}

const logFailure = (what: string) => (err: unknown) => console.error(`${what} mail: ${err instanceof Error ? err.message : String(err)}`);
const when = (d: Date) => d.toISOString().replace('T', ' ').slice(0, 16) + ' UTC';

/** Mails a new confirmation link to a person (older open links keep working until used or expired). */
async function mailConfirmation(userId: string, email: string, next: string | null, now: Date): Promise<Promise<void>> {
	const { token, tokenHash } = createLinkToken();
	const expiresAt = new Date(now.getTime() + CONFIRM_LINK_LIFETIME_MS);
	await verificationQueries.insertEmailVerification(getDb(), { id: randomUUID(), user_id: userId, token_hash: tokenHash, expires_at: expiresAt });
	const query = next ? `?next=${encodeURIComponent(next)}` : '';
	return sendMail(email, 'emailConfirm', { email, link: `${appOrigin()}/confirm/${token}${query}`, expiresAt: when(expiresAt) });
}

/**
 * Sign-up that tells nobody whether an address is taken: the same answer, after the same password
 * hashing, either way. `next` (e.g. the invitation the person came from) rides along in the link.
 */
export async function registerAccount(raw: { displayName: unknown; email: unknown; password: unknown }, opts: { next?: string | null } = {}, now = new Date()): Promise<Registration> {
	const input = parseWith(signUpSchema, raw);
	const next = opts.next ? safeNextPath(opts.next, '') || null : null;
	let created: { id: string; email: string } | null = null;
	try {
		created = await signUp(input);
	} catch (err) {
		if (!(err instanceof AccountError && err.code === 'email-taken')) throw err;
	}
	const send = async () => {
		// One allowance per address for both kinds of mail, so the form cannot flood a mailbox.
		if ((await takeConfirmMailAllowance(input.email)).retryAfterSeconds > 0) return;
		if (created) {
			await (await mailConfirmation(created.id, created.email, next, now));
			return;
		}
		await sendMail(input.email, 'signUpExisting', { email: input.email, signInLink: `${appOrigin()}/signin`, resetLink: `${appOrigin()}/reset` });
	};
	return { email: input.email, delivery: send().catch(logFailure('sign-up')) };
}

/** "Send the link again" for a signed-in person whose address is not confirmed yet. */
export async function resendEmailConfirmation(userId: string, now = new Date()): Promise<{ sent: boolean; alreadyConfirmed: boolean; email: string }> {
	const user = await userQueries.findUserById(getDb(), userId);
	if (!user) throw new AccountError('not-found', 'Account not found');
	if (user.email_verified_at) return { sent: false, alreadyConfirmed: true, email: user.email };
	const { retryAfterSeconds } = await takeConfirmMailAllowance(user.email);
	if (retryAfterSeconds > 0) throw new AccountError('limit-reached', `Several links were sent already; try again in ${Math.ceil(retryAfterSeconds / 60)} minute(s).`);
	await (await mailConfirmation(user.id, user.email, null, now));
	return { sent: true, alreadyConfirmed: false, email: user.email };
}

/** Uses a confirmation link once; the person's address counts as confirmed from then on. */
export async function confirmEmail(token: string, now = new Date()): Promise<{ userId: string }> {
	return getDb()
		.transaction()
		.execute(async (trx) => {
			const link = await verificationQueries.consumeEmailVerificationByHash(trx, hashLinkToken(token), now);
			if (!link) throw new AccountError('link-invalid', 'This confirmation link is not valid any more (used or expired). Sign in and ask for a new one.');
			await verificationQueries.markEmailVerifiedById(trx, link.user_id, now);
			await verificationQueries.retireEmailVerificationsByUser(trx, link.user_id, now);
			return { userId: link.user_id };
		});
}

/** Whether a person's address is confirmed (read fresh from the database, not from the session). */
export async function isEmailConfirmed(userId: string): Promise<boolean> {
	return (await verificationQueries.findEmailVerifiedAtById(getDb(), userId)) !== null;
}
