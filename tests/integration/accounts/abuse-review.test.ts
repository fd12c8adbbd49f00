// Abuse review (issue 13), the accounts items: the sign-in throttle (5), invitations after a removal (6),
// invitations as a mail relay (7), sign-up that reveals no accounts and confirms addresses (13), and a
// password reset that revokes API tokens (14). Services and routes against the real PostgreSQL and SMTP.
import { randomBytes, randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
	acceptInvite,
	AccountError,
	checkCredentials,
	completePasswordReset,
	confirmEmail,
	createApiToken,
	CONFIRM_LINK_LIFETIME_MS,
	describeInvite,
	inviteToTeam,
	listApiTokens,
	removeMember,
	THROTTLE_LIMITS
} from '../../../src/lib/server/accounts';
import { createLinkToken } from '../../../src/lib/server/accounts/link-token';
import { listTeamAuditEvents } from '../../../src/lib/server/audit';
import { closeDb, getDb } from '../../../src/lib/server/db';
import * as resetQueries from '../../../src/lib/server/db/reset.queries';
import { findRoleByTeamAndUser } from '../../../src/lib/server/db/team.queries';
import * as signinPage from '../../../src/routes/signin/+page.server';
import * as signupPage from '../../../src/routes/signup/+page.server';
import * as tokensPage from '../../../src/routes/(app)/settings/tokens/+page.server';
import * as confirmPage from '../../../src/routes/confirm/+page.server';
import * as confirmLinkPage from '../../../src/routes/confirm/[token]/+page.server';
import { addMember, emailFor, person, TEST_PASSWORD, teamWithRoles, uniqueSuffix, type TeamFixture } from './helpers/people';
import { call, cookieJar, identityFor, sessionFor } from './helpers/route-event';
import { startSmtpCatcher, tokenFromLink, type SmtpCatcher } from './helpers/smtp-catcher';
import { CURRENT_TEAM_COOKIE } from '../../../src/lib/server/teams/current-team';

const suffix = uniqueSuffix('abuse');
let smtp: SmtpCatcher;
let team: TeamFixture;

beforeAll(async () => {
	smtp = await startSmtpCatcher();
	team = await teamWithRoles(suffix);
});
afterAll(async () => {
	await smtp.close();
	await closeDb();
});

const anonymous = () => identityFor(null);
const ownAddress = () => `198.51.100.${randomBytes(1)[0]}-${randomBytes(3).toString('hex')}`; // RFC 5737 documentation range, made unique
const codeOf = (e: unknown) => (e instanceof AccountError ? e.code : String(e));

async function signInAction(email: string, password: string, clientAddress: string) {
	return call(signinPage.actions.default as never, { identity: await anonymous(), path: '/signin', form: { email, password, next: '/designs' }, clientAddress });
}

async function failedVerifications(userId: string): Promise<number> {
	const rows = await getDb().selectFrom('audit_event').select('id').where('kind', '=', 'signin.failed').where('actor_user_id', '=', userId).execute();
	return rows.length;
}

async function resetLinkFor(userId: string): Promise<string> {
	const { token, tokenHash } = createLinkToken();
	await resetQueries.insertPasswordReset(getDb(), { id: randomUUID(), user_id: userId, token_hash: tokenHash, expires_at: new Date(Date.now() + 3600_000) });
	return token;
}

describe('item 5: the sign-in throttle', () => {
	it('checks at most 10 of 15 parallel wrong passwords and refuses at least 5 with 429', async () => {
		const user = await person('parallel', suffix);
		const address = ownAddress();
		const outcomes = await Promise.all(Array.from({ length: 15 }, () => signInAction(user.email, 'not the password at all', address)));
		const statuses = outcomes.map((o) => o.outcome);
		expect(THROTTLE_LIMITS.signInPerEmail.points).toBe(10);
		expect(await failedVerifications(user.id)).toBeLessThanOrEqual(10);
		expect(statuses.filter((s) => s === 429).length).toBeGreaterThanOrEqual(5);
		expect(statuses.filter((s) => s === 400).length).toBeLessThanOrEqual(10);
	});

	it('lets the person back in after a completed password reset, at once', async () => {
		const user = await person('lockedout', suffix);
		const address = ownAddress();
		for (let i = 0; i < 10; i++) expect((await signInAction(user.email, 'not the password at all', address)).outcome).toBe(400);
		expect((await signInAction(user.email, TEST_PASSWORD, address)).outcome).toBe(429);
		const { delivery } = await completePasswordReset(await resetLinkFor(user.id), { password: 'a new start after the lock' });
		await delivery;
		const after = await signInAction(user.email, 'a new start after the lock', address);
		expect(after.outcome).toBe('ok');
		expect(after.location).toBe('/designs');
	});

	it('keeps its counts in PostgreSQL, under hashed keys', async () => {
		const user = await person('stored', suffix);
		await signInAction(user.email, 'not the password at all', ownAddress());
		const rows = await getDb().selectFrom('rate_limit').select(['key', 'points']).where('key', 'like', 'signInPerEmail:%').execute();
		expect(rows.length).toBeGreaterThan(0);
		expect(rows.every((r) => /^signInPerEmail:[0-9a-f]{64}$/.test(r.key))).toBe(true);
		expect(JSON.stringify(rows)).not.toContain(user.email);
	});
});

describe('item 6: removing a member', () => {
	it('withdraws the invitations they sent and those naming them, so nobody comes back through an earlier one', async () => {
		const s = uniqueSuffix('removal');
		const fx = await teamWithRoles(s);
		const second = await person('second-owner', s);
		await addMember(fx.teamId, second.id, 'owner');
		// The second owner invites another address of theirs as owner, and someone else invites them back in advance.
		await inviteToTeam(fx.teamId, second.id, { email: emailFor('second-owner-alt', s), role: 'owner' });
		const altToken = tokenFromLink((await smtp.waitFor(emailFor('second-owner-alt', s))).links[0], '/invites/');
		await inviteToTeam(fx.teamId, fx.owner.id, { email: second.email, role: 'owner' });
		const backToken = tokenFromLink((await smtp.waitFor(second.email)).links[0], '/invites/');
		// An unrelated pending invitation stays.
		await inviteToTeam(fx.teamId, fx.owner.id, { email: emailFor('bystander', s), role: 'viewer' });
		const bystanderToken = tokenFromLink((await smtp.waitFor(emailFor('bystander', s))).links[0], '/invites/');

		await removeMember(fx.teamId, { userId: second.id }, new Date(), fx.owner.id);

		expect(await describeInvite(altToken)).toBeNull();
		expect(await describeInvite(backToken)).toBeNull();
		expect(codeOf(await acceptInvite(backToken, second.id).catch((e: unknown) => e))).toBe('link-invalid');
		expect(await findRoleByTeamAndUser(getDb(), fx.teamId, second.id)).toBeNull();
		expect((await describeInvite(bystanderToken))?.state).toBe('live');

		const bystander = await person('bystander', s);
		await acceptInvite(bystanderToken, bystander.id);
		const log = await listTeamAuditEvents(fx.teamId);
		const kinds = log.map((e) => e.kind);
		expect(kinds.filter((k) => k === 'invite.sent')).toHaveLength(3);
		expect(kinds.filter((k) => k === 'invite.revoked')).toHaveLength(2);
		expect(kinds.filter((k) => k === 'invite.accepted')).toHaveLength(1);
		const revoked = log.filter((e) => e.kind === 'invite.revoked').map((e) => e.details.reason).sort();
		expect(revoked).toEqual(['invited person removed from the team', 'sender removed from the team']);
		expect(log.find((e) => e.kind === 'invite.revoked')?.label).toBe('Invitation revoked');
	});
});

describe('item 7: invitations are not a mail relay', () => {
	it('stops a person after 10 invitations an hour and a team after 20', async () => {
		const s = uniqueSuffix('relay');
		const fx = await teamWithRoles(s);
		const other = await person('other-owner', s);
		await addMember(fx.teamId, other.id, 'owner');
		expect(THROTTLE_LIMITS.invitesPerPerson.points).toBe(10);
		expect(THROTTLE_LIMITS.invitesPerTeam.points).toBe(20);
		const send = (by: string, i: number) => inviteToTeam(fx.teamId, by, { email: `relay-${i}-${s}@elsewhere.test`, role: 'viewer' });
		for (let i = 0; i < 10; i++) await send(fx.owner.id, i);
		expect(codeOf(await send(fx.owner.id, 10).catch((e: unknown) => e))).toBe('too-many');
		for (let i = 11; i < 21; i++) await send(other.id, i);
		// The team's 20 are used (10 + 10); the refused attempt above counted towards the first owner only.
		const third = await person('third-owner', s);
		await addMember(fx.teamId, third.id, 'owner');
		const refused = await send(third.id, 21).catch((e: unknown) => e);
		expect(codeOf(refused)).toBe('too-many');
		expect((refused as Error).message).toMatch(/try again in \d+ minute/);
		const sent = await getDb().selectFrom('team_invite').select('id').where('team_id', '=', fx.teamId).execute();
		expect(sent).toHaveLength(20);
	});

	it('keeps the team name and every link out of the subject, and shows the inviter’s confirmed address in the body', async () => {
		const s = uniqueSuffix('subject');
		const fx = await teamWithRoles(s);
		const spam = 'WIN A PRIZE http://spam.example/claim';
		await getDb().updateTable('team').set({ name: spam }).where('id', '=', fx.teamId).execute();
		const to = emailFor('target', s);
		await inviteToTeam(fx.teamId, fx.owner.id, { email: to, role: 'viewer' });
		const mail = await smtp.waitFor(to);
		expect(mail.subject).toBe('An invitation to a team on Fringefield');
		expect(mail.subject).not.toMatch(/https?:|spam|PRIZE/i);
		expect(mail.text).toContain(`<${fx.owner.email}>`);
		expect(mail.text).toContain(`The address ${fx.owner.email} is confirmed`);
	});

	it('refuses invitations from an account whose address is not confirmed', async () => {
		const s = uniqueSuffix('unconfirmed-sender');
		const sender = await person('sender', s, { confirmed: false });
		const fx = await teamWithRoles(s);
		await addMember(fx.teamId, sender.id, 'owner');
		const err = await inviteToTeam(fx.teamId, sender.id, { email: emailFor('anyone', s), role: 'viewer' }).catch((e: unknown) => e);
		expect(codeOf(err)).toBe('email-unconfirmed');
		expect((err as Error).message).toMatch(/Confirm your e-mail address before inviting people/);
	});
});

describe('item 13: sign-up tells nobody whether an address is taken, and confirms addresses', () => {
	const signUpAction = async (email: string, password = 'quarter wave transformer') =>
		call(signupPage.actions.default as never, { identity: await anonymous(), path: '/signup', form: { displayName: 'Someone', email, password } });

	it('answers a new and a taken address alike; the mail says which', async () => {
		const fresh = emailFor('fresh', suffix);
		const taken = team.editor.email;
		const a = await signUpAction(fresh);
		const b = await signUpAction(taken);
		expect(a.outcome).toBe('ok');
		expect([b.outcome, JSON.stringify(b.data).replace(taken, '<e-mail>')]).toEqual([a.outcome, JSON.stringify(a.data).replace(fresh, '<e-mail>')]);
		const toFresh = await smtp.waitFor(fresh);
		expect(toFresh.subject).toBe('Confirm your e-mail for Fringefield');
		expect(toFresh.links.some((l) => new URL(l).pathname.startsWith('/confirm/'))).toBe(true);
		const toTaken = await smtp.waitFor(taken);
		expect(toTaken.subject).toBe('Someone tried to make a Fringefield account with your e-mail');
		expect(toTaken.links.some((l) => new URL(l).pathname.startsWith('/confirm/'))).toBe(false);
		// The taken address's account is untouched: its password still works.
		await expect(checkCredentials({ email: taken, password: TEST_PASSWORD })).resolves.toMatchObject({ id: team.editor.id });
	});

	it('confirms with a single-use link that expires after two days and is stored as a sha256 only', async () => {
		const email = emailFor('confirming', suffix);
		await signUpAction(email);
		const link = (await smtp.waitFor(email)).links.find((l) => new URL(l).pathname.startsWith('/confirm/'))!;
		const token = tokenFromLink(link, '/confirm/');
		const rows = await getDb().selectFrom('email_verification').innerJoin('app_user', 'app_user.id', 'email_verification.user_id').select(['email_verification.token_hash', 'email_verification.expires_at', 'app_user.email_verified_at']).where('app_user.email', '=', email).execute();
		expect(rows).toHaveLength(1);
		expect(rows[0].token_hash).toMatch(/^[0-9a-f]{64}$/);
		expect(JSON.stringify(rows)).not.toContain(token);
		expect(rows[0].email_verified_at).toBeNull();
		expect(CONFIRM_LINK_LIFETIME_MS).toBe(48 * 3600 * 1000);
		const late = await confirmEmail(token, new Date(rows[0].expires_at.getTime() + 1000)).catch((e: unknown) => e);
		expect(codeOf(late)).toBe('link-invalid');
		const used = await call(confirmLinkPage.actions.default as never, { identity: await anonymous(), path: `/confirm/${token}`, params: { token } });
		expect(used.location).toBe('/signin?notice=email-confirmed&next=%2Fteams');
		const again = await call(confirmLinkPage.actions.default as never, { identity: await anonymous(), path: `/confirm/${token}`, params: { token } });
		expect(again.outcome).toBe(410);
		const after = await getDb().selectFrom('app_user').select('email_verified_at').where('email', '=', email).executeTakeFirstOrThrow();
		expect(after.email_verified_at).not.toBeNull();
	});

	it('lets an unconfirmed account sign in, but not make API tokens, be invited as owner or accept as owner; a new link fixes that', async () => {
		const s = uniqueSuffix('unconfirmed');
		const fx = await teamWithRoles(s);
		const newcomer = await person('newcomer', s, { confirmed: false });
		await expect(checkCredentials({ email: newcomer.email, password: TEST_PASSWORD })).resolves.toMatchObject({ id: newcomer.id });
		await addMember(fx.teamId, newcomer.id, 'editor');

		const identity = await identityFor(await sessionFor(newcomer.id));
		expect(identity.user?.emailVerified).toBe(false);
		const jar = cookieJar({ [CURRENT_TEAM_COOKIE]: fx.teamId });
		const tokenTry = await call(tokensPage.actions.create as never, { identity, path: '/settings/tokens?/create', form: { name: 'too early' }, cookies: jar });
		expect(tokenTry.outcome).toBe(403);
		expect((tokenTry.data as { message: string }).message).toMatch(/Confirm your e-mail address before making API tokens/);
		expect(await listApiTokens(newcomer.id)).toEqual([]);

		const asOwner = await inviteToTeam(fx.teamId, fx.owner.id, { email: newcomer.email, role: 'owner' }).catch((e: unknown) => e);
		expect(codeOf(asOwner)).toBe('invitee-unconfirmed');
		// An owner invitation to an address without an account goes out, but an unconfirmed account cannot use it; it stays usable.
		const ownerLinkTo = emailFor('owner-link', s);
		await inviteToTeam(fx.teamId, fx.owner.id, { email: ownerLinkTo, role: 'owner' });
		const ownerToken = tokenFromLink((await smtp.waitFor(ownerLinkTo)).links[0], '/invites/');
		expect(codeOf(await acceptInvite(ownerToken, newcomer.id).catch((e: unknown) => e))).toBe('email-unconfirmed');
		expect(await findRoleByTeamAndUser(getDb(), fx.teamId, newcomer.id)).toBe('editor');
		expect((await describeInvite(ownerToken))?.state).toBe('live');

		const resent = await call(confirmPage.actions.resend as never, { identity, path: '/confirm?/resend' });
		expect(resent.data).toMatchObject({ sent: true, email: newcomer.email });
		const token = tokenFromLink((await smtp.waitFor(newcomer.email)).links.find((l) => l.includes('/confirm/'))!, '/confirm/');
		await confirmEmail(token);
		const confirmed = await identityFor(await sessionFor(newcomer.id));
		expect(confirmed.user?.emailVerified).toBe(true);
		expect((await call(tokensPage.actions.create as never, { identity: confirmed, path: '/settings/tokens?/create', form: { name: 'now it works' }, cookies: jar })).outcome).toBe('ok');
		await expect(acceptInvite(ownerToken, newcomer.id)).resolves.toMatchObject({ role: 'owner' });
	});
});

describe('item 14: a password reset revokes API tokens', () => {
	it('revokes every API token of the person, and the mail that follows lists them by name', async () => {
		const s = uniqueSuffix('tokens');
		const fx = await teamWithRoles(s);
		const tokens = [await createApiToken(fx.editor.id, fx.teamId, { name: 'lab sweep runner' }), await createApiToken(fx.editor.id, fx.teamId, { name: 'ci export job' })];
		const bystander = await createApiToken(fx.viewer.id, fx.teamId, { name: 'viewer script' });
		const before = await identityFor(null, tokens[0].secret);
		expect(before.user?.id).toBe(fx.editor.id);
		const { revokedTokens, delivery } = await completePasswordReset(await resetLinkFor(fx.editor.id), { password: 'tokens end with the old password' });
		await delivery;
		expect(revokedTokens).toEqual(['lab sweep runner', 'ci export job']);
		expect(await listApiTokens(fx.editor.id)).toEqual([]);
		expect((await identityFor(null, tokens[0].secret)).user).toBeNull();
		expect((await identityFor(null, bystander.secret)).user?.id).toBe(fx.viewer.id);
		const mail = smtp.messages.filter((m) => m.to.includes(fx.editor.email) && m.subject === 'Your Fringefield password was changed');
		expect(mail).toHaveLength(1);
		expect(mail[0].text).toContain('  - lab sweep runner\n  - ci export job');
		const log = await listTeamAuditEvents(fx.teamId);
		expect(log.some((e) => e.kind === 'token.revoked' && e.details.reason === 'password reset')).toBe(true);
	});
});
