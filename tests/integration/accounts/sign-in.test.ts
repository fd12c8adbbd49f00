// Sign-up, sign-in with the one generic refusal, argon2id storage, and session rotation on sign-in.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AccountError, checkCredentials, signUp, startSession, endSession, WRONG_CREDENTIALS_MESSAGE } from '../../../src/lib/server/accounts';
import { getLucia } from '../../../src/lib/server/auth/lucia';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { InputError } from '../../../src/lib/schemas/input-error';
import { emailFor, TEST_PASSWORD, uniqueSuffix } from './helpers/people';

const suffix = uniqueSuffix('signin');
const email = emailFor('ada', suffix);

async function refusal(p: Promise<unknown>): Promise<AccountError> {
	const err = await p.then(
		() => null,
		(e: unknown) => e
	);
	expect(err).toBeInstanceOf(AccountError);
	return err as AccountError;
}

beforeAll(async () => {
	await signUp({ displayName: 'Ada Sign-in', email: email.toUpperCase(), password: TEST_PASSWORD });
});
afterAll(closeDb);

describe('sign-up', () => {
	it('stores the e-mail in lower case and the password as an argon2id hash, never in clear', async () => {
		const row = await getDb().selectFrom('app_user').selectAll().where('email', '=', email).executeTakeFirstOrThrow();
		// PHC string format of argon2id with the OWASP cheat sheet's m=19456, t=2, p=1 (OWASP Password Storage Cheat Sheet).
		expect(row.password_hash).toMatch(/^\$argon2id\$v=19\$m=19456,t=2,p=1\$/);
		expect(row.password_hash).not.toContain(TEST_PASSWORD);
	});

	it('refuses a second account with the same e-mail, in any letter case', async () => {
		const err = await refusal(signUp({ displayName: 'Ada again', email: ` ${email.toUpperCase()} `, password: TEST_PASSWORD }));
		expect(err.code).toBe('email-taken');
	});

	it('refuses a password shorter than 10 characters with a typed input error naming the field', async () => {
		const err = await signUp({ displayName: 'Short', email: emailFor('short', suffix), password: 'nine-char' }).catch((e: unknown) => e);
		expect(err).toBeInstanceOf(InputError);
		expect((err as InputError).first.path).toBe('password');
		expect((err as InputError).first.message).toMatch(/at least 10/);
	});
});

describe('sign-in', () => {
	it('accepts the right e-mail and password, whatever the e-mail letter case', async () => {
		const user = await checkCredentials({ email: email.toUpperCase(), password: TEST_PASSWORD });
		expect(user.email).toBe(email);
	});

	it('gives the same generic message for a wrong password, an unknown e-mail and a malformed e-mail', async () => {
		const wrongPassword = await refusal(checkCredentials({ email, password: 'not the password' }));
		const unknownEmail = await refusal(checkCredentials({ email: emailFor('nobody', suffix), password: TEST_PASSWORD }));
		const malformed = await refusal(checkCredentials({ email: 'not-an-email', password: TEST_PASSWORD }));
		for (const err of [wrongPassword, unknownEmail, malformed]) {
			expect(err.code).toBe('wrong-credentials');
			expect(err.message).toBe(WRONG_CREDENTIALS_MESSAGE);
		}
		expect(WRONG_CREDENTIALS_MESSAGE).toBe('E-mail or password is wrong');
	});

	it('spends comparable time on an unknown e-mail and on a wrong password (an argon2id verification each)', async () => {
		// Warm the decoy hash first; then compare medians of a few tries. A skipped verification would be ~100× faster;
		// the bounds are wide because a busy 2-core CI machine makes single timings noisy.
		await refusal(checkCredentials({ email: emailFor('warm', suffix), password: 'x' }));
		const time = async (e: string) => {
			const samples: number[] = [];
			for (let i = 0; i < 5; i++) {
				const t0 = performance.now();
				await checkCredentials({ email: e, password: 'wrong wrong wrong' }).catch(() => undefined);
				samples.push(performance.now() - t0);
			}
			return samples.sort((a, b) => a - b)[2];
		};
		const known = await time(email);
		const unknown = await time(emailFor('ghost', suffix));
		expect(unknown / known).toBeGreaterThan(0.2);
		expect(unknown / known).toBeLessThan(5);
	});
});

describe('sessions', () => {
	it('gives a new session id on sign-in and ends the one the browser came with', async () => {
		const user = await checkCredentials({ email, password: TEST_PASSWORD });
		const first = await startSession(user.id, null);
		const second = await startSession(user.id, first.sessionId);
		expect(second.sessionId).not.toBe(first.sessionId);
		expect((await getLucia().validateSession(first.sessionId)).session).toBeNull();
		expect((await getLucia().validateSession(second.sessionId)).session?.userId).toBe(user.id);
		expect(second.cookie.name).toBe('ff_session');
		expect(second.cookie.attributes).toMatchObject({ httpOnly: true, sameSite: 'lax' });
	});

	it('ends a session on sign-out and returns a cookie that clears it', async () => {
		const user = await checkCredentials({ email, password: TEST_PASSWORD });
		const { sessionId } = await startSession(user.id, null);
		const blank = await endSession(sessionId);
		expect(blank.value).toBe('');
		expect((await getLucia().validateSession(sessionId)).session).toBeNull();
	});
});
