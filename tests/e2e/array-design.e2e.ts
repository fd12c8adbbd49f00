// Journeys: an editor turns a patch into a 4 × 1 array in the editor (the live preview shows the four patches and the
// corporate feed), saves it, sees the array-factor plot on the revision page and downloads a bundle with the array
// pattern and every copper Gerber; then makes an aperture-coupled design whose bundle holds the inner-layer Gerber.
import { readFile } from 'node:fs/promises';
import { expect, test, type Page } from '@playwright/test';
import JSZip from 'jszip';
import { makeTeam, newDesign, signUp, uniqueSuffix } from './helpers/exports';

async function downloadBundle(page: Page): Promise<JSZip> {
	const [download] = await Promise.all([page.waitForEvent('download'), page.locator('a[data-format="bundle"]').click()]);
	return JSZip.loadAsync(await readFile((await download.path())!));
}

test('a 4 × 1 array made in the editor: live preview with four patches and the feed network, pattern plot, bundle with the array pattern and every copper', async ({ page }) => {
	const s = uniqueSuffix();
	await signUp(page, { name: `Array Maker ${s}`, email: `array-${s}@e2e.test`, password: 'four patches in a row' });
	await makeTeam(page, `Array bench ${s}`);
	const designId = await newDesign(page, `Gateway array ${s}`);

	await page.goto(`/designs/${designId}/edit?from=A`);
	const preview = page.getByTestId('patch-preview');
	await expect(preview.locator('[data-role="patch"]')).toHaveCount(1);
	await page.getByLabel('Repeat as an array with a corporate feed').check();
	await expect(page.getByLabel('Columns (along x)')).toHaveValue('4');
	// the live preview redraws from the same schema and sizing: four patches on the top copper, joined by the corporate feed
	await expect(preview.locator('[data-layer="copper-top"] [data-role="patch"]')).toHaveCount(4);
	expect(await preview.locator('[data-layer="copper-top"] [data-role="feed-network"]').count()).toBeGreaterThan(0);
	await expect(page.getByTestId('preview-summary')).toHaveAttribute('data-patches', '4');
	await expect(page.locator('[data-quantity="arrayElements"] td').first()).toHaveText('4 × 1 = 4');

	// a column count the corporate feed cannot split is named beside its field, and saving is held back
	await page.getByLabel('Columns (along x)').fill('3');
	await expect(page.locator('[data-issue-for="array.columns"]')).toContainText('power of two');
	await page.getByLabel('Columns (along x)').fill('4');
	await expect(page.locator('[data-issue-for="array.columns"]')).toHaveCount(0);

	await page.getByLabel('What changed (revision note)').fill('Four in a row for more gain');
	await page.evaluate(() => window.scrollTo(0, 0));
	await page.screenshot({ path: '/tmp/ff-editor-array.png', fullPage: true });
	await page.getByRole('button', { name: 'Save as new revision' }).click();
	await page.waitForURL(new RegExp(`/designs/${designId}/r/B$`));

	// the revision page: the array-factor figures and the pattern cuts
	const pattern = page.getByTestId('array-pattern');
	await expect(pattern).toBeVisible();
	await expect(pattern.locator('[data-testid="array-pattern-plot"] path[data-cut="xz"]')).toHaveCount(1);
	await expect(pattern.locator('[data-testid="array-pattern-plot"] path[data-cut="yz"]')).toHaveCount(1);
	// a broadside line of four at 0.7 λ0: the array factor alone gives about 10·log10(4 · 2 · 0.7) ≈ 7.5 dBi (Balanis ch. 6, 2N·d/λ, from memory)
	const directivity = Number((await pattern.locator('[data-figure="directivity"]').textContent())!.replace(/[^\d.-]/g, ''));
	expect(directivity).toBeGreaterThan(6);
	expect(directivity).toBeLessThan(9);
	// the gain is a budget: element gain + 10·log10 4 − the feed's line loss − the mismatch, and it adds up
	const term = async (t: string) => Number((await pattern.locator(`[data-term="${t}"]`).textContent())!.replace(/[^\d.-]/g, ''));
	const gain = Number((await pattern.locator('[data-figure="gain"]').textContent())!.replace(/[^\d.-]/g, ''));
	expect(await term('array')).toBeCloseTo(6.02, 2);
	expect(await term('feed-loss')).toBeGreaterThan(0);
	expect(gain).toBeCloseTo((await term('element')) + (await term('array')) - (await term('feed-loss')) - (await term('mismatch')), 1);
	// the grating-lobe condition reads as a true statement (0.7 λ0 against the broadside limit 1 λ0)
	await expect(pattern.locator('[data-figure="grating-lobes"] [data-axis="x"]')).toHaveText('x: pitch 0.7 λ₀ < limit 1.000 λ₀: no grating lobe');
	await pattern.scrollIntoViewIfNeeded();
	await pattern.screenshot({ path: '/tmp/ff-array-pattern.png' });
	await page.screenshot({ path: '/tmp/ff-revision-array.png', fullPage: true });

	const zip = await downloadBundle(page);
	const names = Object.keys(zip.files);
	const slug = `gateway-array-${s}-B`;
	expect(names).toContain(`${slug}.array-pattern.json`);
	for (const copper of ['copper-top', 'copper-bottom']) expect(names).toContain(`${slug}.${copper}.gbr`);
	const arrayPattern = JSON.parse(await zip.file(`${slug}.array-pattern.json`)!.async('string'));
	expect(JSON.stringify(arrayPattern)).toContain('"columns":4');
});

test('an aperture-coupled patch made in the editor: a three-copper stack-up, its table on the revision page, an inner-layer Gerber in the bundle', async ({ page }) => {
	const s = uniqueSuffix();
	await signUp(page, { name: `Stack Maker ${s}`, email: `stack-${s}@e2e.test`, password: 'slot in the middle ground' });
	await makeTeam(page, `Stack bench ${s}`);
	const designId = await newDesign(page, `Radar slot patch ${s}`);

	await page.goto(`/designs/${designId}/edit?from=A`);
	await page.getByLabel('Feed', { exact: true }).selectOption('aperture-coupled');
	// a feed that needs three coppers starts a three-copper stack from the substrate: copper, dielectric, copper, dielectric, copper
	const rows = page.getByTestId('stack-rows').locator('[data-stack-row]');
	await expect(rows).toHaveCount(5);
	await expect(rows.nth(2)).toHaveAttribute('data-kind', 'copper');
	const preview = page.getByTestId('patch-preview');
	await expect(preview.locator('[data-layer="copper-inner-1"]')).toHaveCount(1);
	await expect(page.getByRole('group', { name: 'Layers' }).getByText('L2 ground')).toBeVisible();
	// every copper layer can be switched off, the inner one too
	await page.getByRole('group', { name: 'Layers' }).getByLabel('L2 ground').uncheck();
	await expect(preview.locator('[data-layer="copper-inner-1"]')).toHaveCount(0);
	await page.getByRole('group', { name: 'Layers' }).getByLabel('L2 ground').check();

	// a thinner feed substrate below the ground, and a bonding film under the patch core
	await page.getByLabel('Layer 4 h').fill('0.508');
	await rows.nth(1).getByRole('button', { name: '+ film' }).click();
	await expect(rows).toHaveCount(6);
	await expect(rows.nth(2)).toContainText('Bonding film');
	// a negative height is named beside its row
	await page.getByLabel('Layer 3 h').fill('-1');
	await expect(page.locator('[data-issue-for="stack.2.heightMm"]')).toContainText('allowed range');
	await page.getByLabel('Layer 3 h').fill('0.1');
	await expect(page.locator('[data-issue-for="stack.2.heightMm"]')).toHaveCount(0);
	await expect(page.locator('[data-quantity="slotLengthMm"]')).toBeVisible();

	await page.getByLabel('What changed (revision note)').fill('Aperture-coupled on a bonded stack');
	await page.evaluate(() => window.scrollTo(0, 0));
	await page.screenshot({ path: '/tmp/ff-editor-stack.png', fullPage: true });
	await page.getByRole('button', { name: 'Save as new revision' }).click();
	await page.waitForURL(new RegExp(`/designs/${designId}/r/B$`));

	const table = page.getByTestId('stack-table');
	await expect(table.locator('[data-stack-layer]')).toHaveCount(6);
	await expect(table).toContainText('Bonding film');
	await table.screenshot({ path: '/tmp/ff-stack-table.png' });

	const zip = await downloadBundle(page);
	const slug = `radar-slot-patch-${s}-B`;
	const inner = zip.file(`${slug}.copper-inner-1.gbr`);
	expect(inner).not.toBeNull();
	// Gerber Layer Format Specification §5.6.3: an inner copper layer is Copper,L<n>,Inr
	expect(await inner!.async('string')).toContain('%TF.FileFunction,Copper,L2,Inr*%');
	for (const copper of ['copper-top', 'copper-bottom']) expect(zip.file(`${slug}.${copper}.gbr`)).not.toBeNull();
});
