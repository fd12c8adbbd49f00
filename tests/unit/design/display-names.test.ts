import { describe, expect, it } from 'vitest';
import { backMountNames, choiceName, feedNames, launchKindNames, handednessNames, probeModelNames, revisionPageLabel, revisionPages, shapeNames } from '../../../src/lib/design';
import { allFeedKinds, handednesses, patchShapes, probeModels } from '../../../src/lib/schemas';
import { backMounts, launchKinds } from '../../../src/lib/schemas/launch';

describe('the one table of names', () => {
	it('names every shape, feed, polarisation sense, probe model, launch and mount, each name once', () => {
		for (const [ids, names] of [
			[patchShapes, shapeNames],
			[allFeedKinds, feedNames],
			[handednesses, handednessNames],
			[probeModels, probeModelNames],
			[launchKinds, launchKindNames],
			[backMounts, backMountNames]
		] as const) {
			const table = names as Record<string, string>;
			expect(Object.keys(table).sort()).toEqual([...ids].sort());
			const words = ids.map((id) => table[id]);
			expect(new Set(words).size).toBe(words.length);
			for (const w of words) expect(w).not.toMatch(/^[a-z-]+$/); // words, not the raw id
		}
	});

	it('gives a choice field’s words, the id for fields without a table, and blank for blank', () => {
		expect(choiceName('feed', 'probe')).toBe('Coaxial probe');
		expect(choiceName('shape', 'truncated-corner')).toBe('Truncated-corner (CP)');
		expect(choiceName('probe.model', '')).toBe('');
		expect(choiceName('feed', 'no-such-feed')).toBe('no-such-feed');
		expect(choiceName('name', 'anything')).toBe('anything');
	});

	it('lists the revision pages once each, the revision page first, with distinct words', () => {
		expect(revisionPages.map((p) => p.id)).toEqual(['revision', 'sweeps', 'measurements', 'tolerance']);
		expect(new Set(revisionPages.map((p) => p.label)).size).toBe(revisionPages.length);
		expect(revisionPageLabel('measurements')).toBe('Measured S11');
	});
});
