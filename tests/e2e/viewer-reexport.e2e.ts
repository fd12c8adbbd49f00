// Journey 4, the rest of it: a person invited by e-mail as a viewer cannot edit (the page hides it and the
// server refuses it), can download, and a re-export of revision A is byte-identical to the owner's earlier one.
import { createHash } from 'node:crypto';
import { readFile } from 'node:fs/promises';
import { expect, test, type Download, type Page } from '@playwright/test';
import { inviteViewerJourney } from './helpers/accounts';
import { newDesign } from './helpers/exports';

async function sha256Of(download: Download): Promise<string> {
	return createHash('sha256').update(await readFile((await download.path())!)).digest('hex');
}

async function downloadBundle(page: Page): Promise<Download> {
	const [download] = await Promise.all([page.waitForEvent('download'), page.locator('a[data-format="bundle"]').click()]);
	return download;
}

test('an invited viewer is refused editing, downloads revision A, and its hash matches the earlier export', async ({ browser }) => {
	// The invitation journey now confirms the invitee's address through the caught mail before signing in.
	test.setTimeout(120_000);
	const ownerContext = await browser.newContext();
	const viewerContext = await browser.newContext();
	const ownerPage = await ownerContext.newPage();
	const viewerPage = await viewerContext.newPage();
	await inviteViewerJourney(ownerPage, viewerPage, `Tern Array ${Date.now().toString(36)}`);

	// The owner (whose only team is the new one) makes a design, downloads A, then saves B from A.
	const designId = await newDesign(ownerPage, 'Harbour buoy 1.6 GHz');
	const ownerHash = await sha256Of(await downloadBundle(ownerPage));
	await ownerPage.goto(`/designs/${designId}/edit?from=A`);
	await ownerPage.getByLabel('Target frequency f₀').fill('1.62');
	await ownerPage.getByRole('button', { name: 'Save as new revision' }).click();
	await ownerPage.waitForURL(new RegExp(`/designs/${designId}/r/B$`));

	// The viewer sees revision A without an edit button…
	await viewerPage.goto(`/designs/${designId}/r/A`);
	await expect(viewerPage.getByRole('heading', { level: 1 })).toContainText('Harbour buoy');
	await expect(viewerPage.getByRole('link', { name: /Edit from/ })).toHaveCount(0);
	// …the editor page itself is refused…
	const editPage = await viewerPage.goto(`/designs/${designId}/edit?from=A`);
	expect(editPage?.status()).toBe(403);
	// …and so is the save action posted directly, which writes nothing.
	const refused = await viewerPage.request.post(`/designs/${designId}/edit?from=A&/save`, {
		form: { name: 'sneaky', frequencyGHz: '2.4' },
		headers: { origin: new URL(viewerPage.url()).origin, 'x-sveltekit-action': 'true' }
	});
	expect(refused.status()).toBe(403);
	await viewerPage.goto(`/designs/${designId}`);
	await expect(viewerPage.getByText('2 revisions')).toBeVisible();

	// Downloading works for the viewer, and re-exporting A gives the very bytes the owner got.
	await viewerPage.goto(`/designs/${designId}/r/A`);
	const viewerHash = await sha256Of(await downloadBundle(viewerPage));
	expect(viewerHash).toBe(ownerHash);

	// The export log records both downloads and marks the re-export as matching the earlier one.
	await viewerPage.goto(`/designs/${designId}/exports`);
	const rows = viewerPage.locator('tr[data-export-id]');
	await expect(rows).toHaveCount(2);
	await expect(rows.first().locator('[data-match="matches"]')).toBeVisible();

	await ownerContext.close();
	await viewerContext.close();
});
