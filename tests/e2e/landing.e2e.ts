// Journey: a visitor opens the landing page; everything it loads comes from the app itself.
import { expect, test } from '@playwright/test';

test('the landing page loads only same-origin resources and its own woff2 fonts', async ({ page, baseURL }) => {
	const requested: string[] = [];
	page.on('request', (req) => requested.push(req.url()));
	const fontResponses: { url: string; status: number; type: string }[] = [];
	page.on('response', (res) => {
		if (res.request().resourceType() === 'font') fontResponses.push({ url: res.url(), status: res.status(), type: res.headers()['content-type'] ?? '' });
	});

	await page.goto('/');
	await expect(page.getByRole('heading', { level: 1 })).toBeVisible();
	await expect(page.getByRole('navigation', { name: 'Main' })).toContainText('Fringefield');
	// The browser reports which faces are loaded once text using them is laid out.
	const faces = await page.evaluate(async () => {
		await document.fonts.ready;
		await Promise.all([document.fonts.load('16px "Inter Variable"'), document.fonts.load('16px "JetBrains Mono"')]);
		return [...document.fonts].filter((f) => f.status === 'loaded').map((f) => f.family.replaceAll('"', ''));
	});
	await page.waitForLoadState('networkidle');

	const origin = new URL(baseURL!).origin;
	expect(requested.length).toBeGreaterThan(1);
	for (const url of requested) expect(new URL(url).origin, url).toBe(origin);
	expect(faces).toEqual(expect.arrayContaining(['Inter Variable', 'JetBrains Mono']));
	expect(fontResponses.length).toBeGreaterThan(0);
	for (const font of fontResponses) {
		expect(font.url).toMatch(/\/_app\/immutable\/assets\/.+\.woff2$/);
		expect(font.status).toBe(200);
	}
});

test('GET /healthz reports the version and a reachable database', async ({ request }) => {
	const res = await request.get('/healthz');
	expect(res.status()).toBe(200);
	const body = await res.json();
	expect(body).toMatchObject({ app: 'fringefield', database: 'reachable' });
	expect(body.version).toMatch(/^\d+\.\d+\.\d+/);
});
