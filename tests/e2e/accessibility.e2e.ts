// Journey: the hand-off pages as every visitor meets them (issue 17). Each page, signed out and in each role, has no serious
// or critical axe-core finding; error pages keep the layout, speak plainly and lead back; the preview works from the keyboard.
// Rules: WCAG 2.2 (W3C Recommendation, 2023) as axe-core 4.13 encodes its A and AA success criteria, among them
// 1.4.3 contrast (minimum), 1.4.1 use of colour, 2.4.1 bypass blocks, 2.1.1 keyboard, 3.2.2 on input, 4.1.2 name, role, value.
import AxeBuilder from '@axe-core/playwright';
import { expect, test, type Page } from '@playwright/test';
import { signIn } from './helpers/accounts';
import { seedTeamWithEveryRole, type SeededTeam } from './helpers/seed';

const AXE_TAGS = ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa'];

/** Runs axe-core on the page as it stands and returns the serious and critical findings, one line each. */
async function seriousFindings(page: Page): Promise<string[]> {
	const result = await new AxeBuilder({ page }).withTags(AXE_TAGS).analyze();
	return result.violations
		.filter((v) => v.impact === 'serious' || v.impact === 'critical')
		.map((v) => `${new URL(page.url()).pathname} ${v.id} (${v.impact}): ${v.nodes.map((n) => n.target.join(' ')).slice(0, 4).join(' | ')}`);
}

async function auditPaths(page: Page, paths: string[]): Promise<string[]> {
	const findings: string[] = [];
	for (const path of paths) {
		await page.goto(path);
		await expect(page.locator('main#content')).toBeVisible();
		// WCAG 2.2 SC 2.4.1 (bypass blocks): the first thing a keyboard reaches is the skip link
		await expect(page.getByRole('link', { name: 'Skip to content' })).toHaveAttribute('href', '#content');
		findings.push(...(await seriousFindings(page)));
	}
	return findings;
}

let seeded: SeededTeam;
test.beforeAll(async () => {
	seeded = await seedTeamWithEveryRole('a11y', { frequencyHz: 2.45e9, shape: 'rectangular', feed: 'inset', substrate: { relativePermittivity: 3.55, heightMm: 1.524 } });
});

function signedInPaths(): string[] {
	const d = `/designs/${seeded.designId}`;
	return [
		'/designs',
		d,
		`${d}/r/A`,
		`${d}/r/A/sweeps`,
		`${d}/r/A/measurements`,
		`${d}/r/A/tolerance`,
		`${d}/edit?from=A`,
		`${d}/exports`,
		'/exports',
		'/teams',
		`/teams/${seeded.teamId}`,
		'/laminates',
		'/fab-profiles',
		'/settings',
		'/settings/tokens',
		'/api/docs',
		'/no-such-page'
	];
}

test('signed out: the landing, sign-in, sign-up, API reference and an error page have no serious or critical findings', async ({ page }) => {
	// axe-core reads every node's colours: slow on a busy machine
	test.setTimeout(180_000);
	expect(await auditPaths(page, ['/', '/signin', '/signup', '/api/docs', '/no-such-page'])).toEqual([]);
});

for (const role of ['owner', 'editor', 'viewer'] as const) {
	test(`as ${role}: every page has no serious or critical findings`, async ({ page }) => {
		test.setTimeout(300_000);
		await signIn(page, seeded.people[role].email, seeded.people[role].password);
		expect(await auditPaths(page, signedInPaths())).toEqual([]);
	});
}

test('error pages keep the layout, say what happened in plain words and lead back', async ({ page }) => {
	const header = page.getByRole('navigation', { name: 'Main' });
	// A bare unknown address, signed out.
	const bare = await page.goto('/no/such/page');
	expect(bare?.status()).toBe(404);
	await expect(header).toBeVisible();
	await expect(page.getByRole('heading', { level: 1 })).toHaveText('There is no page at this address');
	await expect(page.getByTestId('error-way-back')).toHaveAttribute('href', '/');
	await page.screenshot({ path: '/tmp/ff-error-404.png', fullPage: true });

	await signIn(page, seeded.people.viewer.email, seeded.people.viewer.password);
	// A design that does not exist: back to the designs list.
	const missing = await page.goto('/designs/dsg_missing0000');
	expect(missing?.status()).toBe(404);
	await expect(header).toBeVisible();
	await expect(page.getByRole('heading', { level: 1 })).toHaveText('This design is not here');
	await page.getByTestId('error-way-back').click();
	await expect(page).toHaveURL(/\/designs$/);

	// A viewer opening the editor: refused in a sentence, no internal permission name, back to the design.
	const refused = await page.goto(`/designs/${seeded.designId}/edit?from=A`);
	expect(refused?.status()).toBe(403);
	await expect(header).toBeVisible();
	await expect(page.getByTestId('error-detail')).toHaveText('You are a viewer in this team. Only editors and owners can make revisions.');
	await expect(page.locator('main')).not.toContainText('revision.create');
	await page.screenshot({ path: '/tmp/ff-error-403.png', fullPage: true });
	await page.getByTestId('error-way-back').click();
	await expect(page).toHaveURL(new RegExp(`/designs/${seeded.designId}$`));
});

test('the skip link, the team switcher and the preview work from the keyboard', async ({ page }) => {
	await signIn(page, seeded.people.editor.email, seeded.people.editor.password);
	await page.goto(`/designs/${seeded.designId}/r/A`);
	// WCAG 2.2 SC 2.4.1: Tab reaches the skip link first, Enter moves focus to the main content
	await page.keyboard.press('Tab');
	await expect(page.getByRole('link', { name: 'Skip to content' })).toBeFocused();
	await page.keyboard.press('Enter');
	await expect(page.locator('main#content')).toBeFocused();

	// WCAG 2.2 SC 3.2.2 (on input): a change of the team switcher posts nothing; the Switch button does
	const posts: string[] = [];
	page.on('request', (r) => {
		if (r.method() === 'POST') posts.push(r.url());
	});
	await page.getByLabel('Team', { exact: true }).dispatchEvent('change');
	await page.waitForTimeout(500);
	expect(posts).toEqual([]);
	await expect(page.getByRole('form', { name: 'Current team' }).getByRole('button', { name: 'Switch' })).toBeVisible();

	// WCAG 2.2 SC 2.1.1 (keyboard): the preview takes focus and pans and zooms with keys
	const preview = page.getByTestId('patch-preview');
	await expect(preview).toHaveAttribute('aria-label', /arrow keys pan/);
	await preview.focus();
	await expect(preview).toBeFocused();
	const outline = await preview.evaluate((el) => getComputedStyle(el).outlineStyle);
	expect(outline).not.toBe('none');
	const fitted = await preview.getAttribute('viewBox');
	const [x0, , w0] = fitted!.split(' ').map(Number);
	await page.keyboard.press('ArrowRight');
	const [x1, , w1] = (await preview.getAttribute('viewBox'))!.split(' ').map(Number);
	expect(x1).toBeCloseTo(x0 + w0 * 0.1, 6);
	expect(w1).toBeCloseTo(w0, 6);
	await page.keyboard.press('+');
	const [, , w2] = (await preview.getAttribute('viewBox'))!.split(' ').map(Number);
	expect(w2).toBeCloseTo(w0 / 1.4, 6);
	await page.keyboard.press('0');
	await expect(preview).toHaveAttribute('viewBox', fitted!);

	// WCAG 2.2 SC 1.4.1 (use of colour): the ground plane is hatched, the copper solid
	expect(await preview.locator('[data-layer="copper-bottom"], [data-layer="copper-bottom"] *').evaluateAll((els) => els.some((e) => /ground-hatch/.test(e.getAttribute('fill') ?? '')))).toBe(true);
	await expect(preview.locator('[data-layer="copper-top"] path').first()).not.toHaveAttribute('fill', /url\(/);

	await page.goto(`/designs/${seeded.designId}/edit?from=A`);
	await page.screenshot({ path: '/tmp/ff-editor.png', fullPage: true });
	await page.goto('/api/docs');
	await page.screenshot({ path: '/tmp/ff-api-docs-a11y.png', fullPage: false });
});
