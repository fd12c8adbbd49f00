// Journey: an editor starts a field check from the revision page (quick mesh), follows its progress bar while the
// worker runs openEMS, and gets the S11 plot (model and full-wave curves), the Smith chart, R and X, and the resonance
// in words; the status endpoint the page polls answers the same result.
import { expect, test } from '@playwright/test';
import { closeDb } from '../../src/lib/server/db';
import { seedEditorWithDesign } from './helpers/seed';

let editor = { id: '', email: '', password: '' };
let designId = '';

test.beforeAll(async () => {
	// A thick, low-εr 2.45 GHz patch (demo data): a low Q settles quickly, so the quick mesh runs in tens of seconds.
	({ editor, designId } = await seedEditorWithDesign('fieldcheck', 'Low-Q patch', {
		frequencyHz: 2.45e9,
		shape: 'rectangular',
		feed: 'inset',
		substrate: { relativePermittivity: 2.2, heightMm: 3.175, lossTangent: 0.0009 }
	}));
});
test.afterAll(async () => {
	await closeDb();
});

test('an editor runs a field check and sees its progress, the S11 plot and the Smith chart', async ({ page }) => {
	test.setTimeout(240_000);
	const revisionPath = `/designs/${designId}/r/A`;
	await page.goto(`/signin?next=${encodeURIComponent(revisionPath)}`);
	await page.getByLabel('E-mail').fill(editor.email);
	await page.getByLabel('Password').fill(editor.password);
	await page.getByRole('button', { name: /sign in/i }).click();
	await page.waitForURL((url) => url.pathname === revisionPath);

	const panel = page.getByTestId('field-check-panel');
	await expect(panel.getByRole('heading', { name: 'Field check' })).toBeVisible();
	await panel.getByTestId('field-check-mode').selectOption('quick');
	await panel.getByTestId('start-field-check').click();
	await page.waitForURL(/\?check=[0-9a-f-]{36}/);
	const checkId = new URL(page.url()).searchParams.get('check')!;

	// Progress: the bar is there while a worker runs it, and its value moves past zero (the page polls the status endpoint
	// every 2 s) — unless the check is over before the page looks again: on one engine thread a quick check of this patch
	// takes a few seconds, and the worker writes its progress at most every ~2 s. Either way the bar never sticks at zero.
	const bar = panel.getByTestId('field-check-progress');
	await expect(bar).toBeVisible();
	await expect(panel.getByTestId('cancel-field-check')).toBeVisible();
	const barState = async () => {
		const value = await bar.getAttribute('aria-valuenow', { timeout: 500 }).catch(() => null);
		if (value === null) return (await bar.count()) === 0 ? 'gone' : 'at zero';
		return Number(value) > 0 ? 'moving' : 'at zero';
	};
	await expect.poll(barState, { timeout: 120_000, intervals: [250] }).not.toBe('at zero');

	// Done: the page reloads its data and draws the result.
	await expect(panel.getByTestId('field-check-state')).toHaveText('done', { timeout: 200_000 });
	await expect(bar).toHaveCount(0);
	await expect(panel.getByTestId('field-check-words')).toContainText(/The simulated patch (resonates|no resonance)/);
	// the run ended on the engine's energy criterion (END_CRITERION_DB, −35 dB), so it is not flagged as unsettled
	await expect(panel.getByTestId('field-check-run')).toHaveText(/^\d+ s · energy -\d+ dB$/);
	await panel.screenshot({ path: '/tmp/ff-field-check-panel.png' });
	const s11 = panel.getByTestId('field-check-s11');
	await expect(s11.locator('path[data-trace="fullwave"]')).toHaveAttribute('d', /^M[\d.]+,[\d.]+(L[\d.]+,[\d.]+){50,}/);
	await expect(s11.locator('path[data-trace="model"]')).toHaveAttribute('d', /^M.+L/);
	const smith = panel.getByTestId('smith-chart');
	await expect(smith.locator('circle[data-smith-r="1"]')).toHaveCount(1);
	await expect(smith.locator('path[data-trace="fullwave"]')).toHaveAttribute('d', /^M[\d.]+,[\d.]+(L[\d.]+,[\d.]+){50,}/);
	await expect(panel.getByTestId('impedance-plot').locator('path[data-trace="fullwave-r"]')).toHaveAttribute('d', /^M.+L/);
	// The far field: both cuts drawn all round the polar chart (θ −180° to 180° in 2° steps), the broadside figures beside them.
	const farField = panel.getByTestId('field-pattern');
	for (const cut of ['e-plane', 'h-plane']) await expect(farField.locator(`path[data-cut="${cut}"]`)).toHaveAttribute('d', /^M[\d.]+,[\d.]+(L[\d.]+,[\d.]+){170,}Z$/);
	await expect(farField.locator('[data-figure="directivity"]')).toHaveText(/^\d+\.\d\d dBi$/);
	await expect(farField.locator('[data-figure="gain"]')).toHaveText(/^-?\d+\.\d\d dBi$/);
	await expect(farField.locator('[data-figure="estimate"]')).toContainText('dBi');

	// The endpoint the page polled says the same, with the session.
	const status = await page.request.get(`/api/v1/simulations/${checkId}`);
	expect(status.status()).toBe(200);
	const body = await status.json();
	expect(body.state).toBe('succeeded');
	expect(body.result.engine.name).toBe('openEMS');
	expect(body.result.samples.length).toBeGreaterThan(50);
	// a thin-to-moderate rectangular patch over a ground radiates a broadside beam of about 6–8 dBi (Balanis, Antenna
	// Theory 4th ed., §14.2.5; from memory); a finite ground and the quick mesh widen the range to 4–10 dBi
	expect(body.result.pattern.directivityDbi).toBeGreaterThan(4);
	expect(body.result.pattern.directivityDbi).toBeLessThan(10);
});
