// Journey of a designer giving a board its finish: a new design starts with solder mask and a top legend; the fab view
// draws both from the Gerber files read back; the editor covers the patch with mask (the sizing says so) and places a
// mounting hole, which the design-rule check holds 5 h from the patch until the margin gives it room.
import { expect, test, type Page } from '@playwright/test';
import { closeDb } from '../../src/lib/server/db';
import { signIn } from './helpers/accounts';
import { seedEditorWithDesign, type SeededEditor } from './helpers/seed';

// The editor needs a team; its first design is only there to make one (demo data).
const demo = { frequencyHz: 2.45e9, shape: 'rectangular', feed: 'inset', substrate: { relativePermittivity: 3.55, heightMm: 1.524, lossTangent: 0.0027 } };
let seeded: SeededEditor;

test.beforeAll(async () => {
	seeded = await seedEditorWithDesign('finish', 'Team starter', demo);
});
test.afterAll(async () => {
	await closeDb();
});

async function revisionUrl(page: Page): Promise<{ designId: string; label: string }> {
	await page.waitForURL(/\/designs\/[^/]+\/r\/[A-Z]+$/);
	const [, designId, label] = /\/designs\/([^/]+)\/r\/([A-Z]+)$/.exec(new URL(page.url()).pathname)!;
	return { designId, label };
}

test('a new design has mask and legend in its fab view; covering the patch and placing a hole are checked', async ({ page }) => {
	await page.setViewportSize({ width: 1400, height: 1100 });
	await signIn(page, seeded.editor.email, seeded.editor.password, '/designs');
	await page.goto('/designs');
	const name = `Roof patch ${seeded.suffix}`;
	await page.locator('input[name="name"]').fill(name);
	await page.locator('input[name="frequencyGHz"]').fill('2.45');
	await page.getByRole('button', { name: 'Create design' }).click();
	const { designId, label } = await revisionUrl(page);
	expect(label).toBe('A');

	// the fab view is drawn from the files as the board house reads them: the top mask sheet with its openings, the legend ink
	const fab = page.getByTestId('fab-view');
	await expect(fab).toHaveAttribute('data-read-back', 'ok');
	await expect(fab.locator('[data-fab-layer="mask-top"]')).toHaveCount(1);
	await expect(fab.locator('[data-fab-layer="legend-top"]')).toHaveCount(1);
	await expect(page.getByTestId('fab-mask')).toContainText('Top mask');
	await expect(page.getByTestId('fab-legend')).toContainText(/\d+ strokes/);
	// the preview shows the legend too (the revision line is stamped into the files only)
	await expect(page.getByTestId('patch-preview').locator('[data-layer="legend-top"]')).toHaveCount(1);
	await expect(page.getByTestId('violation-list')).toContainText('Design rules met');
	await fab.scrollIntoViewIfNeeded();
	await page.screenshot({ path: '/work/shots/legend-fab-view-new-design.png', fullPage: true });

	// cover the patch with mask and put a hole in the lower-left corner: too near the patch on a 3 h margin
	await page.goto(`/designs/${designId}/edit?from=A`);
	await page.getByLabel('Mask over the patch').selectOption('covered');
	await page.getByLabel('Mounting holes (NPTH)').fill('2.6 2.6 2.2');
	await page.getByRole('button', { name: 'Save as new revision' }).click();
	await revisionUrl(page);
	await expect(page.getByTestId('violation-list').locator('li[data-rule="hole-keep-out"]')).toHaveCount(1);
	await expect(page.getByText('Patch εeff under the mask (sized on this)')).toBeVisible();

	// a wider margin gives the hole room: the rules are met again and the hole is in the non-plated drill file
	await page.goto(`/designs/${designId}/edit?from=B`);
	await page.getByLabel('Ground margin').fill('12');
	await page.getByLabel('Mounting holes (NPTH)').fill('3.5 3.5 2.2');
	await page.getByRole('button', { name: 'Save as new revision' }).click();
	const third = await revisionUrl(page);
	expect(third.label).toBe('C');
	await expect(page.getByTestId('violation-list')).toContainText('Design rules met');
	await expect(page.getByTestId('fab-view')).toHaveAttribute('data-read-back', 'ok');
	await expect(page.getByTestId('fab-view').locator('[data-fab-layer="holes"]')).toHaveCount(1);
	await page.getByTestId('fab-view').scrollIntoViewIfNeeded();
	await page.screenshot({ path: '/work/shots/legend-fab-view-covered-hole.png', fullPage: true });
});
