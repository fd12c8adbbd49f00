// Journey of a designer giving a board its finish: a new design starts with solder mask and a top legend; the fab view
// draws both from the Gerber files read back; the editor covers the patch with mask (the sizing says so) and places a
// mounting hole, which the design-rule check holds 5 h from the patch until the margin gives it room. The designer's
// whole journey then adds an edge launch: fab view, bundle and STEP (read by Open CASCADE) agree on pads, holes and board.
import { readFile } from 'node:fs/promises';
import { expect, test, type Page } from '@playwright/test';
import { createParser } from '@tracespace/parser';
import JSZip from 'jszip';
import { closeDb } from '../../src/lib/server/db';
import { signIn } from './helpers/accounts';
import { seedEditorWithDesign, type SeededEditor } from './helpers/seed';
import { readStep } from '../unit/formats/step/read-step';

// The editor needs a team; its first design is only there to make one (demo data).
const demo = { frequencyHz: 2.45e9, shape: 'rectangular', feed: 'inset', substrate: { relativePermittivity: 3.55, heightMm: 1.524, lossTangent: 0.0027 } };
let seeded: SeededEditor;

test.beforeAll(async () => {
	seeded = await seedEditorWithDesign('finish', 'Team starter', demo);
});
test.afterAll(async () => {
	await closeDb();
});

async function revisionUrl(page: Page): Promise<{ designId: string; label: string }> {
	await page.waitForURL(/\/designs\/[^/]+\/r\/[A-Z]+$/);
	const [, designId, label] = /\/designs\/([^/]+)\/r\/([A-Z]+)$/.exec(new URL(page.url()).pathname)!;
	return { designId, label };
}

test('a new design has mask and legend in its fab view; covering the patch and placing a hole are checked', async ({ page }) => {
	await page.setViewportSize({ width: 1400, height: 1100 });
	await signIn(page, seeded.editor.email, seeded.editor.password, '/designs');
	await page.goto('/designs');
	const name = `Roof patch ${seeded.suffix}`;
	await page.locator('input[name="name"]').fill(name);
	await page.locator('input[name="frequencyGHz"]').fill('2.45');
	await page.getByRole('button', { name: 'Create design' }).click();
	const { designId, label } = await revisionUrl(page);
	expect(label).toBe('A');

	// the fab view is drawn from the files as the board house reads them: the top mask sheet with its openings, the legend ink
	const fab = page.getByTestId('fab-view');
	await expect(fab).toHaveAttribute('data-read-back', 'ok');
	await expect(fab.locator('[data-fab-layer="mask-top"]')).toHaveCount(1);
	await expect(fab.locator('[data-fab-layer="legend-top"]')).toHaveCount(1);
	await expect(page.getByTestId('fab-mask')).toContainText('Top mask');
	await expect(page.getByTestId('fab-legend')).toContainText(/\d+ strokes/);
	// the preview shows the legend too (the revision line is stamped into the files only)
	await expect(page.getByTestId('patch-preview').locator('[data-layer="legend-top"]')).toHaveCount(1);
	await expect(page.getByTestId('violation-list')).toContainText('Design rules met');
	await fab.scrollIntoViewIfNeeded();
	await page.screenshot({ path: '/work/shots/legend-fab-view-new-design.png', fullPage: true });

	// cover the patch with mask and put a hole in the lower-left corner: too near the patch on a 3 h margin
	await page.goto(`/designs/${designId}/edit?from=A`);
	await page.getByLabel('Mask over the patch').selectOption('covered');
	await page.getByLabel('Mounting holes (NPTH)').fill('2.6 2.6 2.2');
	await page.getByRole('button', { name: 'Save as new revision' }).click();
	await revisionUrl(page);
	await expect(page.getByTestId('violation-list').locator('li[data-rule="hole-keep-out"]')).toHaveCount(1);
	await expect(page.getByText('Patch εeff under the mask (sized on this)')).toBeVisible();

	// a wider margin gives the hole room: the rules are met again and the hole is in the non-plated drill file
	await page.goto(`/designs/${designId}/edit?from=B`);
	await page.getByLabel('Ground margin').fill('12');
	await page.getByLabel('Mounting holes (NPTH)').fill('3.5 3.5 2.2');
	await page.getByRole('button', { name: 'Save as new revision' }).click();
	const third = await revisionUrl(page);
	expect(third.label).toBe('C');
	await expect(page.getByTestId('violation-list')).toContainText('Design rules met');
	await expect(page.getByTestId('fab-view')).toHaveAttribute('data-read-back', 'ok');
	await expect(page.getByTestId('fab-view').locator('[data-fab-layer="holes"]')).toHaveCount(1);
	await page.getByTestId('fab-view').scrollIntoViewIfNeeded();
	await page.screenshot({ path: '/work/shots/legend-fab-view-covered-hole.png', fullPage: true });
});

/** Gerber coordinates in mm: the FS command's decimal places scale the integers (Ucamco Gerber Layer Format Specification 2024.05, §4.2.2 FS, §4.8 D01/D02/D03). */
function gerberPoints(text: string): [number, number][] {
	const fs = /%FSLAX(\d)(\d)Y\d\d\*%/.exec(text);
	expect(fs, 'the profile Gerber states its coordinate format').not.toBeNull();
	const scale = 10 ** Number(fs![2]);
	return [...text.matchAll(/X(-?\d+)Y(-?\d+)D0[12]\*/g)].map((m) => [Number(m[1]) / scale, Number(m[2]) / scale]);
}

/** The holes of an Excellon file as @tracespace/parser reads them: each hit with its tool's diameter in mm. */
function drillHits(text: string): { x: number; y: number; diameterMm: number }[] {
	const p = createParser();
	p.feed(text);
	const diameters = new Map<string, number>();
	let tool = '';
	const hits: { x: number; y: number; diameterMm: number }[] = [];
	for (const n of p.results().children) {
		if (n.type === 'toolDefinition' && n.shape.type === 'circle') diameters.set(n.code, n.shape.diameter);
		if (n.type === 'toolChange') tool = n.code;
		if (n.type === 'graphic') hits.push({ x: Number(n.coordinates.x), y: Number(n.coordinates.y), diameterMm: diameters.get(tool) ?? NaN });
	}
	return hits;
}

test('the designer’s journey: an edge launch, mask, legend and a hole are drawn by the fab view, zipped with their files, and the STEP board is the outline by the stack', async ({ page }) => {
	await page.setViewportSize({ width: 1400, height: 1100 });
	await signIn(page, seeded.editor.email, seeded.editor.password, '/designs');
	await page.goto('/designs');
	const name = `Mast patch ${seeded.suffix}`;
	await page.locator('input[name="name"]').fill(name);
	await page.locator('input[name="frequencyGHz"]').fill('2.45');
	await page.getByRole('button', { name: 'Create design' }).click();
	const { designId } = await revisionUrl(page);

	// the editor: a 1.524 mm core with 35 µm copper (demo data), an edge launch with two via rows, mask and legend on,
	// a 12 mm margin and one 2.2 mm mounting hole in the lower-left corner
	await page.goto(`/designs/${designId}/edit?from=A`);
	await page.getByLabel('Thickness h').fill('1.524');
	await page.getByLabel('Copper thickness t').fill('35');
	await page.getByLabel('Connector launch').selectOption('edge');
	await page.getByLabel('Launch via rows per pad').fill('2');
	// a new design starts with mask and legend (the first journey above); they stay on
	await expect(page.locator('input[type="checkbox"][name="solderMask"]')).toBeChecked();
	await expect(page.locator('input[type="checkbox"][name="legend"]')).toBeChecked();
	await page.getByLabel('Ground margin').fill('12');
	await page.getByLabel('Mounting holes (NPTH)').fill('3.5 3.5 2.2');
	await page.getByLabel('What changed (revision note)').fill('Edge launch, mask, legend and a mounting hole');
	await page.getByRole('button', { name: 'Save as new revision' }).click();
	const saved = await revisionUrl(page);
	expect(saved.label).toBe('B');
	await expect(page.getByTestId('violation-list')).toContainText('Design rules met');

	// the fab view, drawn from the Gerber and Excellon files read back: the launch's two ground pads are copper islands of
	// their own beside the patch-and-line (signal pad included), the mask sheet and the legend ink are there, and the
	// 3 vias along × 2 rows × 2 pads of the launch plus the mounting hole are 13 holes
	const fab = page.getByTestId('fab-view');
	await expect(fab).toHaveAttribute('data-read-back', 'ok');
	const topCopper = fab.locator('path[data-fab-layer="copper-L1"]');
	await expect(topCopper).toHaveCount(1);
	const islands = ((await topCopper.getAttribute('d')) ?? '').split('M').length - 1;
	expect(islands).toBe(3);
	await expect(fab.locator('[data-fab-layer="mask-top"]')).toHaveCount(1);
	await expect(fab.locator('[data-fab-layer="legend-top"]')).toHaveCount(1);
	await expect(fab.locator('[data-fab-layer="legend-top"] path').first()).toBeAttached();
	await expect(fab.locator('circle[data-fab-layer="holes"]')).toHaveCount(13);
	await expect(fab).toContainText('13 holes');
	// the mask opens over the bare patch-and-line, each ground pad and the mounting hole
	await expect(page.getByTestId('fab-mask')).toContainText('Top mask: 4 openings');
	await expect(page.getByTestId('fab-legend')).toContainText(/[1-9]\d* strokes/);
	await fab.scrollIntoViewIfNeeded();
	await fab.screenshot({ path: '/work/shots/stepe2e-fab-view.png' });

	// the bundle through the page's download panel: jszip reads it back (file names from src/lib/formats/bundle/file-names.ts)
	const slug = `mast-patch-${seeded.suffix}`;
	const [bundle] = await Promise.all([page.waitForEvent('download'), page.locator('a[data-format="bundle"]').click()]);
	expect(bundle.suggestedFilename()).toBe(`${slug}-B.zip`);
	const zip = await JSZip.loadAsync(await readFile((await bundle.path())!));
	const names = Object.keys(zip.files);
	const file = (part: string) => zip.file(`${slug}-B.${part}`)!.async('string');
	for (const part of ['copper-top.gbr', 'copper-bottom.gbr', 'profile.gbr', 'mask-top.gbr', 'legend-top.gbr', 'drill-plated.drl', 'drill-non-plated.drl']) expect(names).toContain(`${slug}-B.${part}`);
	// the STEP is offered on its own, not in the zip (src/lib/formats/registry.ts)
	expect(names.some((n) => n.endsWith('.step'))).toBe(false);
	// X2 file functions say what each Gerber is (Gerber Layer Format Specification 2024.05, §5.6.3 .FileFunction)
	expect(await file('mask-top.gbr')).toMatch(/%TF\.FileFunction,Soldermask,Top\*%/);
	expect(await file('legend-top.gbr')).toMatch(/%TF\.FileFunction,Legend,Top\*%/);
	const plated = drillHits(await file('drill-plated.drl'));
	const nonPlated = drillHits(await file('drill-non-plated.drl'));
	expect(plated).toHaveLength(12);
	expect(nonPlated).toHaveLength(1);
	expect(nonPlated[0].diameterMm).toBeCloseTo(2.2, 6);
	const outline = gerberPoints(await file('profile.gbr'));
	const xs = outline.map((p) => p[0]), ys = outline.map((p) => p[1]);
	const board = { minX: Math.min(...xs), maxX: Math.max(...xs), minY: Math.min(...ys), maxY: Math.max(...ys) };
	const widthMm = board.maxX - board.minX, lengthMm = board.maxY - board.minY;
	expect(widthMm).toBeGreaterThan(24);

	// the STEP through the page, read by Open CASCADE's STEP reader (occt-import-js, tests/unit/formats/step/read-step.ts)
	const [stepDownload] = await Promise.all([page.waitForEvent('download'), page.locator('a[data-format="step"]').click()]);
	expect(stepDownload.suggestedFilename()).toBe(`${slug}-B.board.step`);
	const step = await readStep(await readFile((await stepDownload.path())!, 'utf8'));
	expect(step.success).toBe(true);
	const min = [0, 1, 2].map((k) => Math.min(...step.bodies.map((b) => b.min[k])));
	const max = [0, 1, 2].map((k) => Math.max(...step.bodies.map((b) => b.max[k])));
	// the bounding box is the board outline × the stack: 1.524 mm core + 2 × 35 µm copper, within 1 µm
	const um = 1e-3;
	expect(Math.abs(min[0] - board.minX)).toBeLessThan(um);
	expect(Math.abs(max[0] - board.maxX)).toBeLessThan(um);
	expect(Math.abs(min[1] - board.minY)).toBeLessThan(um);
	expect(Math.abs(max[1] - board.maxY)).toBeLessThan(um);
	expect(Math.abs(max[2] - min[2] - (1.524 + 2 * 0.035))).toBeLessThan(um);
	// drills as cylinders: the substrate solid is the outline × h less every drilled hole (π d²/4 × h for the 13 holes read
	// from the Excellon files); a faceted hole's chords lie within 0.5 µm of the arc, so 0.02 mm³ tells one missing 0.3 mm via (0.11 mm³)
	const substrate = step.bodies.filter((b) => b.name.startsWith('substrate'));
	expect(substrate).toHaveLength(1);
	const holesMm2 = [...plated, ...nonPlated].reduce((s, h) => s + (Math.PI * h.diameterMm ** 2) / 4, 0);
	expect(Math.abs(substrate[0].volumeMm3 - (widthMm * lengthMm - holesMm2) * 1.524)).toBeLessThan(0.02);
	// the launch's ground pads are top-copper solids of their own: the editor's defaults (2 mm wide × 3 mm long, hints in
	// src/lib/design/design-form-fields.ts) less the pad's 3 × 2 vias of 0.3 mm, × 35 µm; 0.001 mm³ tells one via (0.0025 mm³)
	const top = step.bodies.filter((b) => b.name.startsWith('L1 '));
	expect(top).toHaveLength(3);
	const viaCount = plated.filter((h) => Math.abs(h.diameterMm - 0.3) < 1e-6).length;
	expect(viaCount).toBe(12);
	const padMm3 = (2 * 3 - (6 * Math.PI * 0.3 ** 2) / 4) * 0.035;
	const pads = top.filter((b) => Math.abs(b.volumeMm3 - padMm3) < 0.001);
	expect(pads).toHaveLength(2);
	for (const pad of pads) expect(pad.max[2] - pad.min[2]).toBeCloseTo(0.035, 6);
});
