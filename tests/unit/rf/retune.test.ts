// Retune: a board measured on a laminate whose εr differs from the design's is led back to the target.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputError, type DesignInputDocument } from '../../../src/lib/schemas';
import { proposeRetune } from '../../../src/lib/rf/retune';
import { resonantFrequencyHz } from '../../../src/lib/rf/resonant-frequency';
import { sizeDocument } from '../../fixtures/designs/size-document';

/** Demo designs: a common FR-4 board at 2.45 GHz, a low-loss laminate at 5.8 GHz and the other shapes. */
const designs: { name: string; doc: DesignInputDocument }[] = [
	{ name: 'rectangular inset on FR-4 at 2.45 GHz', doc: { frequencyHz: 2.45e9, substrate: { relativePermittivity: 4.4, heightMm: 1.6 } } },
	{ name: 'rectangular probe at 5.8 GHz', doc: { frequencyHz: 5.8e9, feed: 'probe', substrate: { relativePermittivity: 3.0, heightMm: 0.76 } } },
	{ name: 'rectangular edge with quarter-wave at 1.575 GHz', doc: { frequencyHz: 1.575e9, feed: 'quarter-wave', substrate: { relativePermittivity: 2.2, heightMm: 1.57 } } },
	{ name: 'circular probe at 2.45 GHz', doc: { frequencyHz: 2.45e9, shape: 'circular', feed: 'probe', substrate: { relativePermittivity: 4.4, heightMm: 1.6 } } },
	{ name: 'truncated-corner probe at 1.575 GHz', doc: { frequencyHz: 1.575e9, shape: 'truncated-corner', feed: 'probe', substrate: { relativePermittivity: 3.38, heightMm: 1.524 } } },
	{ name: 'nearly-square probe at 2.45 GHz', doc: { frequencyHz: 2.45e9, shape: 'nearly-square', feed: 'probe', substrate: { relativePermittivity: 3.55, heightMm: 1.524 } } }
];

/** The board as built: the designed dimensions on a laminate of the true εr. */
function measuredOn(doc: DesignInputDocument, trueEr: number): number {
	const built = sizeDocument(doc);
	return resonantFrequencyHz(built.patch, { relativePermittivity: trueEr, heightMm: doc.substrate.heightMm });
}

describe('proposeRetune', () => {
	for (const { name, doc } of designs) {
		for (const erShift of [-0.3, 0.25, 0.5]) {
			it(`brings a ${name} built on εr ${erShift > 0 ? '+' : ''}${erShift} back to the target within 0.5 %`, () => {
				const trueEr = doc.substrate.relativePermittivity + erShift;
				const measuredHz = measuredOn(doc, trueEr);
				const proposal = proposeRetune(doc, measuredHz);
				expect(proposal.apparentRelativePermittivity).toBeCloseTo(trueEr, 4);
				// Build the proposal on the true laminate: it must resonate at the target.
				const rebuilt = sizeDocument(proposal.input);
				const newHz = resonantFrequencyHz(rebuilt.patch, { relativePermittivity: trueEr, heightMm: doc.substrate.heightMm });
				expect(Math.abs(newHz / doc.frequencyHz - 1)).toBeLessThan(0.005);
				expect(Math.abs(proposal.expectedFrequencyHz / doc.frequencyHz - 1)).toBeLessThan(0.005);
				// A board that came out low (εr higher) needs a smaller patch, and the other way round.
				const main = proposal.dimensions.find((d) => ['patch.lengthMm', 'patch.radiusMm', 'patch.sideMm'].includes(d.name));
				expect(main, 'a main patch dimension').toBeDefined();
				expect(Math.sign(main!.changeMm)).toBe(erShift > 0 ? -1 : 1);
			});
		}
	}

	it('holds for any εr error the laminate range allows (fast-check)', () => {
		fc.assert(
			fc.property(fc.constantFrom(...designs), fc.double({ min: -0.15, max: 0.3, noNaN: true }), ({ doc }, fraction) => {
				const trueEr = doc.substrate.relativePermittivity * (1 + fraction);
				const proposal = proposeRetune(doc, measuredOn(doc, trueEr));
				const rebuilt = sizeDocument(proposal.input);
				const newHz = resonantFrequencyHz(rebuilt.patch, { relativePermittivity: trueEr, heightMm: doc.substrate.heightMm });
				return Math.abs(newHz / doc.frequencyHz - 1) < 0.005;
			}),
			{ numRuns: 60, seed: 3 }
		);
	});

	it('changes nothing when the board resonates where the model predicted', () => {
		const doc = designs[0].doc;
		const proposal = proposeRetune(doc, measuredOn(doc, doc.substrate.relativePermittivity));
		expect(proposal.frequencyErrorFraction).toBeCloseTo(0, 9);
		expect(proposal.apparentRelativePermittivity).toBe(4.4);
		for (const d of proposal.dimensions) expect(Math.abs(d.changeMm), d.name).toBeLessThan(1e-9);
	});

	it('reports old and new key dimensions, the εr pair and the εreff pair', () => {
		const doc = designs[0].doc;
		const proposal = proposeRetune(doc, 2.40e9);
		const names = proposal.dimensions.map((d) => d.name);
		expect(names).toEqual(expect.arrayContaining(['patch.widthMm', 'patch.lengthMm', 'feed.insetDepthMm', 'feed.line.widthMm', 'ground.widthMm']));
		const length = proposal.dimensions.find((d) => d.name === 'patch.lengthMm')!;
		expect(length.oldMm).toBeCloseTo(sizeDocument(doc).patch.kind === 'rectangular' ? (sizeDocument(doc).patch as { lengthMm: number }).lengthMm : NaN, 12);
		expect(length.changeFraction).toBeCloseTo(length.changeMm / length.oldMm, 12);
		expect(proposal.apparentRelativePermittivity).toBeGreaterThan(proposal.designRelativePermittivity);
		expect(proposal.apparentEffectivePermittivity).toBeGreaterThan(proposal.designEffectivePermittivity);
		expect(proposal.method).toBe('resize-with-apparent-permittivity');
		expect(proposal.input.substrate.relativePermittivity).toBe(proposal.apparentRelativePermittivity);
	});

	it('keeps the designed width when asked to and still reaches the target', () => {
		const doc = designs[0].doc;
		const trueEr = 4.8;
		const proposal = proposeRetune(doc, measuredOn(doc, trueEr), { holdWidth: true });
		const width = proposal.dimensions.find((d) => d.name === 'patch.widthMm')!;
		expect(width.changeMm).toBe(0);
		const newHz = resonantFrequencyHz(sizeDocument(proposal.input).patch, { relativePermittivity: trueEr, heightMm: 1.6 });
		expect(Math.abs(newHz / doc.frequencyHz - 1)).toBeLessThan(0.005);
	});

	it('rejects a resonance no laminate could explain, naming measuredFrequencyHz and the range', () => {
		let caught: unknown;
		try {
			proposeRetune(designs[0].doc, 20e9);
		} catch (err) {
			caught = err;
		}
		expect(caught).toBeInstanceOf(InputError);
		expect((caught as InputError).first.path).toBe('measuredFrequencyHz');
		expect((caught as InputError).first.message).toMatch(/allowed range/);
	});

	it('rejects a non-positive measured frequency and a bad design with InputError', () => {
		expect(() => proposeRetune(designs[0].doc, -1)).toThrow(InputError);
		expect(() => proposeRetune(designs[0].doc, NaN)).toThrow(InputError);
		expect(() => proposeRetune({ frequencyHz: 1 }, 2.4e9)).toThrow(InputError);
	});
});

describe('proposeRetune and the laminate that is bought', () => {
	const base = designs[0].doc;

	it('keeps the designed laminate as the one bought while the substrate carries the apparent εr', () => {
		const p = proposeRetune(base, 0.95 * sizeDocument(base).input.frequencyHz);
		expect(p.input.substrate.relativePermittivity).toBe(p.apparentRelativePermittivity);
		// the document stated no tanδ: the class value sizing assumes is not the laminate's own statement
		expect(p.input.laminate).toEqual({ relativePermittivity: p.designRelativePermittivity });
	});

	it('keeps a named laminate through a retune of a retune', () => {
		const named = { ...base, laminate: { name: 'Demo laminate 4.4', relativePermittivity: base.substrate.relativePermittivity, relativePermittivityTolerance: 0.1 } };
		const first = proposeRetune(named, 0.97 * sizeDocument(named).input.frequencyHz);
		const second = proposeRetune(first.input, 0.99 * first.input.frequencyHz);
		expect(second.input.laminate).toEqual(named.laminate);
		expect(second.input.substrate.relativePermittivity).not.toBe(named.laminate.relativePermittivity);
	});
});
