// The editor's launch fields: shown only for the feeds that take a launch and once its kind is chosen; form ↔ document.
import { describe, expect, it } from 'vitest';
import { designFormFields, documentFromFormValues, fieldApplies, formValuesFromInput, switchesOfValues, type FormValues } from '../../../src/lib/design';
import { parseDesignInput } from '../../../src/lib/schemas';
import { designDocument } from '../../fixtures/designs/design-cases';

const field = (name: string) => designFormFields.find((f) => f.name === name)!;
const shown = (name: string, values: FormValues) => fieldApplies(field(name), values.shape, values.feed, switchesOfValues(values));

describe('launch fields in the editor', () => {
	it('offer the launch kind to line feeds and the probe, not to layered feeds', () => {
		for (const feed of ['inset', 'edge', 'quarter-wave', 'probe']) expect(shown('launch.kind', { shape: 'rectangular', feed }), feed).toBe(true);
		for (const feed of ['aperture-coupled', 'proximity-coupled']) expect(shown('launch.kind', { shape: 'rectangular', feed }), feed).toBe(false);
	});

	it('show the edge dimensions only for an edge launch on a line feed, the back ones only for a back launch on a probe', () => {
		expect(shown('launch.gapMm', { shape: 'rectangular', feed: 'inset', 'launch.kind': 'edge' })).toBe(true);
		expect(shown('launch.gapMm', { shape: 'rectangular', feed: 'inset', 'launch.kind': '' })).toBe(false);
		expect(shown('launch.gapMm', { shape: 'rectangular', feed: 'probe', 'launch.kind': 'edge' })).toBe(false);
		expect(shown('launch.padSideMm', { shape: 'rectangular', feed: 'probe', 'launch.kind': 'back' })).toBe(true);
		expect(shown('launch.padSideMm', { shape: 'rectangular', feed: 'inset', 'launch.kind': 'back' })).toBe(false);
	});

	it('write an edge launch with the typed dimensions and leave blanks to the defaults', () => {
		const values = formValuesFromInput(parseDesignInput(designDocument('rectangular', 'inset')));
		expect(values['launch.kind']).toBe('');
		const doc = documentFromFormValues({ ...values, 'launch.kind': 'edge', 'launch.gapMm': '0.8', 'launch.viaRows': '2', 'launch.padSideMm': '9' });
		expect(doc.launch).toEqual({ kind: 'edge', gapMm: 0.8, viaRows: 2 });
		expect(parseDesignInput(doc).launch).toMatchObject({ kind: 'edge', gapMm: 0.8, viaRows: 2, lengthMm: 3 });
	});

	it('write no launch when the kind is blank, even with dimensions typed', () => {
		const values = formValuesFromInput(parseDesignInput(designDocument('rectangular', 'inset')));
		expect(documentFromFormValues({ ...values, 'launch.gapMm': '0.8' }).launch).toBeUndefined();
	});

	it('round-trip a stored back launch through the form', () => {
		const input = parseDesignInput(designDocument('rectangular', 'probe', { launch: { kind: 'back', mount: 'flange', flangeSpacingMm: 9 } }));
		expect(parseDesignInput(documentFromFormValues(formValuesFromInput(input))).launch).toEqual(input.launch);
	});

	it('lets junk in a launch dimension reach the schema, which names it', () => {
		const values = formValuesFromInput(parseDesignInput(designDocument('rectangular', 'inset')));
		expect(() => parseDesignInput(documentFromFormValues({ ...values, 'launch.kind': 'edge', 'launch.lengthMm': 'abc' }))).toThrow(/launch\.lengthMm|lengthMm/);
	});
});

describe('a launch the design cannot hold, in the live sizing', () => {
	it('is an issue beside launch.gapMm when no gap reaches the line impedance', async () => {
		const { sizeDocument } = await import('../../../src/lib/design');
		const outcome = sizeDocument(designDocument('rectangular', 'edge', { feedLineImpedanceOhm: 200, targetImpedanceOhm: 200, launch: { kind: 'edge' } }));
		expect(outcome.ok).toBe(false);
		if (outcome.ok) return;
		expect(outcome.issues[0].path).toBe('launch.gapMm');
		expect(outcome.issues[0].message).toMatch(/state launch\.gapMm/);
	});
});
