// The sweep written a point at a time (sweepTextPieces, used for large plan files) is byte for byte the sweep built whole.
import { describe, expect, it } from 'vitest';
import { buildSweepDocument, createExportMeta, serializeSweep, sweepTextPieces } from '../../../../src/lib/formats';
import { InputError } from '../../../../src/lib/schemas';
import { designDocument } from '../../../fixtures/designs/design-cases';

const meta = createExportMeta({ designName: 'Pieces check', revisionLabel: 'C', revisionDate: '2026-11-30' });

describe('sweep text pieces', () => {
	it.each([
		['a grid with refused points', 'rectangular', 'inset', { combine: 'grid', axes: [{ field: 'frequencyHz', from: 1e9, to: 11e9, step: 2e9 }, { field: 'substrate.heightMm', values: [0.2, 1.6, 40] }] }],
		['a probe zip', 'circular', 'probe', { combine: 'zip', axes: [{ field: 'frequencyHz', values: [2.4e9, 2.45e9] }, { field: 'substrate.relativePermittivity', values: [2.2, 4.4] }] }],
		['one point', 'truncated-corner', 'inset', { axes: [{ field: 'frequencyHz', values: [5.8e9] }] }]
	] as const)('join to the whole document’s bytes: %s', (_name, shape, feed, plan) => {
		const base = designDocument(shape, feed);
		expect([...sweepTextPieces(base, plan, meta)].join('')).toBe(serializeSweep(buildSweepDocument(base, plan, meta)));
	});

	it('refuse a bad plan before the first piece', () => {
		const pieces = sweepTextPieces(designDocument('rectangular', 'inset'), { axes: [] }, meta);
		expect(() => pieces.next()).toThrow(InputError);
	});
});
