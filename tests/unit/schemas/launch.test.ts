// The launch object of the design input: defaults, which feeds take which launch, and bad input named by its path.
import { describe, expect, it } from 'vitest';
import { InputError, parseDesignInput, type DesignInputDocument } from '../../../src/lib/schemas';
import { designDocument } from '../../fixtures/designs/design-cases';

function issuesOf(doc: DesignInputDocument): { path: string; message: string }[] {
	try {
		parseDesignInput(doc);
	} catch (e) {
		if (e instanceof InputError) return e.issues.map((i) => ({ path: String(i.path), message: i.message }));
		throw e;
	}
	return [];
}

describe('design input: launch', () => {
	it('fills an edge launch’s defaults (common practice, no source) and leaves the gap to be solved', () => {
		const d = parseDesignInput(designDocument('rectangular', 'inset', { launch: { kind: 'edge' } }));
		expect(d.launch).toEqual({ kind: 'edge', lengthMm: 3, groundWidthMm: 2, viaDrillMm: 0.3, viaPitchMm: 1, viaRows: 1, viaInsetMm: 0.5 });
	});

	it('fills a back-side launch’s defaults', () => {
		const d = parseDesignInput(designDocument('circular', 'probe', { launch: { kind: 'back' } }));
		expect(d.launch).toEqual({ kind: 'back', mount: 'pad', padSideMm: 6, flangeDrillMm: 2.7, flangeSpacingMm: 8.6 });
	});

	it.each([
		// an edge launch needs a line at the board edge
		['edge on a probe feed', designDocument('rectangular', 'probe', { launch: { kind: 'edge' } }), 'launch.kind', /feed line that reaches the board edge/],
		// a back launch needs a probe
		['back on an inset feed', designDocument('rectangular', 'inset', { launch: { kind: 'back' } }), 'launch.kind', /feed probe/],
		// three coppers: the pads cannot reach the bottom ground through an inner feed layer
		['edge on a parasitic stack', designDocument('rectangular', 'inset', { launch: { kind: 'edge' }, parasitic: {}, stack: [{ kind: 'copper' }, { kind: 'dielectric', relativePermittivity: 3.5, heightMm: 1 }, { kind: 'copper' }, { kind: 'dielectric', relativePermittivity: 3.5, heightMm: 1 }, { kind: 'copper' }] }), 'launch.kind', /2 copper layers/],
		['a fractional via row count', designDocument('rectangular', 'inset', { launch: { kind: 'edge', viaRows: 1.5 } }), 'launch.viaRows', /whole number/],
		['a negative launch length', designDocument('rectangular', 'inset', { launch: { kind: 'edge', lengthMm: -1 } }), 'launch.lengthMm', /allowed range/],
		['an unknown kind', designDocument('rectangular', 'inset', { launch: { kind: 'side' } as never }), 'launch.kind', /./],
		['an unknown key', designDocument('rectangular', 'inset', { launch: { kind: 'edge', padWidth: 2 } as never }), 'launch', /./],
		['an unknown mount', designDocument('rectangular', 'probe', { launch: { kind: 'back', mount: 'glue' } as never }), 'launch.mount', /./]
	])('rejects %s, naming %s', (_what, doc, path, message) => {
		const issues = issuesOf(doc);
		expect(issues.length).toBeGreaterThan(0);
		expect(issues.some((i) => i.path === path && message.test(i.message)), JSON.stringify(issues)).toBe(true);
	});

	it('accepts kind "none" on any feed', () => {
		expect(issuesOf(designDocument('rectangular', 'probe', { launch: { kind: 'none' } }))).toEqual([]);
		expect(issuesOf(designDocument('rectangular', 'inset', { launch: { kind: 'none' } }))).toEqual([]);
	});
});
