// Journey: open a revision → copy the DXF → the clipboard holds a DXF that dxf-parser reads (the outline and copper,
// the dimensions and title block on their own layers) → copy the outline as an SVG path that Chromium draws at board size.
import { expect, test } from '@playwright/test';
import DxfParser from 'dxf-parser';
import { makeTeam, newDesign, signUp, uniqueSuffix } from './helpers/exports';

test('a drafter copies a revision’s DXF and its outline path to the clipboard, and they read back as the board', async ({ page, context, baseURL }) => {
	await context.grantPermissions(['clipboard-read', 'clipboard-write'], { origin: baseURL });
	const s = uniqueSuffix();
	await signUp(page, { name: `Drafter ${s}`, email: `drafter-${s}@e2e.test`, password: 'outline for the enclosure' });
	await makeTeam(page, `Enclosure shop ${s}`);
	const designId = await newDesign(page, `Handheld reader ${s}`);

	await page.goto(`/designs/${designId}/r/A`);
	await expect(page.getByTestId('patch-preview').locator('[data-layer="copper-top"]')).toBeVisible();
	await page.getByTestId('copy-dxf').click();
	await expect(page.getByTestId('copy-dxf')).toHaveText('DXF copied');
	await page.screenshot({ path: '/tmp/ff-revision.png', fullPage: true });

	const text = await page.evaluate(() => navigator.clipboard.readText());
	expect(text).toMatch(/^0\r?\nSECTION/);
	// dxf-parser (npm) reads it back: the profile is one closed polyline the size of the ground.
	const dxf = new DxfParser().parseSync(text)!;
	const layers = Object.keys(dxf.tables.layer.layers);
	expect(layers).toEqual(expect.arrayContaining(['COPPER-TOP', 'COPPER-BOTTOM', 'PROFILE']));
	const profile = dxf.entities.filter((e) => e.layer === 'PROFILE');
	expect(profile).toHaveLength(1);
	const vertices = (profile[0] as unknown as { vertices: { x: number; y: number }[] }).vertices;
	const xs = vertices.map((v) => v.x);
	const ys = vertices.map((v) => v.y);
	const groundWidth = Number(await page.locator('[data-quantity="groundWidthMm"] td').first().textContent());
	const groundLength = Number(await page.locator('[data-quantity="groundLengthMm"] td').first().textContent());
	expect(Math.max(...xs) - Math.min(...xs)).toBeCloseTo(groundWidth, 2);
	expect(Math.max(...ys) - Math.min(...ys)).toBeCloseTo(groundLength, 2);
	expect(dxf.entities.filter((e) => e.layer === 'COPPER-TOP').length).toBeGreaterThan(0);
	// the drawing as downloaded: dimensions and title block on layers of their own, sizes to 0.01 mm
	expect(layers).toEqual(expect.arrayContaining(['FF-DIMENSIONS', 'FF-TITLE']));
	const texts = dxf.entities.filter((e) => e.type === 'TEXT').map((e) => (e as unknown as { text: string }).text);
	expect(texts).toContain(`Wg ${groundWidth.toFixed(2)}`);
	expect(texts).toContain(`Lg ${groundLength.toFixed(2)}`);
	expect(texts).toContain('First-pass estimate — verify by simulation and measurement');

	await expect(page.getByTestId('mechanical-copy-hint')).toContainText('Most mechanical CAD imports the downloaded DXF file');
	await page.getByTestId('copy-outline-path').click();
	await expect(page.getByTestId('copy-outline-path')).toHaveText('Outline path copied');
	const d = await page.evaluate(() => navigator.clipboard.readText());
	expect(d).toMatch(/^M0 [\d.]+L/);
	// Chromium parses the path data (SVG 1.1 §8.3); its box is the board, in mm
	const box = await page.evaluate((pathData) => {
		const svg = document.createElementNS('http://www.w3.org/2000/svg', 'svg');
		const path = document.createElementNS('http://www.w3.org/2000/svg', 'path');
		path.setAttribute('d', pathData);
		svg.appendChild(path);
		document.body.appendChild(svg);
		const b = path.getBBox();
		return { x: b.x, y: b.y, w: b.width, h: b.height };
	}, d);
	expect(box.x).toBeCloseTo(0, 3);
	expect(box.y).toBeCloseTo(0, 3);
	expect(box.w).toBeCloseTo(groundWidth, 2);
	expect(box.h).toBeCloseTo(groundLength, 2);
});
