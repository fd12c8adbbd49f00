// Password reset by e-mail: same answer for unknown e-mails, a single-use one-hour link, only its hash stored, all sessions end.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AccountError, checkCredentials, completePasswordReset, findPasswordResetLink, requestPasswordReset, RESET_LINK_LIFETIME_MS } from '../../../src/lib/server/accounts';
import { getLucia } from '../../../src/lib/server/auth/lucia';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { emailFor, person, TEST_PASSWORD, uniqueSuffix } from './helpers/people';
import { sessionFor } from './helpers/route-event';
import { startSmtpCatcher, tokenFromLink, type SmtpCatcher } from './helpers/smtp-catcher';

const suffix = uniqueSuffix('reset');
let smtp: SmtpCatcher;

beforeAll(async () => {
	smtp = await startSmtpCatcher();
});
afterAll(async () => {
	await smtp.close();
	await closeDb();
});

async function linkFor(email: string, now = new Date()): Promise<string> {
	const before = smtp.messages.length;
	await (await requestPasswordReset({ email }, now)).delivery;
	expect(smtp.messages.length).toBe(before + 1);
	const mail = await smtp.waitFor(email);
	expect(mail.links).toHaveLength(1);
	return tokenFromLink(mail.links[0], '/reset/');
}

describe('asking for a reset link', () => {
	it('sends nothing for an unknown e-mail and answers exactly as for a known one', async () => {
		const before = smtp.messages.length;
		const answer = await requestPasswordReset({ email: emailFor('nobody', suffix) });
		await answer.delivery;
		expect(Object.keys(answer)).toEqual(['delivery']);
		expect(smtp.messages.length).toBe(before);
	});

	it('mails a link under ORIGIN from the configured sender, and stores only the sha256 of its token', async () => {
		const user = await person('mailed', suffix);
		const token = await linkFor(user.email);
		const mail = await smtp.waitFor(user.email);
		expect(mail.subject).toBe('Set a new Fringefield password');
		expect(mail.from).toContain('noreply@fringefield.test');
		// ORIGIN, else the local server on PORT (3000 by default): src/lib/server/mail/app-origin.ts
		expect(mail.links[0].startsWith(`${process.env.ORIGIN || `http://127.0.0.1:${process.env.PORT || 3000}`}/reset/`)).toBe(true);
		expect(token.length).toBeGreaterThanOrEqual(43); // 32 random bytes in base64url
		const rows = await getDb().selectFrom('password_reset').selectAll().where('user_id', '=', user.id).execute();
		expect(rows).toHaveLength(1);
		expect(rows[0].token_hash).toMatch(/^[0-9a-f]{64}$/);
		expect(rows[0].token_hash).not.toContain(token);
		expect(JSON.stringify(rows)).not.toContain(token);
	});
});

describe('using a reset link', () => {
	it('sets the new password once; the old password and a second use are refused', async () => {
		const user = await person('once', suffix);
		const token = await linkFor(user.email);
		expect(await findPasswordResetLink(token)).toEqual({ email: user.email });
		await (await completePasswordReset(token, { password: 'a brand new passphrase' })).delivery;
		await expect(checkCredentials({ email: user.email, password: 'a brand new passphrase' })).resolves.toMatchObject({ id: user.id });
		await expect(checkCredentials({ email: user.email, password: TEST_PASSWORD })).rejects.toBeInstanceOf(AccountError);
		expect(await findPasswordResetLink(token)).toBeNull();
		const again = await completePasswordReset(token, { password: 'yet another passphrase' }).catch((e: unknown) => e);
		expect(again).toBeInstanceOf(AccountError);
		expect((again as AccountError).code).toBe('link-invalid');
	});

	it('expires one hour after it was made', async () => {
		const user = await person('late', suffix);
		const made = new Date();
		const token = await linkFor(user.email, made);
		expect(RESET_LINK_LIFETIME_MS).toBe(60 * 60 * 1000);
		const justAfter = new Date(made.getTime() + RESET_LINK_LIFETIME_MS + 1000);
		expect(await findPasswordResetLink(token, new Date(made.getTime() + RESET_LINK_LIFETIME_MS - 1000))).not.toBeNull();
		expect(await findPasswordResetLink(token, justAfter)).toBeNull();
		const late = await completePasswordReset(token, { password: 'too late passphrase' }, justAfter).catch((e: unknown) => e);
		expect((late as AccountError).code).toBe('link-invalid');
		await expect(checkCredentials({ email: user.email, password: TEST_PASSWORD })).resolves.toMatchObject({ id: user.id });
	});

	it('ends every session of that person, and only theirs', async () => {
		const user = await person('everywhere', suffix);
		const bystander = await person('bystander', suffix);
		const sessions = await Promise.all([sessionFor(user.id), sessionFor(user.id), sessionFor(user.id)]);
		const other = await sessionFor(bystander.id);
		const token = await linkFor(user.email);
		const { endedSessions, delivery } = await completePasswordReset(token, { password: 'signed out everywhere' });
		await delivery;
		expect(endedSessions).toBe(3);
		for (const id of sessions) expect((await getLucia().validateSession(id)).session).toBeNull();
		expect((await getLucia().validateSession(other)).session?.userId).toBe(bystander.id);
	});

	it('retires the other open links of that person once one is used', async () => {
		const user = await person('twolinks', suffix);
		const first = await linkFor(user.email);
		const second = await linkFor(user.email);
		await (await completePasswordReset(second, { password: 'second link wins' })).delivery;
		expect(await findPasswordResetLink(first)).toBeNull();
	});

	it('refuses a too-short new password with a typed input error and leaves the link usable', async () => {
		const user = await person('short', suffix);
		const token = await linkFor(user.email);
		await expect(completePasswordReset(token, { password: 'short' })).rejects.toMatchObject({ name: 'InputError' });
		expect(await findPasswordResetLink(token)).not.toBeNull();
	});
});
