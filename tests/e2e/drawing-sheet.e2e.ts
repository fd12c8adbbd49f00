// Journeys: the drawings read cleanly in Chromium. Every writer-golden drawing.svg, and the drawing in the bundle of a
// 2 × 2 array made in the editor, is rendered; each text's box (SVGGraphicsElement.getBBox, SVG 2 §6.10.1 in user
// units = mm here) overlaps no other and lies inside the viewBox.
import { readdirSync, readFileSync } from 'node:fs';
import { readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { expect, test, type Page } from '@playwright/test';
import JSZip from 'jszip';
import { makeTeam, newDesign, signUp, uniqueSuffix } from './helpers/exports';

const writers = join(import.meta.dirname, '../fixtures/writers');
const goldenDrawings = readdirSync(writers).flatMap((dir) =>
	readdirSync(join(writers, dir))
		.filter((f) => f.endsWith('.drawing.svg'))
		.map((f) => ({ name: dir, file: join(writers, dir, f) }))
);

interface TextBox {
	text: string;
	/** A dimension's label (not the title block's). */
	dimension: boolean;
	x: number;
	y: number;
	w: number;
	h: number;
}

/** Renders the SVG text in the page, large, and returns its viewBox and every text's box. */
async function renderDrawing(page: Page, svg: string): Promise<{ viewBox: number[]; boxes: TextBox[] }> {
	await page.setViewportSize({ width: 1400, height: 1100 });
	await page.setContent(`<!doctype html><html><body style="margin:0;background:#fff">${svg.replace(/^<\?xml[^>]*>\s*/, '')}</body></html>`);
	return page.evaluate(() => {
		const root = document.querySelector('svg')!;
		const viewBox = root.getAttribute('viewBox')!.split(' ').map(Number);
		// drawn to the page's width so a screenshot is legible; getBBox stays in user units
		root.setAttribute('width', '1380px');
		root.setAttribute('height', `${(1380 * viewBox[3]) / viewBox[2]}px`);
		const boxes = Array.from(root.querySelectorAll('text')).map((t) => {
			const b = t.getBBox();
			return { text: t.textContent ?? '', dimension: t.closest('g[id^="dimension-"]') !== null, x: b.x, y: b.y, w: b.width, h: b.height };
		});
		return { viewBox, boxes };
	});
}

function expectReadable({ viewBox, boxes }: { viewBox: number[]; boxes: TextBox[] }): void {
	const [vx, vy, vw, vh] = viewBox;
	expect(boxes.length).toBeGreaterThan(8);
	for (const b of boxes) {
		expect(b.w, `"${b.text}" is drawn`).toBeGreaterThan(0);
		expect(b.x, `"${b.text}" inside the viewBox on the left`).toBeGreaterThanOrEqual(vx);
		expect(b.y, `"${b.text}" inside the viewBox at the top`).toBeGreaterThanOrEqual(vy);
		expect(b.x + b.w, `"${b.text}" inside the viewBox on the right`).toBeLessThanOrEqual(vx + vw);
		expect(b.y + b.h, `"${b.text}" inside the viewBox at the bottom`).toBeLessThanOrEqual(vy + vh);
	}
	const overlaps: string[] = [];
	for (let i = 0; i < boxes.length; i++)
		for (let j = i + 1; j < boxes.length; j++) {
			const [a, b] = [boxes[i], boxes[j]];
			if (a.x < b.x + b.w && b.x < a.x + a.w && a.y < b.y + b.h && b.y < a.y + a.h) overlaps.push(`"${a.text}" × "${b.text}"`);
		}
	expect(overlaps).toEqual([]);
	// every size printed to two decimals (no profile: 0.01 mm)
	const sizes = boxes.filter((b) => b.dimension);
	expect(sizes.length).toBeGreaterThan(3);
	for (const b of sizes) expect(b.text).toMatch(/^\S+ \d+\.\d{2}$/);
}

for (const { name, file } of goldenDrawings) {
	test(`the ${name} golden drawing renders with no overlapping or clipped text`, async ({ page }) => {
		const measured = await renderDrawing(page, readFileSync(file, 'utf8'));
		expectReadable(measured);
		if (name === 'rectangular-inset' || name === 'circular-probe') await page.screenshot({ path: `/tmp/ff-drawing-${name}.png`, fullPage: true });
	});
}

test('a 2 × 2 array made in the editor downloads a drawing with no overlapping or clipped text', async ({ page }) => {
	const s = uniqueSuffix();
	await signUp(page, { name: `Drafter ${s}`, email: `drawing-${s}@e2e.test`, password: 'four patches on a sheet' });
	await makeTeam(page, `Drawing office ${s}`);
	const designId = await newDesign(page, `Square array ${s}`);

	await page.goto(`/designs/${designId}/edit?from=A`);
	await page.getByLabel('Repeat as an array with a corporate feed').check();
	await page.getByLabel('Columns (along x)').fill('2');
	await page.getByLabel('Rows (along y)').fill('2');
	await expect(page.getByTestId('patch-preview').locator('[data-layer="copper-top"] [data-role="patch"]')).toHaveCount(4);
	await page.getByLabel('What changed (revision note)').fill('Two by two');
	await page.getByRole('button', { name: 'Save as new revision' }).click();
	await page.waitForURL(new RegExp(`/designs/${designId}/r/B$`));

	const [download] = await Promise.all([page.waitForEvent('download'), page.locator('a[data-format="bundle"]').click()]);
	const zip = await JSZip.loadAsync(await readFile((await download.path())!));
	const svgName = Object.keys(zip.files).find((n) => n.endsWith('.drawing.svg'))!;
	expect(svgName).toBeDefined();
	const svg = await zip.file(svgName)!.async('string');
	const measured = await renderDrawing(page, svg);
	expectReadable(measured);
	// the pitch of the array is dimensioned both ways
	expect(measured.boxes.some((b) => /^Sx \d+\.\d{2}$/.test(b.text))).toBe(true);
	expect(measured.boxes.some((b) => /^Sy \d+\.\d{2}$/.test(b.text))).toBe(true);
	await page.screenshot({ path: '/tmp/ff-drawing-array-2x2.png', fullPage: true });
});
