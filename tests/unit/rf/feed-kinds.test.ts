// The answers the core asks of each feed kind: one row per kind, the printed line of a sized feed, the layered ones.
import { describe, expect, it } from 'vitest';
import { feedKindTraits, feedLineOf, isLayeredFeed, isLayeredFeedKind } from '../../../src/lib/rf/feed-kinds';
import { allFeedKinds, layeredFeedKinds } from '../../../src/lib/schemas';
import { layeredDocument, threeCopperStack } from '../../fixtures/designs/layered-cases';
import { sizeDocument } from '../../fixtures/designs/size-document';

const base = {
	name: 'feed kinds',
	shape: 'rectangular',
	frequencyHz: 2.45e9,
	targetImpedanceOhm: 50,
	feedLineImpedanceOhm: 50,
	substrate: { relativePermittivity: 4.3, lossTangent: 0.02, heightMm: 1.6 }
} as const;

describe('feed kinds', () => {
	it('answers for every kind the document accepts, and marks exactly the layered list as layered', () => {
		expect(Object.keys(feedKindTraits).sort()).toEqual([...allFeedKinds].sort());
		expect(allFeedKinds.filter(isLayeredFeedKind)).toEqual([...layeredFeedKinds]);
	});

	it('gives the printed line of a line-fed patch and none for a probe', () => {
		const inset = sizeDocument({ ...base, feed: 'inset' });
		expect(feedLineOf(inset.feed)?.widthMm).toBeGreaterThan(0);
		expect(feedLineOf(inset.feed)).toBe(inset.feed.kind === 'inset' ? inset.feed.line : undefined);
		expect(feedLineOf(sizeDocument({ ...base, feed: 'probe' }).feed)).toBeUndefined();
	});

	it('narrows a coupled feed to the layered union and leaves a single-layer one out', () => {
		for (const feed of layeredFeedKinds) {
			const sized = sizeDocument(layeredDocument({ feed, stack: [...threeCopperStack] }));
			expect(isLayeredFeed(sized.feed)).toBe(true);
			expect(feedLineOf(sized.feed)?.widthMm).toBeGreaterThan(0);
		}
		expect(isLayeredFeed(sizeDocument({ ...base, feed: 'edge' }).feed)).toBe(false);
	});

	it('lets only the edge feed present the radiating-edge resistance (it transforms nothing)', () => {
		// Balanis, Antenna Theory 4th ed., §14.2.1 (from memory): the inset, the λ/4 section and the probe move the feed point to the target; the edge feed sees the edge resistance
		expect(allFeedKinds.filter((k) => feedKindTraits[k].presents === 'edge-resistance')).toEqual(['edge']);
		expect(allFeedKinds.filter((k) => feedKindTraits[k].drilled)).toEqual(['probe']);
	});
});
