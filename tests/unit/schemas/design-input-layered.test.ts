// The design input's stack, layered feeds, parasitic patch and array: accepted shapes and refusals with the field path and the allowed range.
import { describe, expect, it } from 'vitest';
import { InputError, parseDesignInput } from '../../../src/lib/schemas';
import { layeredDocument, threeCopperStack } from '../../fixtures/designs/layered-cases';

function firstIssue(doc: unknown) {
	try {
		parseDesignInput(doc);
	} catch (e) {
		if (e instanceof InputError) return e.first;
		throw e;
	}
	throw new Error('expected an InputError');
}

describe('design input: stacks, layered feeds, arrays', () => {
	it('accepts a three-copper stack with a bonding film and fills each dielectric’s defaults', () => {
		const d = parseDesignInput(layeredDocument({ feed: 'aperture-coupled', stack: [...threeCopperStack] }));
		expect(d.stack?.[1]).toEqual({ kind: 'dielectric', relativePermittivity: 2.2, heightMm: 1.524, lossTangent: 0.0009, bonding: false });
		expect(d.stack?.[2]).toMatchObject({ bonding: true });
	});

	it.each([
		// a layered feed with no stack
		{ name: 'a layered feed without a stack', doc: layeredDocument({ feed: 'proximity-coupled' }), path: 'stack', message: /needs a stack of 3 copper layers/ },
		// two coppers where three are needed
		{ name: 'too few coppers', doc: layeredDocument({ feed: 'aperture-coupled', stack: [{ kind: 'copper' }, { kind: 'dielectric', relativePermittivity: 3, heightMm: 1 }, { kind: 'copper' }] }), path: 'stack', message: /exactly 3 copper layers; this stack has 2/ },
		// a stack starting with dielectric
		{ name: 'a stack starting with dielectric', doc: layeredDocument({ stack: [{ kind: 'dielectric', relativePermittivity: 3, heightMm: 1 }, { kind: 'copper' }, { kind: 'dielectric', relativePermittivity: 3, heightMm: 1 }, { kind: 'copper' }] }), path: 'stack.0.kind', message: /start with copper/ },
		// adjacent coppers
		{ name: 'two adjacent coppers', doc: layeredDocument({ stack: [{ kind: 'copper' }, { kind: 'copper' }, { kind: 'dielectric', relativePermittivity: 3, heightMm: 1 }, { kind: 'copper' }] }), path: 'stack.1', message: /dielectric between/ },
		// a dielectric out of range
		{ name: 'εr out of range in the stack', doc: layeredDocument({ feed: 'aperture-coupled', stack: [{ kind: 'copper' }, { kind: 'dielectric', relativePermittivity: 40, heightMm: 1 }, { kind: 'copper' }, { kind: 'dielectric', relativePermittivity: 3, heightMm: 1 }, { kind: 'copper' }] }), path: 'stack.1.relativePermittivity', message: /allowed range \(1, 30\]/ },
		// six columns: not a power of two
		{ name: 'six columns', doc: layeredDocument({ array: { columns: 6 } }), path: 'array.columns', message: /power of two.*nearest: 4 or 8/ },
		// a probe-fed array
		{ name: 'a probe-fed array', doc: layeredDocument({ feed: 'probe', array: { columns: 2 } }), path: 'feed', message: /corporate feed is microstrip/ },
		// a parasitic patch over a probe
		{ name: 'a parasitic patch on a probe feed', doc: layeredDocument({ feed: 'probe', parasitic: {}, stack: [...threeCopperStack] }), path: 'parasitic', message: /inset, edge or quarter-wave/ },
		// slot options on the wrong feed
		{ name: 'slot options on an inset feed', doc: layeredDocument({ feed: 'inset', slot: { lengthMm: 3 } }), path: 'slot', message: /only an aperture-coupled feed/ },
		// dielectrics thicker than λ0/4 in total (30.6 mm at 2.45 GHz)
		{ name: 'a stack thicker than λ0/4', doc: layeredDocument({ stack: [{ kind: 'copper' }, { kind: 'dielectric', relativePermittivity: 1.1, heightMm: 20 }, { kind: 'dielectric', relativePermittivity: 1.1, heightMm: 20 }, { kind: 'copper' }] }), path: 'stack', message: /under λ0\/4 = 30.5/ },
		// spacing out of range
		{ name: 'a spacing of 3 λ0', doc: layeredDocument({ array: { columns: 2, spacingXWavelengths: 3 } }), path: 'array.spacingXWavelengths', message: /allowed range \[0.3, 2\]/ }
	])('refuses $name with an InputError at $path', ({ doc, path, message }) => {
		const issue = firstIssue(doc);
		expect(issue.path).toBe(path);
		expect(issue.message).toMatch(message);
	});

	it('keeps a single-layer document as before: no new keys appear, and an inset feed carries only its own option object', () => {
		const d = parseDesignInput(layeredDocument({ feed: 'inset' }));
		expect(Object.keys(d).sort()).toEqual(['feed', 'feedLineImpedanceOhm', 'frequencyHz', 'handedness', 'inset', 'name', 'schemaVersion', 'shape', 'solderMask', 'substrate', 'targetImpedanceOhm']);
	});
});
