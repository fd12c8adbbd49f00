// Journey: open a revision → copy the DXF → the clipboard holds a DXF that dxf-parser reads (the outline and copper).
import { expect, test } from '@playwright/test';
import DxfParser from 'dxf-parser';
import { makeTeam, newDesign, signUp, uniqueSuffix } from './helpers/exports';

test('a drafter copies a revision’s DXF to the clipboard and it parses as the board outline', async ({ page, context, baseURL }) => {
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
});
