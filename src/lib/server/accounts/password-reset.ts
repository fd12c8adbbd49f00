// Password reset by e-mail: a single-use link valid for one hour; using it sets the password, ends every session,
// revokes every API token (the mail that follows lists them by name), confirms the e-mail and clears the sign-in throttle.
import { randomUUID } from 'node:crypto';
import { hashPassword } from '../auth/password';
import { getDb } from '../db';
import * as resetQueries from '../db/reset.queries';
import * as userQueries from '../db/user.queries';
import * as tokenQueries from '../db/token.queries';
import * as verificationQueries from '../db/verification.queries';
import { recordAuditEvent } from '../audit/record-audit-event';
import { clearSignInFailures } from './attempt-throttle';
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

export interface CompletedReset {
	userId: string;
	endedSessions: number;
	/** Names of the API tokens the reset revoked, oldest first. */
	revokedTokens: string[];
	/** Settles when the "password changed" mail has gone out; a failure there is logged, never thrown. */
	delivery: Promise<void>;
}

/**
 * Uses a link once: sets the new password, ends all of that person's sessions and revokes all their API
 * tokens, in one transaction. The link proves the person reads the mailbox, so the e-mail counts as
 * confirmed and its sign-in failures are forgotten.
 */
export async function completePasswordReset(token: string, raw: { password: unknown }, now = new Date()): Promise<CompletedReset> {
	const { password } = parseWith(resetCompleteSchema, raw);
	const passwordHash = await hashPassword(password);
	const done = await getDb()
		.transaction()
		.execute(async (trx) => {
			const reset = await resetQueries.consumePasswordResetByHash(trx, hashLinkToken(token), now);
			if (!reset) throw new AccountError('link-invalid', 'This link to set a new password is not valid any more (used or expired). Ask for a new one.');
			await userQueries.updatePasswordHashById(trx, reset.user_id, passwordHash);
			await resetQueries.retirePasswordResetsByUser(trx, reset.user_id, now);
			await verificationQueries.markEmailVerifiedById(trx, reset.user_id, now);
			const endedSessions = await userQueries.deleteSessionsByUser(trx, reset.user_id);
			const revoked = await tokenQueries.revokeLiveTokensByUser(trx, reset.user_id, now);
			for (const t of revoked) {
				await recordAuditEvent({ kind: 'token.revoked', teamId: t.team_id, actorUserId: reset.user_id, details: { tokenId: t.id, name: t.name, reason: 'password reset' } }, trx);
			}
			const user = await userQueries.findUserById(trx, reset.user_id);
			return { userId: reset.user_id, email: user?.email ?? '', endedSessions, revokedTokens: revoked.map((t) => t.name) };
		});
	await clearSignInFailures(done.email);
	const delivery = sendMail(done.email, 'passwordChanged', {
		email: done.email,
		revokedTokens: done.revokedTokens.length > 0 ? done.revokedTokens.map((name) => `  - ${name}`).join('\n') : '  (this account had no live API tokens)',
		resetLink: `${appOrigin()}/reset`
	}).catch((err: unknown) => console.error(`password changed mail: ${err instanceof Error ? err.message : String(err)}`));
	return { userId: done.userId, endedSessions: done.endedSessions, revokedTokens: done.revokedTokens, delivery };
}
