// Journey: an editor builds a sweep plan on a revision — the count follows the typing, past 10 000 points it cannot be saved —
// previews a point, saves it and downloads the sweep JSON with progress shown (recorded); then looks at the tolerance study.
import { readFileSync } from 'node:fs';
import { expect, test, type Page } from '@playwright/test';
import { closeDb, getDb } from '../../src/lib/server/db';
import { seedEditorWithDesign } from './helpers/seed';

let editor = { id: '', email: '', password: '' };
let designId = '';

test.beforeAll(async () => {
	// Demo data: 2.45 GHz inset patch, εr 3.55 ± 0.05, h 1.524 ± 0.05 mm.
	({ editor, designId } = await seedEditorWithDesign('sweep', 'Sim patch', { frequencyHz: 2.45e9, shape: 'rectangular', feed: 'inset', substrate: { relativePermittivity: 3.55, heightMm: 1.524, relativePermittivityTolerance: 0.05, heightToleranceMm: 0.05 } }));
});
test.afterAll(async () => {
	await closeDb();
});

async function signIn(page: Page, next: string) {
	await page.goto(`/signin?next=${encodeURIComponent(next)}`);
	await page.getByLabel('E-mail').fill(editor.email);
	await page.getByLabel('Password').fill(editor.password);
	await page.getByRole('button', { name: /sign in/i }).click();
	await page.waitForURL((url) => url.pathname === next);
}

test('the count follows the typing, a plan over 10 000 points cannot be saved, a point previews, the export shows progress and is recorded', async ({ page }) => {
	await signIn(page, `/designs/${designId}/r/A/sweeps`);
	const form = page.getByTestId('sweep-plan-form');
	// The default row: εr 3.45 → 3.65 step 0.05 = 5 points.
	await expect(page.getByTestId('point-count')).toHaveText('5');

	await page.getByLabel('Axis 2 parameter').selectOption('substrate.heightMm');
	await page.getByLabel('Axis 2 from').fill('1.0');
	await page.getByLabel('Axis 2 to').fill('1.6');
	await page.getByLabel('Axis 2 step').fill('0.001');
	await expect(page.getByTestId('point-count')).toHaveText('3,005');
	await page.getByLabel('Axis 3 parameter').selectOption('groundMarginMm');
	await page.getByLabel('Axis 3 kind').selectOption('list');
	await page.getByLabel('Axis 3 values').fill('4, 6, 8, 10');
	await expect(page.getByTestId('point-count')).toHaveText('12,020');
	await expect(page.getByTestId('plan-problem')).toContainText('over the 10,000-point limit');
	await expect(form.getByRole('button', { name: 'Save plan' })).toBeDisabled();

	await page.getByLabel('Axis 3 values').fill('4, 8');
	await expect(page.getByTestId('point-count')).toHaveText('6,010');
	await expect(page.getByTestId('plan-problem')).toHaveCount(0);
	await page.getByLabel('Point number').fill('6010');
	await expect(page.getByTestId('point-values')).toContainText('3.65');
	await expect(page.getByTestId('point-values')).toContainText('1.6 mm');
	await form.screenshot({ path: '/tmp/sweep-plan-form.png' });
	await page.screenshot({ path: '/tmp/sweeps-page.png', fullPage: true });

	await page.getByLabel('Plan name').fill('Thickness and margin');
	await form.getByRole('button', { name: 'Save plan' }).click();
	const saved = page.getByTestId('saved-plan').filter({ hasText: 'Thickness and margin' });
	await expect(saved).toContainText('6,010 points');

	const before = Number((await getDb().selectFrom('export_record').select((eb) => eb.fn.countAll<string>().as('n')).where('design_id', '=', designId).where('kind', '=', 'sweep-plan').executeTakeFirstOrThrow()).n);
	const downloadPromise = page.waitForEvent('download', { timeout: 60_000 });
	await saved.getByRole('link', { name: 'Download sweep JSON' }).click();
	await expect(saved.getByRole('status')).toContainText(/Sizing and drawing 6,010 points|Receiving/);
	const download = await downloadPromise;
	expect(download.suggestedFilename()).toMatch(/-A\.sweep-thickness-and-margin\.sweep\.json$/);
	const doc = JSON.parse(readFileSync((await download.path())!, 'utf8'));
	expect(doc.pointCount).toBe(6010);
	expect(doc.formatVersion).toBe(2);
	// the default mode: re-size at each point (the plan is stored as plans were before modes)
	expect(doc.plan).not.toHaveProperty('mode');
	await expect(saved.getByRole('status')).toContainText('Saved');
	const records = await getDb().selectFrom('export_record').selectAll().where('design_id', '=', designId).where('kind', '=', 'sweep-plan').execute();
	expect(records.length).toBe(before + 1);
	expect(records[records.length - 1].via).toBe('ui');
});

test('a laminate-spread plan that keeps the revision geometry holds the patch length, where re-sizing changes it', async ({ page }) => {
	await signIn(page, `/designs/${designId}/r/A/sweeps`);
	const form = page.getByTestId('sweep-plan-form');
	await expect(page.getByTestId('point-count')).toHaveText('5');
	await expect(page.getByTestId('point-geometry-mode')).toHaveText('re-sized at this point');
	await form.getByLabel("keep this revision's geometry, vary the material").check();
	await expect(page.getByTestId('point-geometry-mode')).toHaveText("this revision's, held");

	const lengths = async (name: string) => {
		await page.getByLabel('Plan name').fill(name);
		await form.getByRole('button', { name: 'Save plan' }).click();
		const saved = page.getByTestId('saved-plan').filter({ hasText: name });
		await expect(saved).toContainText('5 points');
		const downloadPromise = page.waitForEvent('download', { timeout: 60_000 });
		await saved.getByRole('link', { name: 'Download sweep JSON' }).click();
		const doc = JSON.parse(readFileSync((await (await downloadPromise).path())!, 'utf8'));
		return { saved, doc, lengths: doc.points.map((p: { derived: { patch: { lengthMm: number } } }) => p.derived.patch.lengthMm) as number[] };
	};
	const held = await lengths('Laminate spread held');
	await expect(held.saved).toContainText('geometry held');
	expect(held.doc.plan.mode).toBe('hold-geometry');
	expect(new Set(held.lengths).size).toBe(1);

	await form.getByLabel('re-size at each point').check();
	const resized = await lengths('Laminate spread re-sized');
	await expect(resized.saved).toContainText('re-sized at each point');
	expect(new Set(resized.lengths).size).toBe(5);
});

test('the tolerance study draws the spread with the usable band and the share of boards in it', async ({ page }) => {
	await signIn(page, `/designs/${designId}/r/A/tolerance`);
	const histogram = page.getByTestId('tolerance-histogram');
	await expect(histogram).toBeVisible();
	await expect(page.getByLabel('Etch ± (mm)')).toHaveValue('0.05');
	const share = async () => Number((await page.getByTestId('share-in-band').textContent())!.replace('%', ''));
	const first = await share();
	expect(first).toBeGreaterThan(0);
	expect(first).toBeLessThanOrEqual(100);
	await histogram.screenshot({ path: '/tmp/tolerance-histogram.png' });
	// A tighter laminate keeps more boards in band.
	await page.getByLabel('εr ± (laminate)').fill('0.01');
	await page.getByLabel('Thickness ± (mm)').fill('0.01');
	await expect.poll(share).toBeGreaterThan(first);
});
