// Journey of the designer on a design's pages: "Edit from C" edits C while a fork of A is the newest revision (with and
// without scripts, through a refused save); the fab profile switch checks the same revision against another of the
// team's profiles without saving, and downloads keep the recorded one; the fab view draws all three coppers of an
// aperture-coupled board by name; the editor sets an edge connector launch, the preview draws its pads and vias and
// the saved revision's fab view reads them back from the files.
import { expect, test, type Page } from '@playwright/test';
import { closeDb, getDb } from '../../src/lib/server/db';
import { createDesign, saveRevision } from '../../src/lib/server/designs';
import { addFabProfile } from '../../src/lib/server/fab-profiles';
import { STANDARD_QUICK_TURN_PROFILE } from '../../src/lib/schemas/fab-profile';
import { signIn } from './helpers/accounts';
import { seedEditorWithDesign, type SeededEditor } from './helpers/seed';

// A 2.45 GHz inset-fed patch on εr 3.55, 1.524 mm (demo data); its 50 Ω feed is about 3.4 mm wide.
const demo = { frequencyHz: 2.45e9, shape: 'rectangular', feed: 'inset', substrate: { relativePermittivity: 3.55, heightMm: 1.524, lossTangent: 0.0027 } };
let seeded: SeededEditor;
let designName: string;

test.beforeAll(async () => {
	seeded = await seedEditorWithDesign('desg', 'Fork patch', demo);
	designName = `Fork patch ${seeded.suffix}`;
	const save = (parentLabel: string, frequencyHz: number) => saveRevision(getDb(), { designId: seeded.designId, parentLabel, userId: seeded.editor.id, raw: { ...demo, name: designName, frequencyHz } });
	await save('A', 2.44e9); // B
	await save('B', 2.43e9); // C
	await save('A', 2.47e9); // D: the newest revision is a fork of A
});
test.afterAll(async () => {
	await closeDb();
});

const parentOf = async (label: string) =>
	(await getDb().selectFrom('revision as r').innerJoin('revision as p', 'p.id', 'r.parent_id').select('p.label').where('r.design_id', '=', seeded.designId).where('r.label', '=', label).executeTakeFirstOrThrow()).label;

async function signInEditor(page: Page, next: string) {
	await signIn(page, seeded.editor.email, seeded.editor.password, next);
	await page.goto(next);
}

test('Edit from C on the design page edits C, not the newest fork, and so does a save refused once without scripts', async ({ page, browser }) => {
	const { designId } = seeded;
	await page.setViewportSize({ width: 1400, height: 900 });
	await signInEditor(page, `/designs/${designId}`);
	await expect(page.locator('li[data-revision]')).toHaveCount(4);
	await page.screenshot({ path: '/work/shots/exportlog-design-history.png', fullPage: true });

	await page.getByRole('link', { name: 'Edit from C', exact: true }).click();
	await page.waitForURL((url) => url.pathname === `/designs/${designId}/edit` && url.searchParams.get('from') === 'C');
	await expect(page.getByRole('heading', { level: 1 })).toContainText('editing from rev C');
	await expect(page.getByLabel('Target frequency f₀')).toHaveValue('2.43');
	await page.getByLabel('Target frequency f₀').fill('2.42');
	await page.getByRole('button', { name: 'Save as new revision' }).click();
	await page.waitForURL((url) => url.pathname === `/designs/${designId}/r/E`);
	expect(await parentOf('E')).toBe('C');

	// Without scripts the refused save is a full page load of the action's address: it must still be C's editor.
	const plain = await browser.newContext({ storageState: await page.context().storageState(), javaScriptEnabled: false });
	const noScript = await plain.newPage();
	await noScript.goto(`/designs/${designId}/edit?from=C`);
	await noScript.getByLabel('Target frequency f₀').fill('0.01');
	await noScript.getByRole('button', { name: 'Save as new revision' }).click();
	await expect(noScript.getByLabel('Target frequency f₀')).toHaveAttribute('aria-invalid', 'true');
	await expect(noScript.getByRole('heading', { level: 1 })).toContainText('editing from rev C');
	await noScript.getByLabel('Target frequency f₀').fill('2.41');
	await noScript.getByRole('button', { name: 'Save as new revision' }).click();
	await noScript.waitForURL((url) => url.pathname === `/designs/${designId}/r/F`);
	expect(await parentOf('F')).toBe('C');
	await plain.close();
});

test('the fab profile switch checks the same revision against another profile without saving, and downloads keep the recorded one', async ({ page }) => {
	const { designId, teamId } = seeded;
	// A house that cannot etch a line under 6 mm, etch ±0.1 mm (demo data, not a real board house).
	const strictName = `Wide lines only ${seeded.suffix}`;
	await addFabProfile(getDb(), { teamId, userId: seeded.editor.id, raw: { ...STANDARD_QUICK_TURN_PROFILE, name: strictName, minTraceWidthMm: 6, etchToleranceMm: 0.1 } });
	const revisionsBefore = Number((await getDb().selectFrom('revision').select((eb) => eb.fn.countAll<string>().as('n')).where('design_id', '=', designId).executeTakeFirstOrThrow()).n);

	await page.setViewportSize({ width: 1400, height: 1000 });
	await signInEditor(page, `/designs/${designId}/r/A`);
	await expect(page.getByTestId('violation-list')).toContainText('Design rules met');
	await expect(page.getByTestId('profile-tolerances')).toContainText('etch ±0.05 mm');

	await page.getByLabel('Check revision A against').selectOption({ label: strictName });
	await page.getByRole('button', { name: 'Check', exact: true }).click();
	await page.waitForURL((url) => url.searchParams.has('profile'));
	await expect(page.getByTestId('violation-list')).toContainText('1 design-rule violation');
	await expect(page.getByTestId('violation-list')).toContainText('Trace too narrow');
	await expect(page.getByTestId('profile-tolerances')).toContainText(`Tolerances of ${strictName}: etch ±0.1 mm`);
	await expect(page.getByTestId('fab-view-profile')).toContainText(strictName);
	await expect(page.getByTestId('fab-view').getByTestId('violation-marker')).toHaveCount(1);
	await expect(page.getByTestId('profile-switched')).toContainText('nothing is saved');
	await expect(page.getByTestId('downloads-profile')).toContainText('standard quick-turn two-layer');
	await page.screenshot({ path: '/work/shots/exportlog-profile-switch.png', fullPage: true });

	// The download still passes the recorded profile's gate (no refusal page), and nothing was saved.
	const [download] = await Promise.all([page.waitForEvent('download'), page.locator('a[data-format="bundle"]').click()]);
	expect(download.suggestedFilename()).toMatch(/-A\.zip$/);
	const revisionsAfter = Number((await getDb().selectFrom('revision').select((eb) => eb.fn.countAll<string>().as('n')).where('design_id', '=', designId).executeTakeFirstOrThrow()).n);
	expect(revisionsAfter).toBe(revisionsBefore);

	// The tolerance study follows the chosen profile; back on the recorded one the revision passes again.
	await page.getByRole('link', { name: 'Tolerance study' }).click();
	await expect(page.getByTestId('tolerance-profile')).toHaveText(strictName);
	await page.goto(`/designs/${designId}/r/A`);
	await expect(page.getByTestId('violation-list')).toContainText('Design rules met');
});

test('the fab view of an aperture-coupled board draws its three coppers, each by name', async ({ page }) => {
	// Patch core εr 2.2 over a bonding film and a 0.508 mm feed core (demo data, tests/fixtures/designs/layered-cases.ts).
	const stack = [
		{ kind: 'copper' },
		{ kind: 'dielectric', relativePermittivity: 2.2, heightMm: 1.524, lossTangent: 0.0009 },
		{ kind: 'dielectric', relativePermittivity: 3.0, heightMm: 0.1, lossTangent: 0.003, bonding: true },
		{ kind: 'copper' },
		{ kind: 'dielectric', relativePermittivity: 3.55, heightMm: 0.508, lossTangent: 0.0027 },
		{ kind: 'copper' }
	];
	const { design } = await createDesign(getDb(), {
		teamId: seeded.teamId,
		userId: seeded.editor.id,
		raw: { name: `Slot-fed patch ${seeded.suffix}`, frequencyHz: 2.45e9, feed: 'aperture-coupled', substrate: { relativePermittivity: 3.55, heightMm: 0.8, lossTangent: 0.0027 }, stack }
	});
	await page.setViewportSize({ width: 1400, height: 1000 });
	await signInEditor(page, `/designs/${design.id}/r/A`);
	const fab = page.getByTestId('fab-view');
	await expect(fab).toHaveAttribute('data-read-back', 'ok');
	for (const key of ['copper-L1', 'copper-L2', 'copper-L3']) await expect(fab.locator(`path[data-fab-layer="${key}"]`)).toHaveCount(1);
	await expect(fab.locator('[data-fab-copper]')).toHaveText([/L1 Top copper \(patch\) [\d.]+ mm²/, /L2 Inner copper \(layer 2\) \(ground\) [\d.]+ mm²/, /L3 Bottom copper \(feed\) [\d.]+ mm²/]);
	await expect(fab).not.toContainText('L2 Bottom copper');
	await fab.screenshot({ path: '/work/shots/exportlog-fab-view-three-coppers.png' });
});

test('the editor sets an edge launch: the live preview draws its pads and vias, the saved revision’s fab view reads them back', async ({ page }) => {
	const { design } = await createDesign(getDb(), { teamId: seeded.teamId, userId: seeded.editor.id, raw: { ...demo, name: `Launch patch ${seeded.suffix}` } });
	await page.setViewportSize({ width: 1400, height: 1000 });
	await signInEditor(page, `/designs/${design.id}/edit?from=A`);
	const preview = page.getByTestId('patch-preview');
	await expect(preview.locator('[data-role="launch-ground"]')).toHaveCount(0);
	// the launch's dimensions stay hidden until its kind is chosen
	await expect(page.getByLabel('Launch gap to the line')).toBeHidden();
	await page.getByLabel('Connector launch').selectOption('edge');
	await expect(page.getByLabel('Launch gap to the line')).toBeVisible();
	await page.getByLabel('Launch via rows per pad').fill('2');
	// two ground pads beside the signal pad, 3 vias along × 2 rows × 2 pads (defaults: 3 mm long at a 1 mm pitch)
	await expect(preview.locator('[data-role="launch-ground"]')).toHaveCount(2);
	await expect(preview.locator('[data-role="launch-signal"]')).toHaveCount(1);
	await expect(preview.locator('[data-layer="drills"]')).toHaveCount(12);
	await preview.screenshot({ path: '/tmp/ff-launch-preview.png' });
	await page.locator('fieldset[data-group="Feed"]').screenshot({ path: '/tmp/ff-launch-fields.png' });

	await page.getByLabel('What changed (revision note)').fill('Edge launch for the connector');
	await page.getByRole('button', { name: 'Save as new revision' }).click();
	await page.waitForURL(new RegExp(`/designs/${design.id}/r/B$`));
	const fab = page.getByTestId('fab-view');
	await expect(fab).toHaveAttribute('data-read-back', 'ok');
	await expect(fab.locator('circle[data-fab-layer="holes"]')).toHaveCount(12);
	await expect(fab).toContainText('12 holes');
	await expect(page.getByTestId('violation-list')).toContainText('Design rules met');
	await fab.screenshot({ path: '/tmp/ff-launch-fab-view.png' });
});
