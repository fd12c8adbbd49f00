// Password reset by e-mail: a single-use link valid for one hour; using it sets the password and ends every session.
import { randomUUID } from 'node:crypto';
import { hashPassword } from '../auth/password';
import { getDb } from '../db';
import * as resetQueries from '../db/reset.queries';
import * as userQueries from '../db/user.queries';
import { appOrigin, sendMail } from '../mail';
import { parseWith } from '$lib/schemas/input-error';
import { resetCompleteSchema, resetRequestSchema } from '$lib/schemas/account';
import { AccountError } from './account-error';
import { createLinkToken, hashLinkToken } from './link-token';

export const RESET_LINK_LIFETIME_MS = 60 * 60 * 1000;

export interface ResetRequest {
	/**
	 * Settles when the mail has gone out (or at once when there is no such account). The page does
	 * not wait for it, so the answer takes the same time whether or not the e-mail has an account.
	 */
	delivery: Promise<void>;
}

/** Always answers the same way; sends a link only when the e-mail has an account. */
export async function requestPasswordReset(raw: { email: unknown }, now = new Date()): Promise<ResetRequest> {
	const { email } = parseWith(resetRequestSchema, raw);
	const user = await userQueries.findUserByEmail(getDb(), email);
	if (!user) return { delivery: Promise.resolve() };
	const { token, tokenHash } = createLinkToken();
	const expiresAt = new Date(now.getTime() + RESET_LINK_LIFETIME_MS);
	await resetQueries.insertPasswordReset(getDb(), { id: randomUUID(), user_id: user.id, token_hash: tokenHash, expires_at: expiresAt });
	const delivery = sendMail(user.email, 'passwordReset', {
		email: user.email,
		link: `${appOrigin()}/reset/${token}`,
		expiresAt: expiresAt.toISOString().replace('T', ' ').slice(0, 16) + ' UTC'
	});
	return { delivery };
}

/** The account a live reset link belongs to, or null when the link is unknown, used or expired. */
export async function findPasswordResetLink(token: string, now = new Date()): Promise<{ email: string } | null> {
	const row = await resetQueries.findLivePasswordResetByHash(getDb(), hashLinkToken(token), now);
	return row ? { email: row.email } : null;
}

/** Uses a link once: sets the new password and ends all of that person's sessions, in one transaction. */
export async function completePasswordReset(token: string, raw: { password: unknown }, now = new Date()): Promise<{ userId: string; endedSessions: number }> {
	const { password } = parseWith(resetCompleteSchema, raw);
	const passwordHash = await hashPassword(password);
	return getDb()
		.transaction()
		.execute(async (trx) => {
			const reset = await resetQueries.consumePasswordResetByHash(trx, hashLinkToken(token), now);
			if (!reset) throw new AccountError('link-invalid', 'This link to set a new password is not valid any more (used or expired). Ask for a new one.');
			await userQueries.updatePasswordHashById(trx, reset.user_id, passwordHash);
			await resetQueries.retirePasswordResetsByUser(trx, reset.user_id, now);
			const endedSessions = await userQueries.deleteSessionsByUser(trx, reset.user_id);
			return { userId: reset.user_id, endedSessions };
		});
}
