// A browser's view of the hardening: no CSP violations on our pages, the session cookie HttpOnly and
// SameSite=Lax, a form posted from another site refused with 403, the app refusing to be framed, and
// the team owner reading the security log (a token made, a failed sign-in into the account).
import { expect, test } from '@playwright/test';
import { createTeam, newPerson, signUp } from './helpers/accounts';
import { baseURL } from './playwright.config';

test('pages run under the CSP without violations, and the session cookie is HttpOnly and SameSite=Lax', async ({ page, context }) => {
	const violations: string[] = [];
	page.on('console', (m) => {
		if (/Content Security Policy/i.test(m.text())) violations.push(m.text());
	});
	const owner = newPerson('secowner');
	await signUp(page, owner);
	await createTeam(page, `Security team ${owner.email.slice(9, 17)}`);
	for (const path of ['/designs', '/laminates', '/settings/tokens', '/api/docs']) {
		await page.goto(path);
		await expect(page.locator('main')).toBeVisible();
	}
	expect(violations).toEqual([]);
	const session = (await context.cookies()).find((c) => c.name === 'ff_session');
	expect(session?.httpOnly).toBe(true);
	expect(session?.sameSite).toBe('Lax');
	// Plain HTTP on loopback: not Secure (an HTTPS ORIGIN turns it on; tests/integration/hardening/auth-abuse.test.ts).
	expect(session?.secure).toBe(false);
});

test('a form posted from another site is refused with 403', async ({ page }) => {
	// A page on another origin whose form posts to our sign-in action.
	await page.route('http://elsewhere.test/**', (route) =>
		route.fulfill({ contentType: 'text/html', body: `<form method="post" action="${baseURL}/signin"><input name="email" value="x@e2e.test"><input name="password" value="whatever12"><button>go</button></form>` })
	);
	await page.goto('http://elsewhere.test/');
	const [response] = await Promise.all([page.waitForResponse(`${baseURL}/signin`), page.getByRole('button', { name: 'go' }).click()]);
	expect(response.status()).toBe(403);
	await expect(page.getByText('Cross-site POST form submissions are forbidden')).toBeVisible();
});

test('the app refuses to be shown in another site\'s frame', async ({ page }) => {
	await page.route('http://elsewhere.test/**', (route) => route.fulfill({ contentType: 'text/html', body: `<iframe name="app" src="${baseURL}/signin" width="600" height="400"></iframe>` }));
	// What the browser is told: the sign-in page refuses every frame ancestor.
	const answer = await page.request.get(`${baseURL}/signin`);
	expect(answer.headers()['x-frame-options']).toBe('DENY');
	expect(answer.headers()['content-security-policy']).toContain("frame-ancestors 'none'");
	await page.goto('http://elsewhere.test/');
	// Wait until the frame has left about:blank (our page, or the browser's refusal in its place), then look inside.
	await expect.poll(() => page.frame({ name: 'app' })?.url() ?? 'about:blank', { timeout: 10_000 }).not.toBe('about:blank');
	const frame = page.frame({ name: 'app' });
	// frame-ancestors 'none' (and X-Frame-Options DENY): the frame never holds our sign-in form.
	const hasForm = frame ? await frame.locator('input[name="email"]').count().catch(() => 0) : 0;
	expect(hasForm).toBe(0);
});

test('the owner reads token creation and failed sign-ins in the security log', async ({ page, browser }) => {
	const owner = newPerson('logowner');
	await signUp(page, owner);
	const teamId = await createTeam(page, `Log team ${owner.email.slice(9, 17)}`);
	await page.goto('/settings/tokens');
	await page.locator('input[name="name"]').fill('log token');
	await page.getByRole('button', { name: 'Make token' }).click();
	await expect(page.getByRole('table', { name: 'Your tokens' })).toContainText('log token');
	await page.goto(`/teams/${teamId}`);
	await page.getByRole('link', { name: 'Security log' }).click();
	await expect(page).toHaveURL(new RegExp(`/teams/${teamId}/audit$`));
	await expect(page.getByRole('heading', { name: 'Security log' })).toBeVisible();
	await expect(page.getByTestId('audit-row').filter({ hasText: 'API token created' })).toHaveCount(1);
	await page.screenshot({ path: '/tmp/ff-security-log.png', fullPage: true });
	// Another person's failed sign-in into the owner's account shows up too.
	const stranger = await browser.newPage();
	await stranger.goto(`${baseURL}/signin`);
	await stranger.getByLabel('E-mail').fill(owner.email);
	await stranger.getByLabel('Password').fill('not the password at all');
	await stranger.getByRole('button', { name: 'Sign in' }).click();
	await expect(stranger.getByText('E-mail or password is wrong')).toBeVisible();
	await stranger.close();
	await page.reload();
	await expect(page.getByTestId('audit-row').filter({ hasText: 'Failed sign-in' })).toHaveCount(1);
});
