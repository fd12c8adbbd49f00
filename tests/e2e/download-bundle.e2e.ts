// Journey: sign up → make a team → new design → save a revision → download its bundle → the zip holds the expected files;
// the download shows in the export log, and a re-export of the same revision is marked as matching.
import { createHash } from 'node:crypto';
import { readFile } from 'node:fs/promises';
import { expect, test } from '@playwright/test';
import JSZip from 'jszip';
import { makeTeam, newDesign, signUp, uniqueSuffix } from './helpers/exports';

test('a new team’s design downloads as a zip with every file, recorded in the export log', async ({ page }) => {
	const s = uniqueSuffix();
	await signUp(page, { name: `Bundle Tester ${s}`, email: `bundle-${s}@e2e.test`, password: 'copper pour on the ground' });
	await makeTeam(page, `Bundle bench ${s}`);
	const designId = await newDesign(page, `Gate sensor ${s}`);

	// Save: a new revision B from A through the editor.
	await page.goto(`/designs/${designId}/edit?from=A`);
	await page.getByRole('button', { name: 'Save as new revision' }).click();
	await page.waitForURL(new RegExp(`/designs/${designId}/r/B$`));

	const slug = `gate-sensor-${s}`;
	const [download] = await Promise.all([page.waitForEvent('download'), page.locator('a[data-format="bundle"]').click()]);
	expect(download.suggestedFilename()).toBe(`${slug}-B.zip`);
	const bytes = await readFile((await download.path())!);

	// jszip reads the archive back: the file names follow <slug>-<label>.<part>.<ext> (src/lib/formats/bundle/file-names.ts).
	const zip = await JSZip.loadAsync(bytes);
	const names = Object.keys(zip.files);
	for (const part of ['copper-top.gbr', 'drawing.dxf', 'drawing.svg', 'design.sweep.json', 'fab-notes.txt', 'manifest.json']) expect(names).toContain(`${slug}-B.${part}`);
	expect(names.some((n) => /\.gbr$/.test(n) && n !== `${slug}-B.copper-top.gbr`)).toBe(true);
	// The manifest lists every other file with its sha256 (recomputed here with node:crypto).
	const manifest = JSON.parse(await zip.file(`${slug}-B.manifest.json`)!.async('string'));
	const listed = JSON.stringify(manifest);
	for (const name of names.filter((n) => !n.endsWith('manifest.json'))) {
		const hash = createHash('sha256').update(await zip.file(name)!.async('uint8array')).digest('hex');
		expect(listed).toContain(hash);
	}

	// Download again: same bytes; the design's log (fetched by the browser from the API) marks the second as matching.
	const [again] = await Promise.all([page.waitForEvent('download'), page.locator('a[data-format="bundle"]').click()]);
	const bytesAgain = await readFile((await again.path())!);
	expect(createHash('sha256').update(bytesAgain).digest('hex')).toBe(createHash('sha256').update(bytes).digest('hex'));

	await page.goto(`/designs/${designId}/exports`);
	const rows = page.locator('tr[data-export-id]');
	await expect(rows).toHaveCount(2);
	await expect(rows.first().locator('[data-match="matches"]')).toBeVisible();
	await expect(rows.nth(1)).toContainText('first export');
	await page.screenshot({ path: '/tmp/ff-export-log-design.png', fullPage: true });

	await page.goto('/exports');
	await expect(page.locator('tr[data-export-id]')).toHaveCount(2);
	await rows.first().getByRole('button', { name: /bundle/ }).click();
	await expect(page.getByText(`${slug}-B.manifest.json`)).toBeVisible();
	await page.screenshot({ path: '/tmp/ff-export-log-team.png', fullPage: true });
});
