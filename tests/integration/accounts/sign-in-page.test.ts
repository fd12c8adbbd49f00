// The sign-in and reset-request actions as SvelteKit calls them: a session cookie on success, the generic
// refusal otherwise, a pause after 10 failures for one e-mail, and at most 5 reset mails per e-mail an hour.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { getLucia } from '../../../src/lib/server/auth/lucia';
import { closeDb, getDb } from '../../../src/lib/server/db';
import * as resetPage from '../../../src/routes/reset/+page.server';
import * as signinPage from '../../../src/routes/signin/+page.server';
import { emailFor, person, TEST_PASSWORD, uniqueSuffix } from './helpers/people';
import { call, cookieJar, identityFor, sessionFor } from './helpers/route-event';
import { startSmtpCatcher, type SmtpCatcher } from './helpers/smtp-catcher';

const suffix = uniqueSuffix('signin-page');
let smtp: SmtpCatcher;

beforeAll(async () => {
	smtp = await startSmtpCatcher();
});
afterAll(async () => {
	await smtp.close();
	await closeDb();
});

async function signIn(email: string, password: string, sessionId: string | null = null) {
	const jar = cookieJar(sessionId ? { [getLucia().sessionCookieName]: sessionId } : {});
	const res = await call(signinPage.actions.default as never, { identity: await identityFor(sessionId), path: '/signin', form: { email, password, next: '/teams' }, cookies: jar });
	return { ...res, cookie: jar.values[getLucia().sessionCookieName] };
}

describe('the sign-in action', () => {
	it('sets a new session cookie, ends the session the browser came with, and goes to next', async () => {
		const user = await person('cookie', suffix);
		const old = await sessionFor(user.id);
		const res = await signIn(user.email, TEST_PASSWORD, old);
		expect(res.location).toBe('/teams');
		expect(res.cookie).toBeTruthy();
		expect(res.cookie).not.toBe(old);
		expect((await getLucia().validateSession(old)).session).toBeNull();
		expect((await getLucia().validateSession(res.cookie)).session?.userId).toBe(user.id);
	});

	it('answers a wrong password with 400 and the generic message, keeping the e-mail but not the password', async () => {
		const user = await person('wrong', suffix);
		const res = await signIn(user.email, 'definitely not it');
		expect(res.outcome).toBe(400);
		expect(res.data).toMatchObject({ message: 'E-mail or password is wrong', values: { email: user.email } });
		expect(JSON.stringify(res.data)).not.toContain('definitely not it');
		expect(res.cookie).toBeUndefined();
	});

	it('refuses an e-mail for 15 minutes after 10 failures, even with the right password; other e-mails go on', async () => {
		const user = await person('guessed', suffix);
		for (let i = 0; i < 10; i++) expect((await signIn(user.email, `guess number ${i}`)).outcome).toBe(400);
		const blocked = await signIn(user.email, TEST_PASSWORD);
		expect(blocked.outcome).toBe(429);
		expect(blocked.cookie).toBeUndefined();
		// An unknown e-mail gets the same treatment, so the pause reveals nothing about accounts.
		const ghost = emailFor('ghost', suffix);
		for (let i = 0; i < 10; i++) await signIn(ghost, `guess number ${i}`);
		expect((await signIn(ghost, 'one more')).outcome).toBe(429);
		const bystander = await person('bystander', suffix);
		expect((await signIn(bystander.email, TEST_PASSWORD)).location).toBe('/teams');
	});

	it('a success clears the failures counted for that e-mail', async () => {
		const user = await person('forgiven', suffix);
		for (let i = 0; i < 9; i++) await signIn(user.email, `typo ${i}`);
		expect((await signIn(user.email, TEST_PASSWORD)).location).toBe('/teams');
		for (let i = 0; i < 9; i++) expect((await signIn(user.email, `typo again ${i}`)).outcome).toBe(400);
	});
});

describe('the reset-request action', () => {
	it('answers the same for a known and an unknown e-mail, and sends at most 5 links per e-mail an hour', async () => {
		const user = await person('resetter', suffix);
		const known = await call(resetPage.actions.default as never, { identity: await identityFor(null), path: '/reset', form: { email: user.email } });
		const unknown = await call(resetPage.actions.default as never, { identity: await identityFor(null), path: '/reset', form: { email: emailFor('nobody', suffix) } });
		expect(known.outcome).toBe('ok');
		expect(unknown.outcome).toBe('ok');
		expect(Object.keys(known.data as object)).toEqual(Object.keys(unknown.data as object));
		for (let i = 0; i < 4; i++) await call(resetPage.actions.default as never, { identity: await identityFor(null), path: '/reset', form: { email: user.email } });
		const sixth = await call(resetPage.actions.default as never, { identity: await identityFor(null), path: '/reset', form: { email: user.email } });
		expect(sixth.outcome).toBe(429);
		// Each mail goes out for a link stored before the action answered, so the stored links bound the mails
		// that can ever arrive: wait until every one of them has arrived, then the count is final.
		const links = await getDb().selectFrom('password_reset').select('id').where('user_id', '=', user.id).execute();
		expect(links).toHaveLength(5);
		const mailsTo = () => smtp.messages.filter((m) => m.to.includes(user.email)).length;
		await vi.waitFor(() => expect(mailsTo()).toBe(links.length), { timeout: 10_000, interval: 25 });
		expect(mailsTo()).toBe(5);
	});
});
