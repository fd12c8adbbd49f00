// Checking an e-mail and password. An unknown e-mail costs one argon2id verification too, and both
// failures give the same message, so the answer reveals neither which part was wrong nor who has an account.
import { randomBytes } from 'node:crypto';
import { hashPassword, verifyPassword } from '../auth/password';
import { getDb } from '../db';
import * as userQueries from '../db/user.queries';
import { recordAuditEvent } from '../audit/record-audit-event';
import { signInSchema } from '$lib/schemas/account';
import { AccountError, WRONG_CREDENTIALS_MESSAGE } from './account-error';
import type { AccountUser } from './sign-up';

let decoyHash: Promise<string> | undefined;

/** A hash of a random password, made once per process, verified against when the e-mail is unknown. */
function decoy(): Promise<string> {
	decoyHash ??= hashPassword(randomBytes(18).toString('base64url'));
	return decoyHash;
}

export async function checkCredentials(raw: { email: unknown; password: unknown }): Promise<AccountUser> {
	const parsed = signInSchema.safeParse(raw);
	if (!parsed.success) {
		// A malformed e-mail still gets the generic answer (after the same work).
		await verifyPassword(await decoy(), typeof raw.password === 'string' ? raw.password : '');
		throw new AccountError('wrong-credentials', WRONG_CREDENTIALS_MESSAGE);
	}
	const { email, password } = parsed.data;
	const user = await userQueries.findUserByEmail(getDb(), email);
	const ok = await verifyPassword(user?.password_hash ?? (await decoy()), password);
	if (!user || !ok) {
		// The account's id when it exists (its team owners see it); the e-mail tried otherwise.
		await recordAuditEvent({ kind: 'signin.failed', teamId: null, actorUserId: user?.id ?? null, details: user ? {} : { email } });
		throw new AccountError('wrong-credentials', WRONG_CREDENTIALS_MESSAGE);
	}
	return { id: user.id, email: user.email, displayName: user.display_name };
}
