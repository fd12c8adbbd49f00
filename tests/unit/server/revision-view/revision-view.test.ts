// The revision page's heavy panels: built on worker threads from the load (src/lib/server/revision-view), the same
// answers as the pipeline gives in-process, an array over the drawing limit neither drawn nor read back, and a budget
// overrun turned into notes naming FRINGEFIELD_PAGE_WORK_BUDGET_MS rather than an error.
import { describe, expect, it } from 'vitest';
import { arrayBenchDocument, gate, prepareSized, readBack } from '../../../../src/lib/design';
import { applicableFormats, createExportMeta } from '../../../../src/lib/formats';
import { STANDARD_QUICK_TURN_PROFILE } from '../../../../src/lib/schemas/fab-profile';
import { loadRevisionDrawing, loadRevisionView, REVISION_DRAWING_SHAPE_LIMIT } from '../../../../src/lib/server/revision-view';
import { artworkOutline, checkRevision, readBackRevision, shapeCountOf } from '../../../../src/lib/server/revision-view/revision-view-work';
import { previewLayerStyles } from '../../../../src/lib/components/preview-paths';
import { fabViewCoppers } from '../../../../src/lib/components/fab-view-coppers';
import { layeredCases } from '../../../fixtures/designs/layered-cases';
import { sizeDocument } from '../../../fixtures/designs/size-document';

const profile = STANDARD_QUICK_TURN_PROFILE;
const narrowProfile = { ...profile, name: 'Coarse test fab', minTraceWidthMm: 5 };
const meta = createExportMeta({ designName: 'Array test', revisionLabel: 'A', revisionDate: '2026-12-02' });
const request = (side: number, budgetMs?: number) => ({ sized: sizeDocument(arrayBenchDocument(side)), label: 'A', designName: 'Array test', revisionDate: '2026-12-02', profile: narrowProfile, recordedProfile: profile, budgetMs });

describe('the revision page check (thread side)', () => {
	it('gives the pipeline’s violations, artwork and formats for a small array', () => {
		const sized = sizeDocument(arrayBenchDocument(2));
		const prepared = prepareSized(sized);
		const check = checkRevision({ sized, profile: narrowProfile, recordedProfile: profile, meta });
		// a 5 mm minimum trace: every feed and network line of the 2 × 2 array is too narrow (the gate's own answer)
		expect(check.violations.length).toBeGreaterThan(0);
		expect(check.violations).toEqual(gate(prepared, narrowProfile));
		expect(check.artwork).toEqual(prepared.artwork);
		expect(check.formatIds).toEqual(applicableFormats(prepared.artwork).map((f) => f.id));
		expect(check.shapeCount).toBe(shapeCountOf(prepared.artwork));
	});

	it('draws a 16 × 16 array and leaves a 32 × 32 one undrawn, by the shape limit', () => {
		const sixteen = checkRevision({ sized: sizeDocument(arrayBenchDocument(16)), profile, recordedProfile: profile, meta });
		// 256 patches (16 × 16), each with its place in the corporate feed: well under the limit
		expect(sixteen.artwork?.layers.flatMap((l) => l.shapes).filter((s) => s.role === 'patch')).toHaveLength(256);
		expect(sixteen.shapeCount).toBeLessThanOrEqual(REVISION_DRAWING_SHAPE_LIMIT);
		const thirtyTwo = checkRevision({ sized: sizeDocument(arrayBenchDocument(32)), profile, recordedProfile: profile, meta });
		expect(thirtyTwo.shapeCount).toBeGreaterThan(REVISION_DRAWING_SHAPE_LIMIT);
		expect(thirtyTwo.artwork).toBeNull();
		// what the tables read is small and still says what each layer carries
		expect(JSON.stringify(thirtyTwo.outline).length).toBeLessThan(20_000);
		expect(thirtyTwo.outline.stack).toEqual(prepareSized(sizeDocument(arrayBenchDocument(32))).artwork.stack);
	}, 60_000);

	it('keeps in the outline what the stack table and the fab view read from the layers', () => {
		// a single patch, a 4 × 4 array and every three-copper case (ground planes, buried feeds, parasitic patches)
		for (const doc of [arrayBenchDocument(1), arrayBenchDocument(4), ...layeredCases.map((c) => c.doc)]) {
			const prepared = prepareSized(sizeDocument(doc));
			const outline = artworkOutline(prepared.artwork);
			expect(previewLayerStyles(outline.layers)).toEqual(previewLayerStyles(prepared.artwork.layers));
			const { view } = readBack([], prepared, meta);
			expect(fabViewCoppers(outline, view)).toEqual(fabViewCoppers(prepared.artwork, view));
		}
	}, 60_000);

	it('reads back what the download would (files parsed with @tracespace/parser), and not over the limit', () => {
		const sized = sizeDocument(arrayBenchDocument(2));
		const r = readBackRevision({ sized, profile, recordedProfile: profile, meta });
		expect(r.result?.ok).toBe(true);
		expect(r.result).toEqual(readBack([], prepareSized(sized), meta));
		expect(readBackRevision({ sized: sizeDocument(arrayBenchDocument(32)), profile, recordedProfile: profile, meta }).result).toBeNull();
	}, 60_000);
});

describe('loadRevisionView (worker threads, the page budget)', () => {
	it('answers every panel for an ordinary design', async () => {
		const view = await loadRevisionView(request(2, 60_000));
		expect(view.check.state).toBe('ready');
		expect(view.drawing.state).toBe('ready');
		expect(view.fab.state === 'ready' && view.fab.value.ok).toBe(true);
		expect(view.check.state === 'ready' && view.check.value.violations.length).toBeGreaterThan(0);
	}, 60_000);

	it('says plainly that a 32 × 32 array is too large to draw and read back, with the limit, and still checks it', async () => {
		const view = await loadRevisionView(request(32, 60_000));
		expect(view.check.state).toBe('ready');
		expect(view.drawing.state === 'over-limit' && view.drawing.message).toMatch(/^Revision A is too large to draw on this page: \d{1,2} \d{3} shapes, and the page draws at most 4 000 shapes\./);
		expect(view.fab.state === 'over-limit' && view.fab.message).toMatch(/too large to read back on this page/);
	}, 60_000);

	it('turns a budget overrun into notes naming the budget, not an error', async () => {
		const view = await loadRevisionView(request(32, 5));
		for (const panel of [view.check, view.drawing, view.fab]) {
			expect(panel.state).toBe('over-limit');
			expect(panel.state === 'over-limit' && panel.message).toMatch(/did not finish within the page’s work budget of 5 ms \(FRINGEFIELD_PAGE_WORK_BUDGET_MS\) and was stopped/);
		}
	}, 60_000);

	it('gives the refusal page the artwork to mark, or the note for an array over the limit or the budget', async () => {
		const small = await loadRevisionDrawing(request(2, 60_000));
		expect(small.note).toBeNull();
		expect(small.artwork).toEqual(prepareSized(sizeDocument(arrayBenchDocument(2))).artwork);
		const large = await loadRevisionDrawing(request(32, 60_000));
		expect(large.artwork).toBeNull();
		expect(large.note).toMatch(/too large to draw on this page: .* at most 4 000 shapes/);
		// a 32 × 32 check takes a tenth of a second or more; a 2 × 2 one can come back from a warm thread within 1 ms
		const late = await loadRevisionDrawing(request(32, 5));
		expect(late.artwork).toBeNull();
		expect(late.note).toMatch(/work budget of 5 ms \(FRINGEFIELD_PAGE_WORK_BUDGET_MS\)/);
	}, 60_000);
});
