// Journey: an editor changes the frequency → the live preview and derived values follow before saving → bad input
// is named beside its field → save → revision B exists with parent A.
import { expect, test } from '@playwright/test';
import { makeTeam, newDesign, signUp, uniqueSuffix } from './helpers/exports';

test('editing the frequency updates the preview live, saves revision B from A, and a second save from A forks', async ({ page }) => {
	const s = uniqueSuffix();
	await signUp(page, { name: `Editor ${s}`, email: `editor-${s}@e2e.test`, password: 'retune the patch today' });
	await makeTeam(page, `Retune bench ${s}`);
	const designId = await newDesign(page, `Gateway patch ${s}`);
	await newDesign(page, `Spare patch ${s}`);
	await page.goto('/designs');
	await expect(page.locator('tr[data-design]')).toHaveCount(2);
	await page.screenshot({ path: '/tmp/ff-designs.png', fullPage: true });

	await page.goto(`/designs/${designId}/r/A`);
	await page.getByRole('link', { name: 'Edit from A' }).click();
	await page.waitForURL(new RegExp(`/designs/${designId}/edit\\?from=A$`));

	const length = page.locator('[data-quantity="patchLengthMm"] td').first();
	const patch = page.getByTestId('patch-preview').locator('[data-layer="copper-top"] path').first();
	const lengthA = Number(await length.textContent());
	const outlineA = await patch.getAttribute('d');
	expect(lengthA).toBeGreaterThan(20);

	// Lower frequency → longer patch (L ∝ 1/f, transmission-line model): shown before anything is saved.
	const freq = page.getByLabel('Target frequency f₀');
	await freq.fill('2.2');
	await expect.poll(async () => Number(await length.textContent())).toBeGreaterThan(lengthA * 1.08);
	expect(await patch.getAttribute('d')).not.toBe(outlineA);

	// Out of range: the issue shows beside the field in GHz, the typed text stays, saving is held back.
	await freq.fill('500');
	const issue = page.locator('[data-issue-for="frequencyGHz"]');
	await expect(issue).toContainText('[0.1, 100] GHz');
	await expect(freq).toHaveValue('500');
	await freq.fill('2.2');
	await expect(issue).toHaveCount(0);

	await page.getByLabel('What changed (revision note)').fill('Retuned to 2.2 GHz');
	await page.evaluate(() => window.scrollTo(0, 0));
	await page.screenshot({ path: '/tmp/ff-editor.png', fullPage: true });
	await page.getByRole('button', { name: 'Save as new revision' }).click();
	await page.waitForURL(new RegExp(`/designs/${designId}/r/B$`));
	await expect(page.getByRole('heading', { level: 1 })).toContainText('rev B');
	await expect(page.locator('[data-input="frequencyGHz"] td').first()).toHaveText('2.200'); // every frequency in GHz with the same three decimals (units/format-quantity.ts)

	// A second save from A (a colleague's retune) forks the history instead of replacing B.
	await page.goto(`/designs/${designId}/edit?from=A`);
	await page.getByLabel('Target frequency f₀').fill('2.5');
	await page.getByLabel('What changed (revision note)').fill('Moved up to 2.5 GHz instead');
	await page.getByRole('button', { name: 'Save as new revision' }).click();
	await page.waitForURL(new RegExp(`/designs/${designId}/r/C$`));

	await page.goto(`/designs/${designId}`);
	await expect(page.locator('[data-revision="B"]')).toHaveAttribute('data-parent', 'A');
	await expect(page.locator('[data-revision="C"]')).toHaveAttribute('data-parent', 'A');
	await expect(page.locator('[data-revision="C"]')).toContainText('fork of A');
	await expect(page.locator('[data-revision="A"]')).toHaveAttribute('data-parent', '');
	await page.screenshot({ path: '/tmp/ff-history.png', fullPage: true });

	await page.goto(`/designs/${designId}/diff?a=A&b=B`);
	await expect(page.locator('[data-row="input-frequencyGHz"]')).toHaveAttribute('data-changed', 'true');
	await page.screenshot({ path: '/tmp/ff-diff.png', fullPage: true });
});
