// Journey steps shared by the download and API e2e files: a fresh person, a team, a design, a token.
import { expect, type Page } from '@playwright/test';
import { signUp as signUpConfirmed } from './accounts';
import { fillHydrated } from './forms';

export function uniqueSuffix(): string {
	return `${Date.now().toString(36)}${Math.floor(Math.random() * 1e6).toString(36)}`;
}

/** Sign-up as people do it (form, confirmation link from the caught mail, sign-in): the accounts journey's own step. */
export async function signUp(page: Page, who: { name: string; email: string; password: string }): Promise<void> {
	await signUpConfirmed(page, who);
}

export async function makeTeam(page: Page, name: string): Promise<string> {
	await page.goto('/teams');
	await fillHydrated([[page.getByLabel('Team name'), name]]);
	await page.getByRole('button', { name: 'Make team' }).click();
	await page.waitForURL(/\/teams\/[^/?]+$/);
	return new URL(page.url()).pathname.split('/').pop()!;
}

/** Creates a design from the list page's form; returns its id (the page lands on revision A). */
export async function newDesign(page: Page, name: string): Promise<string> {
	await page.goto('/designs');
	const form = page.locator('form[action="?/create"]');
	await fillHydrated([[form.getByLabel('Name'), name]]);
	await form.getByRole('button', { name: 'Create design' }).click();
	await page.waitForURL(/\/designs\/[^/]+\/r\/A$/);
	return new URL(page.url()).pathname.split('/')[2];
}

export async function makeToken(page: Page, name: string): Promise<string> {
	await page.goto('/settings/tokens');
	await fillHydrated([[page.getByLabel('Name'), name]]);
	await page.getByRole('button', { name: 'Make token' }).click();
	const secret = page.getByTestId('token-secret');
	await expect(secret).toBeVisible();
	return (await secret.textContent())!.trim();
}
