// Abuse review item 9: one 150 000-point measurement must not break its revision's measurements page for everyone.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { render } from 'svelte/server';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { findRevision } from '../../../src/lib/server/designs';
import * as measurements from '../../../src/lib/server/measurements';
import { S11_PLOT_COLUMNS } from '../../../src/lib/components/s11-plot-frame';
import { load } from '../../../src/routes/(app)/designs/[designId]/r/[label]/measurements/+page.server';
import Page from '../../../src/routes/(app)/designs/[designId]/r/[label]/measurements/+page.svelte';
import { createWorkspace, identityOf, type Workspace } from '../exports/workspace-fixture';
import { longSweepS1p } from './helpers/long-sweep';

const db = getDb();
let ws: Workspace;
let revisionId: string;
let measurementId: string;
const bytes = longSweepS1p(150_000);

beforeAll(async () => {
	ws = await createWorkspace('bigmeas');
	revisionId = (await findRevision(db, ws.designId, 'A'))!.id;
	({ id: measurementId } = await measurements.uploadMeasurement(db, { revisionId, userId: ws.people.editor.id, fileName: 'long-bench.s1p', bytes }));
});
afterAll(() => closeDb());

async function pageData(who: 'viewer' | 'editor') {
	const identity = await identityOf(ws, who, 'session');
	const url = new URL(`http://127.0.0.1/designs/${ws.designId}/r/A/measurements?m=${measurementId}`);
	return load({ locals: { identity, user: identity.user }, params: { designId: ws.designId, label: 'A' }, url } as never);
}

describe('a 150 000-point measurement', () => {
	it('is a file between 2 and 5 MB (the upload limit), so it is accepted', () => {
		expect(bytes.byteLength).toBeGreaterThan(2 * 1024 * 1024);
		expect(bytes.byteLength).toBeLessThan(measurements.MAX_TOUCHSTONE_BYTES);
	});

	it('opens its measurements page (200) with a plot of its resonance', async () => {
		const data = await pageData('viewer');
		const { body } = render(Page, { props: { data: data as never, form: null, params: { designId: ws.designId, label: 'A' } } as never });
		expect(body).toContain('data-testid="s11-plot"');
		expect(body).toContain('data-testid="s11-resonance"');
		// The series-RLC demo sweep has its minimum at 2.41 GHz.
		expect(body).toContain('2.410 GHz');
	});

	it('sends the browser the thinned trace (≤ 2 points per plot column) with the true minimum, not 150 000 points', async () => {
		const data = (await pageData('editor')) as { selected: { points: (readonly [number, number])[]; summary: measurements.MeasurementSummary } };
		const points = data.selected.points;
		expect(points.length).toBeLessThanOrEqual(2 * S11_PLOT_COLUMNS);
		let lowest = Infinity;
		for (const p of points) lowest = Math.min(lowest, p[1]);
		const stored = (await measurements.findMeasurement(db, revisionId, measurementId))!;
		expect(stored.samples).toHaveLength(150_000);
		// The lowest sample of the file, in dB, is the lowest point of the trace sent.
		let fileLowest = Infinity;
		for (const s of stored.samples) fileLowest = Math.min(fileLowest, 20 * Math.log10(Math.hypot(s.s11.re, s.s11.im)));
		expect(lowest).toBeCloseTo(fileLowest, 9);
		expect(JSON.stringify(data).length).toBeLessThan(200_000);
		expect(data.selected.summary.file.pointCount).toBe(150_000);
	});
});

describe('a measurement stored before plot traces were kept', () => {
	it('still opens with a thinned trace, computed from its samples', async () => {
		const { id } = await measurements.uploadMeasurement(db, { revisionId, userId: ws.people.editor.id, fileName: 'older.s1p', bytes });
		await db.updateTable('measurement').set({ trace: null } as never).where('id', '=', id).execute();
		const view = (await measurements.findMeasurementView(db, revisionId, id))!;
		expect(view.trace.length).toBeGreaterThan(0);
		expect(view.trace.length).toBeLessThanOrEqual(2 * S11_PLOT_COLUMNS);
	});
});
