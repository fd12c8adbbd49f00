// Journey: a teammate downloads revision A's bundle and DXF, opens the design's export log → each row's size is the
// length of the bytes downloaded, "Download again" gives the very same sha256, the full hash copies to the clipboard,
// the row links to its revision; the team-wide log and the design's log have titles of their own.
import { createHash } from 'node:crypto';
import { readFile } from 'node:fs/promises';
import { expect, test, type Download, type Locator, type Page } from '@playwright/test';
import { closeDb } from '../../src/lib/server/db';
import { signIn } from './helpers/accounts';
import { seedTeamWithEveryRole, type SeededTeam } from './helpers/seed';

let seeded: SeededTeam;
test.beforeAll(async () => {
	// 2.45 GHz inset-fed patch on εr 3.55, 1.524 mm (demo data).
	seeded = await seedTeamWithEveryRole('xlog', { frequencyHz: 2.45e9, shape: 'rectangular', feed: 'inset', substrate: { relativePermittivity: 3.55, heightMm: 1.524, lossTangent: 0.0027 } });
});
test.afterAll(async () => {
	await closeDb();
});

async function bytesOf(download: Download): Promise<Buffer> {
	return readFile((await download.path())!);
}
const sha256 = (b: Buffer) => createHash('sha256').update(b).digest('hex');

async function download(page: Page, trigger: Locator): Promise<Buffer> {
	const [d] = await Promise.all([page.waitForEvent('download'), trigger.click()]);
	return bytesOf(d);
}

test('the export log shows the downloaded size, downloads again byte for byte, copies the hash and links the revision', async ({ page, context, baseURL }) => {
	await context.grantPermissions(['clipboard-read', 'clipboard-write'], { origin: baseURL });
	await page.setViewportSize({ width: 1400, height: 900 });
	const { designId } = seeded;
	const viewer = seeded.people.viewer;
	await signIn(page, viewer.email, viewer.password, `/designs/${designId}/r/A`);
	await page.goto(`/designs/${designId}/r/A`);
	const bundle = await download(page, page.locator('a[data-format="bundle"]'));
	const dxf = await download(page, page.locator('a[data-format="dxf"]'));

	await page.goto(`/designs/${designId}/exports`);
	await expect(page).toHaveTitle(/^Export log of xlog patch /);
	await expect(page.getByRole('heading', { level: 1 })).toHaveText(/^Export log of xlog patch /);
	const rows = page.locator('tr[data-export-id]');
	await expect(rows).toHaveCount(2);
	// Newest first: the DXF, then the bundle.
	const [dxfRow, bundleRow] = [rows.nth(0), rows.nth(1)];
	await expect(dxfRow).toContainText('dxf');
	await expect(bundleRow).toContainText('bundle');

	// Size = the bytes the hash covers: the zip's length for the bundle, the file's for the DXF.
	await expect(bundleRow.locator('[data-size-bytes]')).toHaveAttribute('data-size-bytes', String(bundle.byteLength));
	await expect(bundleRow.locator('[data-sha256]')).toHaveAttribute('data-sha256', sha256(bundle));
	await expect(dxfRow.locator('[data-size-bytes]')).toHaveAttribute('data-size-bytes', String(dxf.byteLength));
	await expect(dxfRow.locator('[data-sha256]')).toHaveAttribute('data-sha256', sha256(dxf));
	await expect(bundleRow.locator('[data-size-bytes]')).toHaveText(`${(bundle.byteLength / 1024).toFixed(1)} KiB`);
	await page.screenshot({ path: '/work/shots/exportlog-design-log.png', fullPage: true });

	// The full sha256, copied (the cell shows 12 characters).
	await expect(bundleRow.locator('[data-sha256]')).toHaveText(`${sha256(bundle).slice(0, 12)}…`);
	await bundleRow.locator('[data-copy-sha256]').click();
	await expect(bundleRow.locator('[data-copy-sha256]')).toHaveText('Copied');
	expect(await page.evaluate(() => navigator.clipboard.readText())).toBe(sha256(bundle));

	// Download again: the same revision and format, the same bytes, and one more row that matches the first.
	const again = await download(page, bundleRow.locator('[data-download-again]'));
	expect(sha256(again)).toBe(sha256(bundle));
	await page.reload();
	await expect(rows).toHaveCount(3);
	await expect(rows.first()).toContainText('bundle');
	await expect(rows.first().locator('[data-match="matches"]')).toBeVisible();
	await expect(rows.first().locator('[data-size-bytes]')).toHaveAttribute('data-size-bytes', String(again.byteLength));

	// The team-wide log: its own title and heading; the revision link opens revision A.
	await page.goto('/exports');
	await expect(page).toHaveTitle(/^Team export log · /);
	await expect(page.getByRole('heading', { level: 1 })).toHaveText('Team export log');
	await expect(page.locator('tr[data-export-id]')).toHaveCount(3);
	await page.screenshot({ path: '/work/shots/exportlog-team-log.png', fullPage: true });
	await page.locator('tr[data-export-id]').first().locator('[data-revision-link]').click();
	await expect(page).toHaveURL(new RegExp(`/designs/${designId}/r/A$`));
});
