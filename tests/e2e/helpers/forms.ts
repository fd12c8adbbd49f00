// Filling a server-rendered form: typing before the page has hydrated can be wiped by hydration (CI runs met an empty
// name at sign-up and at "New design"), so fill until every field holds its value once the page is idle.
import { expect, type Locator } from '@playwright/test';

export async function fillHydrated(fields: ReadonlyArray<readonly [Locator, string]>): Promise<void> {
	await expect(async () => {
		for (const [field, value] of fields) await field.fill(value);
		await fields[0][0].page().waitForLoadState('networkidle');
		for (const [field, value] of fields) await expect(field).toHaveValue(value, { timeout: 500 });
	}).toPass({ timeout: 15_000 });
}
