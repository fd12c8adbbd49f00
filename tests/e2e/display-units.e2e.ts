// Journey: a designer switches their units to mil and oz in settings → the revision page and the editor show lengths in
// mil and foil in oz → a ground margin typed in mil is saved in mm → "8 mil" typed in the fab-profile form is stored
// as 0.2032 mm → a sweep axis typed in mil stores the same plan as its mm equivalent → the tolerance study reads and
// takes mil → switching back to mm shows millimetres again. Files and stored values stay in mm throughout.
import { expect, test, type Page } from '@playwright/test';
import { closeDb, getDb } from '../../src/lib/server/db';
import { listFabProfiles } from '../../src/lib/server/fab-profiles';
import { signIn } from './helpers/accounts';
import { seedEditorWithDesign, type SeededEditor } from './helpers/seed';

// A 2.45 GHz inset-fed patch on εr 4.4, 1.6 mm with 35 µm foil (demo data).
const demo = { frequencyHz: 2.45e9, shape: 'rectangular', feed: 'inset', substrate: { relativePermittivity: 4.4, heightMm: 1.6, lossTangent: 0.02, copperThicknessUm: 35 } };
let seeded: SeededEditor;

test.beforeAll(async () => {
	seeded = await seedEditorWithDesign('units', 'Mil patch', demo);
	await getDb().updateTable('app_user').set({ email_verified_at: new Date() }).where('id', '=', seeded.editor.id).execute();
});
test.afterAll(async () => {
	await closeDb();
});

async function setUnits(page: Page, length: 'mm' | 'mil', copper: 'um' | 'oz') {
	await page.getByTestId('settings-link').click();
	await page.waitForURL(/\/settings$/);
	await page.locator(`input[name="length"][value="${length}"]`).check();
	await page.locator(`input[name="copper"][value="${copper}"]`).check();
	await page.getByRole('button', { name: 'Save units' }).click();
	await expect(page.getByTestId('units-saved')).toContainText(`lengths in ${length}`);
}

test('a designer reads and types lengths in mil and foil in oz; everything is stored in mm', async ({ page }) => {
	const { designId } = seeded;
	await page.setViewportSize({ width: 1400, height: 1000 });
	await signIn(page, seeded.editor.email, seeded.editor.password, `/designs/${designId}/r/A`);
	await page.goto(`/designs/${designId}/r/A`);
	// before: millimetres
	await expect(page.locator('tr[data-input="substrate.heightMm"]')).toContainText('1.6');
	await expect(page.locator('tr[data-input="substrate.heightMm"] td').last()).toHaveText('mm');

	await setUnits(page, 'mil', 'oz');
	await page.screenshot({ path: '/tmp/units-settings.png', fullPage: true });

	// The revision page in mil and oz: 1.6 mm = 62.99 mil, 35 µm = 1 oz (1 mil = 0.0254 mm, NIST SP 811 B.9; 35 µm/oz common practice, no source)
	await page.goto(`/designs/${designId}/r/A`);
	const height = page.locator('tr[data-input="substrate.heightMm"] td');
	await expect(height.first()).toHaveText('62.99');
	await expect(height.last()).toHaveText('mil');
	const foil = page.locator('tr[data-input="substrate.copperThicknessUm"] td');
	await expect(foil.first()).toHaveText('1');
	await expect(foil.last()).toHaveText('oz');
	// σ as a power of ten, not 58000000
	await expect(page.locator('tr[data-input="substrate.copperConductivitySPerM"] td').first()).toHaveText(/^\d(\.\d+)? × 10⁷$/);
	await expect(page.locator('tr[data-quantity="patchWidthMm"] td').last()).toHaveText('mil');
	await expect(page.getByTestId('preview-board-size')).toHaveText(/^\d+\.\d × \d+\.\d mil$/);
	await expect(page.getByTestId('violation-list')).toContainText('mil');
	// the tabs and the links use the same words
	await expect(page.getByTestId('revision-pages').getByRole('link')).toHaveText(['Revision', 'Sweep plans', 'Measured S11', 'Tolerance study']);
	await page.screenshot({ path: '/tmp/units-revision.png', fullPage: true });

	// The editor in mil: the thickness shows as 62.9921 mil; a ground margin of 120 mil is saved as 3.048 mm
	await page.goto(`/designs/${designId}/edit?from=A`);
	await expect(page.locator('[id="f-substrate.heightMm"]')).toHaveValue('62.9921');
	await expect(page.locator('[data-unit-for="substrate.heightMm"]')).toHaveText('mil');
	await expect(page.locator('[id="f-substrate.copperThicknessUm"]')).toHaveValue('1');
	await expect(page.locator('[data-unit-for="substrate.copperThicknessUm"]')).toHaveText('oz');
	await expect(page.locator('[id="f-feed"] option[value="inset"]')).toHaveText('Inset microstrip');
	await page.locator('[id="f-groundMarginMm"]').fill('120');
	// a unit the parser does not know is refused beside its field, live
	await page.locator('[id="f-substrate.heightMm"]').fill('62 furlongs');
	await expect(page.locator('[data-issue-for="substrate.heightMm"]')).toContainText('unknown unit "furlongs"');
	await page.locator('[id="f-substrate.heightMm"]').fill('62.9921');
	await expect(page.locator('[data-issue-for="substrate.heightMm"]')).toHaveCount(0);
	await page.screenshot({ path: '/tmp/units-editor.png', fullPage: true });
	await page.getByRole('button', { name: 'Save as new revision' }).click();
	await page.waitForURL(new RegExp(`/designs/${designId}/r/B$`));
	const b = await getDb().selectFrom('revision').select('input').where('design_id', '=', designId).where('label', '=', 'B').executeTakeFirstOrThrow();
	const input = b.input as { groundMarginMm: number; substrate: { heightMm: number; copperThicknessUm: number } };
	// 120 × 0.0254 = 3.048 mm; the untouched thickness and foil come back exactly
	expect(input.groundMarginMm).toBe(3.048);
	expect(input.substrate.heightMm).toBe(1.6);
	expect(input.substrate.copperThicknessUm).toBe(35);

	// The design's history names shape and feed and gives the patch size in mil
	await page.goto(`/designs/${designId}`);
	await expect(page.locator('main')).toContainText(/2\.450 GHz · Rectangular · Inset microstrip feed · \d+\.\d × \d+\.\d mil · εr 4\.4/);

	// The fab-profile form in mil: "8 mil" is stored as 0.2032 mm (8 × 0.0254)
	const profileName = `Eight mil house ${seeded.suffix}`;
	await page.goto('/fab-profiles');
	await expect(page.locator('tr[data-fab-profile="standard quick-turn two-layer"] td').nth(1)).toHaveText('5.91');
	await page.locator('input[name="name"]').fill(profileName);
	await page.locator('input[name="minTraceWidthMm"]').fill('8 mil');
	await page.locator('input[name="minSpacingMm"]').fill('8');
	// the notch may not be narrower than the space (the schema's rule): 10 mil = 0.254 mm
	await page.locator('input[name="minSlotWidthMm"]').fill('10');
	await page.getByRole('button', { name: 'Add profile' }).click();
	await expect(page.getByRole('status')).toContainText(`Added ${profileName}`);
	const row = page.locator(`tr[data-fab-profile="${profileName}"]`);
	await expect(row.locator('td').nth(1)).toHaveText('8');
	await expect(row.locator('td').nth(1)).toHaveAttribute('data-mm', '0.2032');
	const stored = (await listFabProfiles(getDb(), seeded.teamId)).find((p) => p.profile.name === profileName)!.profile;
	expect(stored.minTraceWidthMm).toBe(0.2032);
	expect(stored.minSpacingMm).toBe(0.2032);
	expect(stored.minSlotWidthMm).toBe(0.254);
	// the built-in's other values went through their mil text and came back unchanged
	expect(stored.minDrillMm).toBe(0.3);
	expect(stored.etchToleranceMm).toBe(0.05);
	await page.screenshot({ path: '/tmp/units-fab-profiles.png', fullPage: true });

	// The sweep plan form in mil: a thickness axis from 31 to 62 mil step 31 is the plan 0.7874 → 1.5748 mm step 0.7874
	// (31 × 0.0254 = 0.7874); the same axis typed with explicit "mm" gives the same points; εr stays unitless
	await page.goto(`/designs/${designId}/r/A/sweeps`);
	await expect(page.getByLabel('Axis 1 parameter').locator('option[value="substrate.heightMm"]')).toHaveText('Laminate thickness h (mil)');
	await expect(page.getByLabel('Axis 1 parameter').locator('option[value="substrate.relativePermittivity"]')).toHaveText('Laminate εr');
	const sweepAxis = async (plan: string, from: string, to: string, step: string) => {
		await page.locator('input[name="name"]').fill(plan);
		await page.getByLabel('Axis 1 parameter').selectOption('substrate.heightMm');
		await page.getByLabel('Axis 1 from').fill(from);
		await page.getByLabel('Axis 1 to').fill(to);
		await page.getByLabel('Axis 1 step').fill(step);
		await expect(page.getByTestId('point-count')).toHaveText('2');
		await expect(page.getByTestId('point-values')).toContainText('31 mil');
		await page.getByRole('button', { name: 'Save plan' }).click();
		await expect(page.getByTestId('saved-plan').filter({ hasText: plan })).toHaveCount(1);
	};
	await sweepAxis(`Mil thickness ${seeded.suffix}`, '31', '62', '31');
	await expect(page.getByTestId('saved-plan').filter({ hasText: `Mil thickness ${seeded.suffix}` })).toContainText('Laminate thickness h: 31 → 62 step 31 mil');
	await expect(page.getByTestId('sweep-plan-form').locator('xpath=..')).toContainText('Top view, mil.');
	await page.screenshot({ path: '/tmp/units-sweeps.png', fullPage: true });
	await sweepAxis(`Mm thickness ${seeded.suffix}`, '0.7874 mm', '1.5748 mm', '0.7874mm');
	const plans = await getDb().selectFrom('sweep_plan').innerJoin('revision', 'revision.id', 'sweep_plan.revision_id').select(['sweep_plan.name', 'sweep_plan.plan']).where('revision.design_id', '=', designId).execute();
	const planOf = (name: string) => plans.find((p) => p.name === name)!.plan as { axes: unknown[] };
	expect(planOf(`Mil thickness ${seeded.suffix}`).axes[0]).toEqual({ field: 'substrate.heightMm', from: 0.7874, to: 1.5748, step: 0.7874 });
	expect(planOf(`Mm thickness ${seeded.suffix}`)).toEqual(planOf(`Mil thickness ${seeded.suffix}`));

	// The tolerance study in mil: the built-in profile's etch ±0.05 mm shows as 1.9685 mil; 2 mil and "0.0508 mm" are
	// the same ± (2 × 0.0254), so the seeded study gives the same share of boards in band
	await page.goto(`/designs/${designId}/r/A/tolerance`);
	await expect(page.getByText('Etch ± (mil)')).toBeVisible();
	await expect(page.getByTestId('tolerance-etch')).toHaveValue('1.9685');
	await expect(page.getByTestId('tolerance-form')).toContainText('62.99 mil');
	await page.getByTestId('tolerance-etch').fill('2');
	const share = (await page.getByTestId('share-in-band').textContent())!;
	await page.getByTestId('tolerance-etch').fill('0.0508 mm');
	await expect(page.getByTestId('share-in-band')).toHaveText(share);
	await page.getByTestId('tolerance-etch').fill('2 parsec');
	await expect(page.getByRole('alert')).toContainText('unknown unit "parsec"');
	await page.getByTestId('tolerance-etch').fill('2');
	await page.screenshot({ path: '/tmp/units-tolerance.png', fullPage: true });

	// back to millimetres: the same revision reads in mm again
	await setUnits(page, 'mm', 'um');
	await page.goto(`/designs/${designId}/r/B`);
	await expect(page.locator('tr[data-input="groundMarginMm"] td').first()).toHaveText('3.048');
	await expect(page.locator('tr[data-input="groundMarginMm"] td').last()).toHaveText('mm');
});
