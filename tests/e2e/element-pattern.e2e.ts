// Journeys: a designer opens a single rectangular patch's revision and reads its E- and H-plane cuts and beamwidths;
// then opens the 5.8 GHz CP patch (the demo's drone downlink) with the 5.8 GHz ISM band to cover and sees the AR band,
// the usable band, that it does not cover the band, and the warning saying so.
import { expect, test, type Page } from '@playwright/test';
import { closeDb } from '../../src/lib/server/db';
import { seedEditorWithDesign } from './helpers/seed';

const shots = '/work/shots';

async function signInTo(page: Page, who: { email: string; password: string }, path: string): Promise<void> {
	await page.goto(`/signin?next=${encodeURIComponent(path)}`);
	await page.getByLabel('E-mail').fill(who.email);
	await page.getByLabel('Password').fill(who.password);
	await page.getByRole('button', { name: /sign in/i }).click();
	await page.waitForURL((url) => url.pathname === path);
}

test.afterAll(async () => {
	await closeDb();
});

test('a single rectangular patch’s revision page shows its E- and H-plane cuts with the beamwidths', async ({ page }) => {
	const { editor, designId } = await seedEditorWithDesign('pattern', 'Bench node patch', {
		frequencyHz: 2.45e9,
		shape: 'rectangular',
		feed: 'inset',
		substrate: { relativePermittivity: 2.2, heightMm: 1.575, lossTangent: 0.0009 }
	});
	await signInTo(page, editor, `/designs/${designId}/r/A`);

	const pattern = page.getByTestId('element-pattern');
	await expect(pattern).toBeVisible();
	await expect(pattern).toHaveAttribute('data-model', 'two-slot');
	await expect(pattern.locator('[data-testid="element-pattern-plot"] path[data-cut="e"]')).toHaveCount(1);
	await expect(pattern.locator('[data-testid="element-pattern-plot"] path[data-cut="h"]')).toHaveCount(1);
	// a single patch on εr 2.2: the two-slot model's beamwidths lie in the typical 60°–110° (common practice, from memory), H narrower than E
	const degrees = async (figure: string) => Number((await pattern.locator(`[data-figure="${figure}"]`).textContent())!.replace(/[^\d.]/g, ''));
	const e = await degrees('beamwidth-e');
	const h = await degrees('beamwidth-h');
	expect(h).toBeGreaterThan(60);
	expect(e).toBeLessThan(110);
	expect(h).toBeLessThan(e);
	// the H-plane of the model is a null at grazing (infinite ground)
	await expect(pattern.locator('[data-figure="grazing"]')).toContainText('/ null');
	// no CP panel for a linearly polarised patch, and the beamwidths are among the derived values
	await expect(page.getByTestId('cp-bands')).toHaveCount(0);
	await expect(page.locator('[data-quantity="beamwidthEDeg"]')).toBeVisible();
	await pattern.scrollIntoViewIfNeeded();
	await pattern.screenshot({ path: `${shots}/pattern-element-cuts.png` });
	await page.screenshot({ path: `${shots}/pattern-revision-rectangular.png`, fullPage: true });
});

test('a CP demo patch with a band to cover shows its AR band, its usable band and that the band is not covered', async ({ page }) => {
	// the demo's "Drone FPV downlink 5.8 GHz RHCP" input, with the 5.8 GHz ISM band (5.725–5.875 GHz) to cover
	const { editor, designId } = await seedEditorWithDesign('cpband', 'Drone FPV downlink 5.8 GHz RHCP', {
		frequencyHz: 5.8e9,
		shape: 'truncated-corner',
		feed: 'inset',
		handedness: 'rhcp',
		substrate: { relativePermittivity: 2.2, lossTangent: 0.001, heightMm: 0.787, copperThicknessUm: 35, relativePermittivityTolerance: 0.05, heightToleranceMm: 0.03 },
		bandToCover: { lowerHz: 5.725e9, upperHz: 5.875e9 }
	});
	await signInTo(page, editor, `/designs/${designId}/r/A`);

	const cp = page.getByTestId('cp-bands');
	await expect(cp).toBeVisible();
	const band = async (figure: string) => {
		const text = (await cp.locator(`[data-figure="${figure}"]`).textContent())!;
		const [lo, hi] = text.match(/(\d+\.\d)–(\d+\.\d) MHz/)!.slice(1).map(Number);
		return { lo, hi };
	};
	const ar = await band('axial-ratio-band');
	const vswr = await band('impedance-band');
	const usable = await band('usable-band');
	// both centred on the target; the AR band is about a quarter of the two-mode VSWR band, and the usable band is their overlap
	expect((ar.lo + ar.hi) / 2).toBeCloseTo(5800, 0);
	expect(ar.hi - ar.lo).toBeLessThan((vswr.hi - vswr.lo) / 2);
	expect(usable).toEqual(ar);
	// narrower than the 150 MHz band to cover: said in the panel and in the warnings
	expect(usable.hi - usable.lo).toBeLessThan(150);
	await expect(page.getByTestId('cp-cover')).toHaveAttribute('data-covered', 'no');
	await expect(page.locator('[data-warning="band-not-covered"]')).toContainText('narrower than the band to cover');
	await expect(cp.locator('[data-band="usable"]')).toHaveCount(1);
	await expect(cp.locator('[data-band="to-cover"]')).toHaveCount(1);
	// the element pattern is there too, with the CP caption
	await expect(page.getByTestId('element-pattern')).toContainText('90° apart in phase');
	// the input table lists the band to cover in GHz
	await expect(page.locator('[data-input="bandToCover.lowerGHz"]')).toContainText('5.725');
	await cp.scrollIntoViewIfNeeded();
	await cp.screenshot({ path: `${shots}/pattern-cp-bands.png` });
	await page.screenshot({ path: `${shots}/pattern-revision-cp.png`, fullPage: true });
});
