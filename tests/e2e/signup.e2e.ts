// Journey: sign up → confirm the address from the caught mail → sign in → make a team → sign out → a wrong password
// gets the generic refusal → sign in; a taken address gets the same answer (and its owner a note); a common
// password is refused with the reason; forgot the password → the e-mailed link sets a new one once and revokes
// API tokens; a personal API token is shown once and can be revoked.
import { expect, test } from '@playwright/test';
import { createTeam, latestMailTo, linkIn, newPerson, signIn, signOut, signUp } from './helpers/accounts';

test('sign up, make a team, sign out and back in; a wrong password gets the generic message', async ({ page }) => {
	const me = newPerson('founder');
	await signUp(page, me);
	await expect(page.getByTestId('signed-in-as')).toHaveText(me.name);
	const teamName = `Heron Bench ${Date.now().toString(36)}`;
	const teamId = await createTeam(page, teamName);
	await expect(page.getByText('You are owner here.')).toBeVisible();
	await page.screenshot({ path: '/tmp/ff-team-new.png', fullPage: true });
	await page.goto('/teams');
	await page.screenshot({ path: '/tmp/ff-teams.png', fullPage: true });
	await signOut(page);

	await page.goto('/teams');
	await expect(page).toHaveURL(/\/signin\?next=%2Fteams/);
	await page.getByLabel('E-mail').fill(me.email);
	await page.getByLabel('Password').fill('not my password at all');
	await page.getByRole('button', { name: 'Sign in' }).click();
	await expect(page.getByRole('alert')).toHaveText('E-mail or password is wrong');
	await page.screenshot({ path: '/tmp/ff-signin-refused.png', fullPage: true });
	await page.getByLabel('E-mail').fill(`nobody-${me.email}`);
	await page.getByLabel('Password').fill(me.password);
	await page.getByRole('button', { name: 'Sign in' }).click();
	await expect(page.getByRole('alert')).toHaveText('E-mail or password is wrong');

	await signIn(page, me.email, me.password, `/teams/${teamId}`);
	await expect(page).toHaveURL(new RegExp(`/teams/${teamId}$`));
	await expect(page.locator('#team-switcher option:checked')).toHaveText(teamName);
	await expect(page.getByTestId('current-role')).toHaveText('owner');
});

test('sign-up answers a taken address exactly as a new one, and refuses a common password with the reason', async ({ page }) => {
	const me = newPerson('twice');
	await signUp(page, me);
	await signOut(page);
	await page.goto('/signup');
	await page.getByLabel('Your name').fill('Someone else');
	await page.getByLabel('E-mail').fill(me.email);
	await page.getByLabel('Password').fill('1234567890');
	await page.getByRole('button', { name: 'Create account' }).click();
	await expect(page.getByText('password is one of the most common passwords')).toBeVisible();
	await page.getByLabel('Password').fill('a different long passphrase');
	await page.getByRole('button', { name: 'Create account' }).click();
	await expect(page.getByTestId('signup-sent')).toContainText(`Check your inbox at ${me.email}`);
	const note = await latestMailTo(page.request, me.email, 10_000, 'Someone tried to make a Fringefield account with your e-mail');
	expect(note.text).toContain('No new account was made');
	expect(note.links.some((l) => l.includes('/confirm/'))).toBe(false);
	await signIn(page, me.email, me.password);
});

test('a forgotten password is replaced through the single-use link in the caught e-mail', async ({ page, browser }) => {
	const me = newPerson('forgetful');
	await signUp(page, me);
	// A second browser stays signed in; the reset must end its session too.
	const other = await browser.newContext();
	const otherPage = await other.newPage();
	await signIn(otherPage, me.email, me.password);
	await signOut(page);

	await page.goto('/signin');
	await page.getByRole('link', { name: 'Forgot your password?' }).click();
	await page.getByLabel('E-mail').fill(me.email);
	await page.getByRole('button', { name: 'Send the link' }).click();
	await expect(page.getByRole('status')).toContainText(`If ${me.email} has an account`);
	const mail = await latestMailTo(page.request, me.email, 10_000, 'Set a new Fringefield password');
	expect(mail.subject).toBe('Set a new Fringefield password');
	const link = linkIn(mail, '/reset/');

	await page.goto(link);
	await page.getByLabel('New password').fill('a fresh and long passphrase');
	await page.getByRole('button', { name: 'Set password' }).click();
	await expect(page).toHaveURL(/\/signin\?notice=password-set/);
	await expect(page.getByRole('status')).toContainText('your API tokens are revoked');
	const changed = await latestMailTo(page.request, me.email, 10_000, 'Your Fringefield password was changed');
	expect(changed.text).toContain('(this account had no live API tokens)');
	await signIn(page, me.email, 'a fresh and long passphrase');

	await otherPage.goto('/teams');
	await expect(otherPage).toHaveURL(/\/signin/);
	await other.close();

	await page.goto(link);
	await expect(page.getByRole('alert')).toContainText('This link is not valid any more');
});

test('a personal API token is shown once, listed with its team, works as a bearer token and can be revoked', async ({ page, request }) => {
	const me = newPerson('scripter');
	await signUp(page, me);
	const teamName = `Osprey Sweep ${Date.now().toString(36)}`;
	await createTeam(page, teamName);
	await page.goto('/settings/tokens');
	await page.getByLabel('Name').fill('lab sweep runner');
	await page.getByRole('button', { name: 'Make token' }).click();
	const secret = (await page.getByTestId('token-secret').textContent())!.trim();
	expect(secret).toMatch(/^ff_[A-Za-z0-9_-]{32}$/);
	const row = page.getByTestId('token-row').filter({ hasText: 'lab sweep runner' });
	await expect(row).toContainText(teamName);
	await expect(row).toContainText('never');
	await page.screenshot({ path: '/tmp/ff-tokens-created.png', fullPage: true });

	// The page identifies a bearer token on any route; the signed-in layout then knows who it is.
	const res = await request.get('/teams', { headers: { authorization: `Bearer ${secret}` }, maxRedirects: 0 });
	expect(res.status()).toBe(200);
	await page.reload();
	await expect(page.getByTestId('token-secret')).toHaveCount(0);
	await expect(page.getByText(secret)).toHaveCount(0);
	await expect(page.getByTestId('token-row').filter({ hasText: 'lab sweep runner' })).not.toContainText('never');
	await page.screenshot({ path: '/tmp/ff-tokens.png', fullPage: true });

	await page.getByTestId('token-row').filter({ hasText: 'lab sweep runner' }).getByRole('button', { name: 'Revoke' }).click();
	await expect(page.getByText('Token revoked')).toBeVisible();
	const after = await request.get('/teams', { headers: { authorization: `Bearer ${secret}` }, maxRedirects: 0 });
	expect(after.status()).toBe(303);
});

test('the sign-in page', async ({ page }) => {
	await page.goto('/signin');
	await expect(page.getByRole('heading', { name: 'Sign in' })).toBeVisible();
	await page.screenshot({ path: '/tmp/ff-signin.png', fullPage: true });
	await page.goto('/signup');
	await page.screenshot({ path: '/tmp/ff-signup.png', fullPage: true });
});
