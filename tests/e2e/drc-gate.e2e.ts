// Journey: a team adds a fab profile whose minimum trace is wider than the 50 Ω feed line, an editor saves a revision
// against it → the editor's and the revision's previews mark the violations and list them, the "as the fab sees it"
// view is drawn from the read-back → the download is refused with the list → a waiver with a reason downloads the
// bundle, whose fab notes carry the waiver, and the export record stores it.
import { readFile } from 'node:fs/promises';
import { expect, test } from '@playwright/test';
import JSZip from 'jszip';
import { makeTeam, newDesign, signUp, uniqueSuffix } from './helpers/exports';

test('a violating design is marked, its download refused with the list, and a waiver lets it through into the fab notes', async ({ page }) => {
	test.setTimeout(120_000);
	const s = uniqueSuffix();
	await page.setViewportSize({ width: 1400, height: 1000 });
	await signUp(page, { name: `Gate Tester ${s}`, email: `gate-${s}@e2e.test`, password: 'annular ring of copper' });
	await makeTeam(page, `Gate bench ${s}`);
	const designId = await newDesign(page, `Coarse fab patch ${s}`);

	// Revision A: the built-in profile, clean; the fab view reads our files back as drawn.
	await expect(page.getByTestId('violation-list')).toContainText('Design rules met');
	await expect(page.getByTestId('fab-view')).toHaveAttribute('data-read-back', 'ok');
	await expect(page.getByTestId('violation-marker')).toHaveCount(0);

	// A fab profile of our own: 5 mm minimum trace (wider than any 50 Ω line on this laminate; demo data).
	const profileName = `Coarse shop ${s}`;
	await page.goto('/fab-profiles');
	await expect(page.locator('tr[data-fab-profile="standard quick-turn two-layer"]')).toBeVisible();
	await page.locator('input[name="name"]').fill(profileName);
	await page.locator('input[name="minTraceWidthMm"]').fill('5');
	await page.getByRole('button', { name: 'Add profile' }).click();
	await expect(page.getByRole('status')).toContainText(`Added ${profileName}`);
	await expect(page.locator(`tr[data-fab-profile="${profileName}"]`)).toBeVisible();
	await page.screenshot({ path: '/tmp/drc-fab-profiles.png', fullPage: true });

	// The editor: picking the profile marks the feed line live, before saving.
	await page.goto(`/designs/${designId}/edit?from=A`);
	await page.getByTestId('fab-profile-select').selectOption({ label: profileName });
	await expect(page.getByTestId('violation-marker').first()).toBeVisible();
	await expect(page.getByTestId('violation-list')).toContainText('Trace too narrow');
	await page.screenshot({ path: '/tmp/drc-editor.png', fullPage: true });
	await page.getByRole('button', { name: 'Save as new revision' }).click();
	await page.waitForURL(new RegExp(`/designs/${designId}/r/B$`));

	// Revision B: the markers on the preview, the list beside it, the fab view beside the live preview.
	const markers = page.getByTestId('patch-preview').getByTestId('violation-marker');
	await expect(markers.first()).toBeVisible();
	const list = page.getByTestId('violation-list');
	await expect(list).toContainText(profileName);
	await expect(list.locator('li[data-rule="trace-width"]').first()).toBeVisible();
	expect(await markers.count()).toBe(await list.locator('li').count());
	await expect(page.getByTestId('fab-view')).toHaveAttribute('data-read-back', 'ok');
	await expect(page.getByTestId('fab-view').locator('path[data-fab-layer="copper-L1"]')).toHaveCount(1);
	await page.screenshot({ path: '/tmp/drc-revision.png', fullPage: true });

	// The download is refused with the list.
	await page.locator('a[data-format="bundle"]').click();
	await page.waitForURL(/\/r\/B\/export\/refused\?format=bundle$/);
	await expect(page.getByTestId('export-refused')).toBeVisible();
	await expect(page.getByTestId('violation-list').locator('li[data-rule="trace-width"]').first()).toBeVisible();
	await expect(page.getByTestId('violation-marker').first()).toBeVisible();
	await page.screenshot({ path: '/tmp/drc-refused.png', fullPage: true });

	// The same refusal over the API (same session): 422 with the violations as JSON.
	const api = await page.request.get(`/api/v1/designs/${designId}/revisions/B/export/bundle`);
	expect(api.status()).toBe(422);
	const body = await api.json();
	expect(body.profile.name).toBe(profileName);
	expect(body.violations.some((v: { ruleId: string }) => v.ruleId === 'trace-width')).toBe(true);

	// Waiver → download works; the fab notes in the zip carry the reason and each waived violation.
	const reason = `Shop confirmed it can etch our feed line (${s})`;
	await page.getByLabel('Why these are acceptable').fill(reason);
	const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('waive-download').click()]);
	const slug = `coarse-fab-patch-${s}`;
	expect(download.suggestedFilename()).toBe(`${slug}-B.zip`);
	const zip = await JSZip.loadAsync(await readFile((await download.path())!));
	const notes = await zip.file(`${slug}-B.fab-notes.txt`)!.async('string');
	expect(notes).toContain(`against the "${profileName}" profile accepted by the design team. Reason: "${reason}"`);
	expect(notes.match(/ - Waived: /g)?.length).toBe(body.violations.length);

	// The export log marks the waived download and shows the reason when its row is opened.
	await page.goto(`/designs/${designId}/exports`);
	const row = page.locator('tr[data-export-id]').first();
	await expect(row.locator('[data-waiver-mark]')).toBeVisible();
	await row.getByRole('button', { name: /bundle/ }).click();
	await expect(page.locator('[data-waiver-reason]')).toContainText(reason);
	await page.screenshot({ path: '/tmp/drc-export-log-waiver.png', fullPage: true });
	// Repeating a waived export says it will ask for a reason again, and leads to the refusal page that asks for it.
	const again = row.locator('[data-download-again]');
	await expect(again).toHaveText('Export again (waiver)');
	await again.click();
	await expect(page.getByLabel('Why these are acceptable')).toBeVisible();
});
