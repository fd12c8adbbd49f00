// Journey: an editor opens the revision page of the largest array (64 × 64) → the page answers with the design-rule
// check and plain notes that the board is too large to draw or read back on the page (naming the limit), the copy
// buttons point to the DXF download, every download is offered → an ordinary design's page still draws the preview,
// the fab view read back from the files and the check, and hydrates without redoing that work in the browser.
import { expect, test } from '@playwright/test';
import { arrayBenchDocument } from '../../src/lib/design';
import { closeDb } from '../../src/lib/server/db';
import { signIn } from './helpers/accounts';
import { seedEditorWithDesign, type SeededEditor } from './helpers/seed';

// A 2.45 GHz inset-fed patch on εr 3.55, 1.524 mm (demo data).
const patch = { frequencyHz: 2.45e9, shape: 'rectangular', feed: 'inset', substrate: { relativePermittivity: 3.55, heightMm: 1.524, lossTangent: 0.0027 } };
let large: SeededEditor;
let ordinary: SeededEditor;

test.beforeAll(async () => {
	large = await seedEditorWithDesign('bigarr', 'Largest array', arrayBenchDocument(64) as unknown as Record<string, unknown>);
	ordinary = await seedEditorWithDesign('plainrev', 'Plain patch', patch);
});
test.afterAll(async () => {
	await closeDb();
});

test('the largest array’s revision page shows its check and says plainly what it does not draw', async ({ page }) => {
	await page.setViewportSize({ width: 1400, height: 1000 });
	await signIn(page, large.editor.email, large.editor.password, `/designs/${large.designId}/r/A`);
	await page.goto(`/designs/${large.designId}/r/A`);
	await expect(page.getByTestId('preview-over-limit')).toContainText(/Revision A is too large to draw on this page: \d{2} \d{3} shapes, and the page draws at most 4 000 shapes\./);
	await expect(page.getByTestId('fab-view-over-limit')).toContainText('too large to read back on this page');
	await expect(page.getByTestId('violation-list')).toBeVisible();
	await expect(page.getByTestId('patch-preview')).toHaveCount(0);
	await expect(page.getByTestId('fab-view')).toHaveCount(0);
	// the copy buttons have nothing to copy from: the note points to the download, which is offered with the others
	await expect(page.getByTestId('copy-dxf')).toBeDisabled();
	await expect(page.getByTestId('mechanical-copy-hint')).toContainText('download the DXF file instead');
	await expect(page.locator('a[data-format="dxf"]')).toBeVisible();
	await expect(page.locator('a[data-format="bundle"]')).toBeVisible();
	// the array-factor plot comes from the stored sizing, drawn whatever the size
	await expect(page.getByTestId('array-pattern')).toBeVisible();
	await page.screenshot({ path: '/tmp/ff-revpage-large-array.png', fullPage: true });

	// its editor neither draws nor checks 4 096 patches as one types: a note names the live limit; the sizing still follows
	await page.goto(`/designs/${large.designId}/edit?from=A`);
	await expect(page.getByTestId('editor-over-live-limit')).toContainText('4,096 elements: the editor draws and checks arrays of at most 256 elements');
	await expect(page.getByTestId('patch-preview')).toHaveCount(0);
	const length = page.locator('[data-quantity="patchLengthMm"] td').first();
	const before = Number(await length.textContent());
	await page.getByLabel('Target frequency f₀').fill('2.2');
	await expect.poll(async () => Number(await length.textContent())).toBeGreaterThan(before * 1.05);
	await page.screenshot({ path: '/tmp/ff-editor-large-array.png', fullPage: true });
});

test('an ordinary design’s revision page still draws the preview, the fab view and the check', async ({ page }) => {
	await page.setViewportSize({ width: 1400, height: 1000 });
	await signIn(page, ordinary.editor.email, ordinary.editor.password, `/designs/${ordinary.designId}/r/A`);
	await page.goto(`/designs/${ordinary.designId}/r/A`);
	const preview = page.getByTestId('patch-preview');
	await expect(preview.locator('[data-layer="copper-top"] [data-role="patch"]')).toHaveCount(1);
	await expect(page.getByTestId('fab-view')).toHaveAttribute('data-read-back', 'ok');
	await expect(page.getByTestId('fab-view').locator('path[data-fab-layer="copper-L1"]')).toHaveCount(1);
	await expect(page.getByTestId('violation-list')).toContainText('Design rules met');
	await expect(page.getByTestId('copy-dxf')).toBeEnabled();
	await expect(page.locator('[data-testid$="over-limit"]')).toHaveCount(0);
	// hydrated: the preview's layer switch works in the browser
	await page.getByRole('group', { name: 'Layers' }).getByLabel('Top copper').uncheck();
	await expect(preview.locator('[data-layer="copper-top"]')).toHaveCount(0);
	await page.getByRole('group', { name: 'Layers' }).getByLabel('Top copper').check();
	await page.screenshot({ path: '/tmp/ff-revpage-ordinary.png', fullPage: true });
});
