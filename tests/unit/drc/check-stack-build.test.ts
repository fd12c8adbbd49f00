// stack-build: a stack of two different cores (three coppers) is refused by a two-layer profile, in words, and built by a multilayer one.
import { describe, expect, it } from 'vitest';
import { buildArtwork } from '../../../src/lib/artwork';
import { checkArtwork, checkStackBuild } from '../../../src/lib/drc';
import { builtInFabProfileFor, STANDARD_MULTILAYER_PROFILE, STANDARD_QUICK_TURN_PROFILE } from '../../../src/lib/schemas';
import { sizedCase } from '../../fixtures/designs/design-cases';
import { layeredDocument, threeCopperStack } from '../../fixtures/designs/layered-cases';
import { sizeDocument } from '../../fixtures/designs/size-document';

/** Two different cores (εr 2.2 and 3.55) around the slot copper, no bonding film between them (demo data). */
const twoCoresNoFilm = [threeCopperStack[0], threeCopperStack[1], threeCopperStack[3], threeCopperStack[4], threeCopperStack[5]];
const twoCoreArtwork = buildArtwork(sizeDocument(layeredDocument({ feed: 'aperture-coupled', stack: [...twoCoresNoFilm] })));

describe('the stack-build rule', () => {
	it('refuses a stack of two different cores without a bonding film on the two-layer profile, saying why', () => {
		const violations = checkArtwork(twoCoreArtwork, STANDARD_QUICK_TURN_PROFILE).filter((v) => v.ruleId === 'stack-build');
		expect(violations.map((v) => v.message)).toEqual([
			`the stack has 3 copper layers, and its 2 cores are listed with no bonding film between them (a multilayer house bonds them with one); ${STANDARD_QUICK_TURN_PROFILE.name} builds at most 2: choose a fab profile of a multilayer process that can build it`,
			`the stack bonds cores of 2 different materials (εr 2.2, tanδ 0.0009; εr 3.55, tanδ 0.0027); ${STANDARD_QUICK_TURN_PROFILE.name} does not build mixed-material boards: choose a fab profile that bonds mixed cores`
		]);
		expect(violations[0].shapeIds).toEqual(['copper-top', 'copper-inner-1', 'copper-bottom']);
	});

	it('lets the built-in multilayer profile, which the built-in choice picks for three coppers, build it', () => {
		expect(builtInFabProfileFor(twoCoreArtwork.metadata.copperLayerCount)).toBe(STANDARD_MULTILAYER_PROFILE);
		expect(checkStackBuild(twoCoreArtwork, STANDARD_MULTILAYER_PROFILE)).toEqual([]);
	});

	it('refuses mixed cores on a multilayer profile that does not bond them', () => {
		const sameMaterialOnly = { ...STANDARD_MULTILAYER_PROFILE, name: 'one-material multilayer', mixedCores: false };
		expect(checkStackBuild(twoCoreArtwork, sameMaterialOnly).map((v) => v.message)).toEqual([expect.stringMatching(/^the stack bonds cores of 2 different materials .* one-material multilayer does not build mixed-material boards/)]);
	});

	it('finds nothing to say about a two-copper board on the two-layer profile', () => {
		expect(builtInFabProfileFor(2)).toBe(STANDARD_QUICK_TURN_PROFILE);
		expect(checkStackBuild(buildArtwork(sizedCase('rectangular', 'inset')), STANDARD_QUICK_TURN_PROFILE)).toEqual([]);
	});
});
