// Creating an account: the e-mail in lower case, the password hashed with argon2id.
import { randomUUID } from 'node:crypto';
import { hashPassword } from '../auth/password';
import { getDb } from '../db';
import * as userQueries from '../db/user.queries';
import { parseWith } from '$lib/schemas/input-error';
import { signUpSchema } from '$lib/schemas/account';
import { AccountError } from './account-error';

export interface AccountUser {
	id: string;
	email: string;
	displayName: string;
}

export async function signUp(raw: { displayName: unknown; email: unknown; password: unknown }): Promise<AccountUser> {
	const input = parseWith(signUpSchema, raw);
	const row = await userQueries.insertUser(getDb(), {
		id: randomUUID(),
		email: input.email,
		display_name: input.displayName,
		password_hash: await hashPassword(input.password)
	});
	if (!row) throw new AccountError('email-taken', 'An account with this e-mail exists already: sign in, or set a new password.');
	return { id: row.id, email: row.email, displayName: row.display_name };
}
