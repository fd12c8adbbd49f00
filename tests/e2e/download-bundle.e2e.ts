// Journey: sign up → make a team → add the board house's fab profile → new design → save a revision against it →
// download its bundle → the zip holds the expected files, and the fab notes carry that profile's name, etch tolerance
// and finish; the download shows in the export log, and a re-export of the same revision is marked as matching.
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

	// The board house the designer orders from: its own etch tolerance and finish (demo data), added to the team's list.
	const profileName = `Etch house ${s}`;
	const chosen = { etchToleranceMm: '0.035', finish: 'immersion silver' };
	await page.goto('/fab-profiles');
	await page.locator('input[name="name"]').fill(profileName);
	await page.locator('input[name="etchToleranceMm"]').fill(chosen.etchToleranceMm);
	await page.locator('select[name="finish"]').selectOption(chosen.finish);
	await page.getByRole('button', { name: 'Add profile' }).click();
	await expect(page.getByRole('status')).toContainText(`Added ${profileName}`);

	// Save: a new revision B from A through the editor, checked against that profile.
	await page.goto(`/designs/${designId}/edit?from=A`);
	await page.getByTestId('fab-profile-select').selectOption({ label: profileName });
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
	// The fab notes name the chosen profile and print its etch tolerance and finish (never a figure of their own).
	const notes = await zip.file(`${slug}-B.fab-notes.txt`)!.async('string');
	expect(notes).toContain(`Fab profile: "${profileName}".`);
	expect(notes).toContain(`Etched copper edges: ± ${chosen.etchToleranceMm} mm`);
	expect(notes).toContain(`Hold etched copper edges within ± ${chosen.etchToleranceMm} mm`);
	expect(notes).toContain(`[ ] Finish: ${chosen.finish}`);
	expect(notes).not.toMatch(/±\s?0\.025 mm/);
	expect(notes.indexOf('ORDER CHECKLIST')).toBeLessThan(notes.indexOf('1. BOARD'));

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
