// The revision page's heavy panels from its load: the check (artwork + design-rule check) and the fab view's read-back
// run as two work tasks side by side, each within the page's work budget. A panel over the budget, or a design over the
// drawing limit, comes back as a plainly worded note naming the limit: the page itself always answers.
import type { Artwork } from '$lib/artwork';
import type { ReadBackResult } from '$lib/formats/readback';
import { createExportMeta } from '$lib/formats';
import type { SizedDesign } from '$lib/rf';
import type { FabProfile } from '$lib/schemas/fab-profile';
import { formatBudget, pageWorkBudgetMs, runWork, WorkBudgetExceededError } from '../work';
import { REVISION_DRAWING_SHAPE_LIMIT, type RevisionCheck, type RevisionViewInput } from './revision-view-work';

/** A panel's content, or why it is not shown. */
export type RevisionPanel<T> = { state: 'ready'; value: T } | { state: 'over-limit'; message: string };

export interface RevisionView {
	/** The design-rule check, the outline for the tables and the formats offered; over the budget: a note. */
	check: RevisionPanel<RevisionCheck>;
	/** The artwork preview: the artwork itself is `check.value.artwork`; over the drawing limit or the budget: a note. */
	drawing: RevisionPanel<null>;
	/** The fab view: the Gerber + drill set read back; over the drawing limit or the budget: a note. */
	fab: RevisionPanel<ReadBackResult>;
}

export interface RevisionViewRequest {
	sized: SizedDesign;
	label: string;
	designName: string;
	/** yyyy-mm-dd, from the revision (the writers take no clock). */
	revisionDate: string;
	profile: FabProfile;
	recordedProfile: FabProfile;
	/** Defaults to FRINGEFIELD_PAGE_WORK_BUDGET_MS (or 10 s). */
	budgetMs?: number;
}

/** 28803 → "28 803" (digits grouped by three with a space, as the page's other counts). */
const grouped = (n: number) => String(n).replace(/\B(?=(\d{3})+(?!\d))/g, ' ');

const tooLarge = (label: string, shapeCount: number, what: string) =>
	`Revision ${label} is too large to ${what} on this page: ${grouped(shapeCount)} shapes, and the page draws at most ${grouped(REVISION_DRAWING_SHAPE_LIMIT)} shapes.`;

const overBudget = (what: string, budgetMs: number) => `${what} did not finish within the page’s work budget of ${formatBudget(budgetMs)} (FRINGEFIELD_PAGE_WORK_BUDGET_MS) and was stopped.`;

/** Runs one task of the page within the budget; an overrun is null (the caller words the note), anything else throws. */
async function withinBudget<T>(run: () => Promise<T>): Promise<T | null> {
	try {
		return await run();
	} catch (err) {
		if (err instanceof WorkBudgetExceededError) return null;
		throw err;
	}
}

const inputOf = (req: RevisionViewRequest): RevisionViewInput => ({
	sized: req.sized,
	profile: req.profile,
	recordedProfile: req.recordedProfile,
	meta: createExportMeta({ designName: req.designName, revisionLabel: req.label, revisionDate: req.revisionDate })
});

function checkWithinBudget(input: RevisionViewInput, label: string, budgetMs: number): Promise<RevisionCheck | null> {
	return withinBudget(async () => {
		const r = await runWork({ type: 'revision-check', input }, { what: `The design-rule check of revision ${label}`, budgetMs });
		if (r.type !== 'revision-check') throw new Error(`a revision-check task answered with a ${r.type} result`);
		return r.check;
	});
}

function drawingPanel(check: RevisionCheck | null, label: string, budgetMs: number): RevisionPanel<null> {
	if (!check) return { state: 'over-limit', message: overBudget(`Drawing revision ${label}`, budgetMs) + ' Its files in Downloads are complete.' };
	if (check.artwork) return { state: 'ready', value: null };
	return { state: 'over-limit', message: `${tooLarge(label, check.shapeCount, 'draw')} The design-rule check covers every shape, and the files in Downloads are complete.` };
}

/** Only the drawing (the refusal page): the artwork when it is within the drawing limit and the budget, else the note. */
export async function loadRevisionDrawing(req: RevisionViewRequest): Promise<{ artwork: Artwork | null; note: string | null }> {
	const budgetMs = req.budgetMs ?? pageWorkBudgetMs();
	const check = await checkWithinBudget(inputOf(req), req.label, budgetMs);
	const panel = drawingPanel(check, req.label, budgetMs);
	return { artwork: check?.artwork ?? null, note: panel.state === 'over-limit' ? panel.message : null };
}

export async function loadRevisionView(req: RevisionViewRequest): Promise<RevisionView> {
	const budgetMs = req.budgetMs ?? pageWorkBudgetMs();
	const input = inputOf(req);
	const [check, readBack] = await Promise.all([
		checkWithinBudget(input, req.label, budgetMs),
		withinBudget(async () => {
			const r = await runWork({ type: 'revision-read-back', input }, { what: `The read-back of revision ${req.label}`, budgetMs });
			if (r.type !== 'revision-read-back') throw new Error(`a revision-read-back task answered with a ${r.type} result`);
			return r.readBack;
		})
	]);
	const checkNote = overBudget(`The design-rule check of revision ${req.label}`, budgetMs) + ' Downloads still check it in full before they are built.';
	return {
		check: check ? { state: 'ready', value: check } : { state: 'over-limit', message: checkNote },
		drawing: drawingPanel(check, req.label, budgetMs),
		fab: !readBack
			? { state: 'over-limit', message: overBudget(`Reading back revision ${req.label}’s Gerber and drill files`, budgetMs) + ' Every download is still read back in full before it is delivered.' }
			: readBack.result
				? { state: 'ready', value: readBack.result }
				: { state: 'over-limit', message: `${tooLarge(req.label, readBack.shapeCount, 'read back')} Every download is still read back in full before it is delivered.` }
	};
}
