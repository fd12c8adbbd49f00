// Abuse of sign-in, password reset, sessions, tokens, cookies and cross-site posts, against the built
// server the way a browser or a script would send them.
import { createHash, randomBytes, randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signUp } from '../../../src/lib/server/accounts';
import { createLinkToken } from '../../../src/lib/server/accounts/link-token';
import { throttleKey } from '../../../src/lib/server/accounts/attempt-throttle';
import { closeDb, getDb } from '../../../src/lib/server/db';
import * as resetQueries from '../../../src/lib/server/db/reset.queries';
import { getLucia } from '../../../src/lib/server/auth/lucia';
import { action, api } from './helpers/client';
import { copyBuild, startBuiltServer, type BuiltServer } from './helpers/built-server';
import { createHardeningWorkspace, PASSWORD, type HardeningWorkspace } from './helpers/workspace';

let buildDir: string;
let server: BuiltServer;
let ws: HardeningWorkspace;
const databaseUrl = () => process.env.DATABASE_URL!;

beforeAll(async () => {
	buildDir = copyBuild();
	[server, ws] = await Promise.all([startBuiltServer({ databaseUrl: databaseUrl(), buildDir }), createHardeningWorkspace('auth')]);
}, 120_000);
afterAll(async () => {
	await server?.stop();
	const { rmSync } = await import('node:fs');
	rmSync(buildDir, { recursive: true, force: true });
	await closeDb();
});

async function person(label: string) {
	return signUp({ displayName: `${label} ${ws.suffix}`, email: `${label}-${randomBytes(3).toString('hex')}@${ws.domain}`, password: PASSWORD });
}

async function signIn(origin: string, email: string, password: string, cookie?: string) {
	return action(origin, '/signin', { cookie }, { email, password });
}

const sessionCookieOf = (headers: Headers) => headers.getSetCookie().find((c) => c.startsWith('ff_session='));
const sessionValue = (header: string | undefined) => header?.split(';')[0].split('=')[1] ?? '';

async function isSignedIn(origin: string, sessionId: string): Promise<boolean> {
	const res = await fetch(`${origin}/teams`, { headers: { cookie: `ff_session=${sessionId}` }, redirect: 'manual' });
	await res.arrayBuffer();
	return res.status === 200;
}

describe('sign-in and reset throttling', () => {
	it('refuses an account after 10 failed sign-ins, even with the right password, with a wait in the message', async () => {
		// Limits from src/lib/server/accounts/attempt-throttle.ts: 10 attempts per e-mail in 15 minutes (a success clears them).
		const user = await person('throttled');
		for (let i = 0; i < 10; i++) expect((await signIn(server.origin, user.email, 'wrong password!')).actionStatus).toBe(400);
		const blocked = await signIn(server.origin, user.email, PASSWORD);
		expect(blocked.actionStatus).toBe(429);
		expect(blocked.message).toMatch(/Too many failed attempts\. Try again in \d+ minute/);
	});

	it('refuses a client address after 50 failed sign-ins across accounts', async () => {
		// A server that takes the client address from X-Forwarded-For (adapter-node's ADDRESS_HEADER), so this
		// test has an address of its own (RFC 5737 documentation range); loopback is never limited per address.
		const own = await startBuiltServer({ databaseUrl: databaseUrl(), buildDir, env: { ADDRESS_HEADER: 'x-forwarded-for' } });
		const headers = { 'x-forwarded-for': `203.0.113.${1 + (randomBytes(1)[0] % 250)}` };
		await getDb().deleteFrom('rate_limit').where('key', '=', throttleKey('signInPerAddress', headers['x-forwarded-for'])).execute();
		try {
			const user = await person('address');
			const statuses: number[] = [];
			for (let i = 0; i < 50; i++) statuses.push((await action(own.origin, '/signin', {}, { email: `nobody-${i}-${ws.suffix}@${ws.domain}`, password: 'wrong password!' }, { headers })).actionStatus);
			expect(statuses.every((s) => s === 400)).toBe(true);
			const blocked = await action(own.origin, '/signin', {}, { email: user.email, password: PASSWORD }, { headers });
			expect(blocked.actionStatus).toBe(429);
		} finally {
			await own.stop();
		}
	});

	it('sends at most 5 reset links an hour to one e-mail, and says so in the same words for unknown e-mails', async () => {
		const user = await person('reset');
		const unknown = `unknown-${ws.suffix}@${ws.domain}`;
		const answers = async (email: string) => {
			const out: { status: number; message: string }[] = [];
			for (let i = 0; i < 6; i++) {
				const a = await action(server.origin, '/reset', {}, { email });
				out.push({ status: a.actionStatus, message: JSON.stringify(a.data ?? {}).replace(email, '<email>') });
			}
			return out;
		};
		const known = await answers(user.email);
		const none = await answers(unknown);
		expect(known.slice(0, 5).every((a) => a.status === 200)).toBe(true);
		expect(known[5].status).toBe(429);
		// The unknown e-mail gets exactly the same sequence of answers: nothing tells whether an account exists.
		expect(none).toEqual(known);
	});

	it('answers an unknown e-mail and a wrong password with the same status and words', async () => {
		const user = await person('generic');
		const wrong = await signIn(server.origin, user.email, 'not the password');
		const unknown = await signIn(server.origin, `ghost-${ws.suffix}@${ws.domain}`, 'not the password');
		expect([wrong.actionStatus, wrong.message]).toEqual([400, 'E-mail or password is wrong']);
		expect([unknown.actionStatus, unknown.message]).toEqual([wrong.actionStatus, wrong.message]);
	});
});

describe('sessions', () => {
	it('gives a new session id on sign-in and ends the one the browser came with', async () => {
		const user = await person('rotate');
		const before = (await getLucia().createSession(user.id, {})).id;
		const res = await signIn(server.origin, user.email, PASSWORD, before);
		expect(res.type).toBe('redirect');
		const after = sessionValue(sessionCookieOf(res.headers));
		expect(after).not.toBe('');
		expect(after).not.toBe(before);
		expect(await isSignedIn(server.origin, after)).toBe(true);
		expect(await isSignedIn(server.origin, before)).toBe(false);
	});

	it('ends every session of the person when a password is set through a reset link', async () => {
		const user = await person('resetall');
		const sessions = [(await getLucia().createSession(user.id, {})).id, (await getLucia().createSession(user.id, {})).id];
		const { token, tokenHash } = createLinkToken();
		await resetQueries.insertPasswordReset(getDb(), { id: randomUUID(), user_id: user.id, token_hash: tokenHash, expires_at: new Date(Date.now() + 3600_000) });
		const res = await action(server.origin, `/reset/${token}`, { cookie: sessions[0] }, { password: 'a brand new password 77' });
		expect(res.type).toBe('redirect');
		for (const s of sessions) expect(await isSignedIn(server.origin, s)).toBe(false);
		// Signing in with the new password works and makes a new session (rotation after the change).
		const again = await signIn(server.origin, user.email, 'a brand new password 77');
		const fresh = sessionValue(sessionCookieOf(again.headers));
		expect(sessions).not.toContain(fresh);
		expect(await isSignedIn(server.origin, fresh)).toBe(true);
	});
});

describe('API tokens', () => {
	it('stores only the sha256 of a token, and a revoked token opens nothing', async () => {
		const row = await getDb().selectFrom('api_token').selectAll().where('id', '=', ws.viewer.tokenId).executeTakeFirstOrThrow();
		expect(row.token_hash).toBe(createHash('sha256').update(ws.viewer.token).digest('hex'));
		expect(JSON.stringify(row)).not.toContain(ws.viewer.token);
		expect((await api(server.origin, '/api/v1/teams', { token: ws.viewer.token })).status).toBe(200);
		const revoked = await action(server.origin, '/settings/tokens?/revoke', { cookie: ws.viewer.sessionId }, { tokenId: ws.viewer.tokenId });
		expect(revoked.type).toBe('success');
		const after = await api(server.origin, '/api/v1/teams', { token: ws.viewer.token });
		expect(after.status).toBe(401);
		expect(after.body.error).toMatch(/Bearer/);
	});
});

describe('cookies, cross-site posts and headers', () => {
	it('sets the session cookie HttpOnly and SameSite=Lax, without Secure over plain HTTP', async () => {
		const user = await person('cookie');
		const cookie = sessionCookieOf((await signIn(server.origin, user.email, PASSWORD)).headers)!;
		expect(cookie).toMatch(/;\s*HttpOnly/i);
		expect(cookie).toMatch(/;\s*SameSite=Lax/i);
		expect(cookie).not.toMatch(/;\s*Secure/i);
	});

	it('adds Secure when the public origin is HTTPS', async () => {
		const own = await startBuiltServer({ databaseUrl: databaseUrl(), buildDir, origin: 'https://fringefield.example' });
		try {
			const user = await person('secure');
			// Behind an HTTPS proxy the browser's Origin is the public one.
			const res = await action(own.origin, '/signin', {}, { email: user.email, password: PASSWORD }, { origin: 'https://fringefield.example' });
			const cookie = sessionCookieOf(res.headers)!;
			expect(cookie).toMatch(/;\s*Secure/i);
			expect(cookie).toMatch(/;\s*HttpOnly/i);
		} finally {
			await own.stop();
		}
	});

	it('refuses a form posted from another site with 403 and changes nothing', async () => {
		const before = await getDb().selectFrom('team').select('name').where('id', '=', ws.a.teamId).executeTakeFirstOrThrow();
		const res = await action(server.origin, `/teams/${ws.a.teamId}?/rename`, { cookie: ws.owner.sessionId }, { name: 'Renamed from elsewhere' }, { origin: 'http://evil.example' });
		expect(res.status).toBe(403);
		expect(res.text).toMatch(/Cross-site POST form submissions are forbidden/);
		const after = await getDb().selectFrom('team').select('name').where('id', '=', ws.a.teamId).executeTakeFirstOrThrow();
		expect(after.name).toBe(before.name);
	});

	it('sends a CSP without inline script, frame-ancestors none, nosniff and a referrer policy', async () => {
		const res = await fetch(`${server.origin}/signin`);
		await res.arrayBuffer();
		const csp = res.headers.get('content-security-policy') ?? '';
		const script = /script-src ([^;]*)/.exec(csp)?.[1] ?? '';
		expect(script).toContain("'self'");
		expect(script).not.toContain('unsafe-inline');
		expect(csp).toMatch(/frame-ancestors 'none'/);
		expect(csp).toMatch(/object-src 'none'/);
		expect(res.headers.get('x-content-type-options')).toBe('nosniff');
		expect(res.headers.get('referrer-policy')).toBe('same-origin');
		const apiRes = await fetch(`${server.origin}/api/v1/openapi.json`);
		await apiRes.arrayBuffer();
		expect(apiRes.headers.get('x-content-type-options')).toBe('nosniff');
	});
});
