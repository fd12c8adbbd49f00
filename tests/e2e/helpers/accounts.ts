// Reusable steps for e2e journeys: sign up, sign in and out, make a team, invite, and read the caught mail.
import { expect, type APIRequestContext, type Page } from '@playwright/test';
import { randomBytes } from 'node:crypto';
import { fillHydrated } from './forms';

export const E2E_PASSWORD = 'long enough e2e passphrase';

export interface E2ePerson {
	name: string;
	email: string;
	password: string;
}

/** A person no other run has used (the test database is shared). */
export function newPerson(label: string): E2ePerson {
	const tag = randomBytes(4).toString('hex');
	return { name: `${label[0].toUpperCase()}${label.slice(1)} ${tag}`, email: `${label}-${tag}@e2e.test`, password: E2E_PASSWORD };
}

/**
 * Fills the sign-up form at `path` (/signup, or /signup?invite=… from an invitation), submits it, follows the
 * confirmation link from the caught mail, confirms, and signs in. Ends signed in: on /teams, or on the
 * invitation page when the sign-up came from one.
 */
export async function signUp(page: Page, who: E2ePerson, path = '/signup'): Promise<void> {
	if (path) await page.goto(path);
	await expect(page.getByLabel('Your name')).toBeVisible();
	const fromInvite = new URL(page.url()).searchParams.has('invite');
	await fillHydrated([
		[page.getByLabel('Your name'), who.name],
		[page.getByLabel('E-mail'), who.email],
		[page.getByLabel('Password'), who.password]
	]);
	await page.getByRole('button', { name: /Create account/ }).click();
	await expect(page.getByTestId('signup-sent')).toContainText(`Check your inbox at ${who.email}`);
	const mail = await latestMailTo(page.request, who.email, 10_000, CONFIRM_SUBJECT);
	await page.goto(linkIn(mail, '/confirm/'));
	await page.getByRole('button', { name: 'Confirm my address' }).click();
	await expect(page).toHaveURL(/\/signin\?notice=email-confirmed/);
	await expect(page.getByRole('status')).toContainText('Your e-mail address is confirmed');
	await page.getByLabel('E-mail').fill(who.email);
	await page.getByLabel('Password').fill(who.password);
	await page.getByRole('button', { name: 'Sign in' }).click();
	await expect(page.getByTestId('signed-in-as')).toBeVisible();
	await expect(page).toHaveURL(fromInvite ? /\/invites\// : /\/teams/);
}

export const CONFIRM_SUBJECT = 'Confirm your e-mail for Fringefield';

export async function signIn(page: Page, email: string, password: string, next?: string): Promise<void> {
	await page.goto(next ? `/signin?next=${encodeURIComponent(next)}` : '/signin');
	await page.getByLabel('E-mail').fill(email);
	await page.getByLabel('Password').fill(password);
	await page.getByRole('button', { name: 'Sign in' }).click();
	await expect(page.getByTestId('signed-in-as')).toBeVisible();
}

export async function signOut(page: Page): Promise<void> {
	await page.getByRole('button', { name: 'Sign out' }).click();
	await expect(page).toHaveURL(/\/signin\?notice=signed-out/);
}

/** Makes a team from /teams and returns its id (the page lands on /teams/<id>). */
export async function createTeam(page: Page, name: string): Promise<string> {
	await page.goto('/teams');
	await page.getByLabel('Team name').fill(name);
	await page.getByRole('button', { name: 'Make team' }).click();
	await expect(page.getByRole('heading', { level: 1, name })).toBeVisible();
	const match = /\/teams\/([^/?#]+)/.exec(page.url());
	if (!match) throw new Error(`no team id in ${page.url()}`);
	return match[1];
}

/** As an owner on /teams/<id>: sends an invitation and waits for the confirmation. */
export async function invite(page: Page, teamId: string, email: string, role: 'viewer' | 'editor' | 'owner'): Promise<void> {
	await page.goto(`/teams/${teamId}`);
	const form = page.getByRole('form', { name: 'Invite' });
	await form.getByLabel('E-mail').fill(email);
	await form.getByLabel('Role').selectOption(role);
	await form.getByRole('button', { name: 'Send invitation' }).click();
	await expect(page.getByText(`Invitation sent to ${email}`)).toBeVisible();
}

export interface CaughtMail {
	to: string[];
	subject: string;
	text: string;
	links: string[];
}

/** The newest caught message to `email` (with `subject`, when given), read from the dev mailbox JSON (polls until it arrives). */
export async function latestMailTo(request: APIRequestContext, email: string, timeoutMs = 10_000, subject?: string): Promise<CaughtMail> {
	const deadline = Date.now() + timeoutMs;
	for (;;) {
		const res = await request.get(`/dev/mailbox.json?to=${encodeURIComponent(email)}`);
		expect(res.status()).toBe(200);
		const { messages } = (await res.json()) as { messages: CaughtMail[] };
		const wanted = subject === undefined ? messages : messages.filter((m) => m.subject === subject);
		if (wanted.length > 0) return wanted[0];
		if (Date.now() > deadline) throw new Error(`no mail to ${email} within ${timeoutMs} ms`);
		await new Promise((r) => setTimeout(r, 200));
	}
}

/** The one link in a message whose path starts with `prefix`, as a path on the app (the e2e origin). */
export function linkIn(mail: CaughtMail, prefix: '/invites/' | '/reset/' | '/confirm/'): string {
	const link = mail.links.find((l) => new URL(l).pathname.startsWith(prefix));
	if (!link) throw new Error(`no ${prefix} link in "${mail.subject}"`);
	const url = new URL(link);
	return url.pathname + url.search;
}

/**
 * Journey (4) up to joining: an owner makes a team and invites a new person as viewer; the invitee
 * follows the link from the caught mail, signs up from it, confirms the address, signs in, accepts and
 * lands in the team as viewer.
 * Returns both people and the team, with `invitee` signed in on `inviteePage`.
 */
export async function inviteViewerJourney(ownerPage: Page, inviteePage: Page, teamName: string) {
	const owner = newPerson('owner');
	const invitee = newPerson('viewer');
	await signUp(ownerPage, owner);
	const teamId = await createTeam(ownerPage, teamName);
	await invite(ownerPage, teamId, invitee.email, 'viewer');
	const mail = await latestMailTo(inviteePage.request, invitee.email);
	await inviteePage.goto(linkIn(mail, '/invites/'));
	await inviteePage.getByRole('link', { name: 'Create an account and join' }).click();
	await signUp(inviteePage, invitee, '');
	await inviteePage.getByRole('button', { name: 'Accept and join as viewer' }).click();
	await expect(inviteePage).toHaveURL(/\/teams\?joined=/);
	return { owner, invitee, teamId, mail };
}
