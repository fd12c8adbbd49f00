// Journey: an editor uploads a measured S11 file (the picker empties once it is stored), sees the plot with its resonance,
// confirms the retune and lands on the new revision's own page, which names the measurement (its upload form empty); a malformed file shows its line-numbered error and changes nothing;
// a 150 000-point file opens with a plot, and the editor deletes it after confirming.
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { expect, test, type Page } from '@playwright/test';
import { closeDb, getDb } from '../../src/lib/server/db';
import { longSweepS1p } from '../integration/measurements/helpers/long-sweep';
import { seedEditorWithDesign } from './helpers/seed';

const fixtures = path.join(path.dirname(fileURLToPath(import.meta.url)), '../fixtures/touchstone-upload');
let editor = { id: '', email: '', password: '' };
let designId = '';

test.beforeAll(async () => {
	// 2.45 GHz inset-fed patch on εr 3.55, 1.524 mm (demo data); the fixture board resonates at 2.41 GHz.
	({ editor, designId } = await seedEditorWithDesign('meas', 'Bench patch', { frequencyHz: 2.45e9, shape: 'rectangular', feed: 'inset', substrate: { relativePermittivity: 3.55, heightMm: 1.524, lossTangent: 0.0027 } }));
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

const revisionCount = async () => Number((await getDb().selectFrom('revision').select((eb) => eb.fn.countAll<string>().as('n')).where('design_id', '=', designId).executeTakeFirstOrThrow()).n);
const measurementCount = async () =>
	Number(
		(await getDb().selectFrom('measurement').innerJoin('revision', 'revision.id', 'measurement.revision_id').select((eb) => eb.fn.countAll<string>().as('n')).where('revision.design_id', '=', designId).executeTakeFirstOrThrow()).n
	);

test('a malformed file shows its line-numbered error and changes nothing', async ({ page }) => {
	await signIn(page, `/designs/${designId}/r/A/measurements`);
	await page.getByLabel('Touchstone file').setInputFiles(path.join(fixtures, 'broken-line-7.s1p'));
	await page.getByRole('button', { name: 'Upload' }).click();
	await expect(page.getByTestId('upload-error')).toContainText('line 7: expected a number');
	await expect(page.getByTestId('upload-error')).toContainText('Nothing was stored');
	await expect(page.getByTestId('s11-plot')).toHaveCount(0);
	expect(await measurementCount()).toBe(0);
	expect(await revisionCount()).toBe(1);
});

test('upload → plot with the resonance → confirm the retune → a new revision that links the measurement', async ({ page }) => {
	await signIn(page, `/designs/${designId}/r/A/measurements`);
	await page.getByLabel('Touchstone file').setInputFiles(path.join(fixtures, 'bench-2g4.s1p'));
	await page.getByRole('button', { name: 'Upload' }).click();

	const plot = page.getByTestId('s11-plot');
	await expect(plot).toBeVisible();
	// Stored: the picker no longer holds the file (the page stays, so the browser would keep it).
	await expect(page.getByLabel('Touchstone file')).toHaveValue('');
	await expect(page.getByTestId('s11-resonance')).toContainText('2.410 GHz');
	await expect(page.getByTestId('s11-band')).toHaveCount(1);
	await expect(page.getByTestId('resonance')).toHaveText(/^2\.410\d GHz$/);
	await plot.screenshot({ path: '/tmp/s11-plot.png' });
	await page.screenshot({ path: '/tmp/measurements-page.png', fullPage: true });
	expect(await measurementCount()).toBe(1);

	const apparent = Number(await page.getByTestId('apparent-er').textContent());
	expect(apparent).toBeGreaterThan(3.55);
	await page.getByRole('button', { name: 'Create a retuned revision from A' }).click();
	// The new revision's page, not its (empty) measurements page.
	await page.waitForURL((url) => url.pathname === `/designs/${designId}/r/B`);
	await expect(page.getByRole('heading', { level: 1 })).toContainText('rev B');
	await expect(page.getByTestId('retuned-from')).toContainText('bench-2g4.s1p');
	await expect(page.getByTestId('retuned-from')).toContainText('of A');
	await page.screenshot({ path: '/work/shots/exportlog-retuned-revision.png', fullPage: true });
	// B's measurements: nothing uploaded yet, and the picker is empty.
	await page.getByRole('link', { name: 'Measured S11' }).click();
	await page.waitForURL((url) => url.pathname === `/designs/${designId}/r/B/measurements`);
	await expect(page.getByText('No measurements of this revision yet.')).toBeVisible();
	await expect(page.getByLabel('Touchstone file')).toHaveValue('');
	await expect(page.getByTestId('retuned-from')).toContainText('of revision A');

	const b = await getDb().selectFrom('revision').select(['parent_id', 'retuned_from_measurement_id', 'input']).where('design_id', '=', designId).where('label', '=', 'B').executeTakeFirstOrThrow();
	const m = await getDb().selectFrom('measurement').innerJoin('revision', 'revision.id', 'measurement.revision_id').select(['measurement.id', 'revision.id as rid']).where('revision.design_id', '=', designId).executeTakeFirstOrThrow();
	expect(b.retuned_from_measurement_id).toBe(m.id);
	expect(b.parent_id).toBe(m.rid);
	expect((b.input as { substrate: { relativePermittivity: number } }).substrate.relativePermittivity).toBe(apparent);
});

test('a 150 000-point file opens with a plot of at most 2 points per column, and the editor deletes it after confirming', async ({ page }) => {
	test.setTimeout(180_000);
	await signIn(page, `/designs/${designId}/r/A/measurements`);
	const before = await measurementCount();
	await page.getByLabel('Touchstone file').setInputFiles({ name: 'long-bench.s1p', mimeType: 'text/plain', buffer: Buffer.from(longSweepS1p(150_000)) });
	await page.getByRole('button', { name: 'Upload' }).click();
	await expect(page.getByRole('heading', { name: 'long-bench.s1p' })).toBeVisible({ timeout: 120_000 });
	await expect(page.getByTestId('s11-plot')).toBeVisible();
	await expect(page.getByTestId('s11-resonance')).toContainText('2.410 GHz');
	await expect(page.getByTestId('s11-figures')).toContainText('150000 points');
	// The drawn curve: one move and at most 2 × 688 − 1 line segments (688 pixel columns).
	const d = (await page.getByTestId('s11-plot').locator('path').getAttribute('d'))!;
	expect(d.split('L').length).toBeLessThanOrEqual(2 * 688);
	expect(d.split('L').length).toBeGreaterThan(600);
	expect(await measurementCount()).toBe(before + 1);

	await page.getByRole('button', { name: 'Delete long-bench.s1p' }).click();
	const confirm = page.getByTestId('delete-confirm');
	await expect(confirm).toContainText('security log');
	expect(await measurementCount()).toBe(before + 1);
	await confirm.getByRole('button', { name: 'Delete long-bench.s1p' }).click();
	await expect(page.getByRole('link', { name: 'long-bench.s1p' })).toHaveCount(0);
	await expect(page.getByTestId('delete-confirm')).toHaveCount(0);
	expect(await measurementCount()).toBe(before);
});
