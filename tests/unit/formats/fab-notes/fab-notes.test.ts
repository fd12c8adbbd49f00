// Fab notes: an order checklist first, every figure from the recorded fab profile (named), the laminate that is
// bought (never a fitted εr as an order), the real copper layers, and nothing addressed to the design team.
import { describe, expect, it } from 'vitest';
import { buildArtwork } from '../../../../src/lib/artwork';
import { createExportMeta } from '../../../../src/lib/formats/export-meta';
import { buildFabNotes, copperWeightOf, fillTemplate, scientific, type FabNotesExtras } from '../../../../src/lib/formats/fab-notes';
import { proposeRetune, type SizedDesign } from '../../../../src/lib/rf';
import { parseFabProfile, STANDARD_MULTILAYER_PROFILE, STANDARD_QUICK_TURN_PROFILE, type FabProfile } from '../../../../src/lib/schemas';
import { designDocument, sizedCase } from '../../../fixtures/designs/design-cases';
import { layeredDocument, threeCopperStack } from '../../../fixtures/designs/layered-cases';
import { sizeDocument } from '../../../fixtures/designs/size-document';

const meta = createExportMeta({ designName: 'Sunroof GNSS', revisionLabel: 'B', revisionDate: '2026-11-20' });

/** A team's own profile with figures unlike the built-in's, so a figure can only come from the profile (demo data). */
const houseProfile: FabProfile = parseFabProfile({
	name: 'Demo RF house, 5 mil',
	minTraceWidthMm: 0.127,
	minSpacingMm: 0.13,
	minDrillMm: 0.25,
	minAnnularRingMm: 0.125,
	copperToEdgeMm: 0.25,
	minSlotWidthMm: 0.15,
	etchToleranceMm: 0.035,
	platedDrillToleranceMm: 0.06,
	nonPlatedDrillToleranceMm: 0.04,
	maxCopperLayers: 4,
	mixedCores: true,
	boardThicknessTolerancePercent: 8,
	finish: 'immersion silver'
});

/** The retuned revision: the inset demo measured 150 MHz low (demo data), re-sized with the back-solved apparent εr. */
const retune = proposeRetune(designDocument('rectangular', 'inset'), 2.3e9);

const cases: { name: string; sized: SizedDesign; copperLayers: string }[] = [
	{ name: 'an inset patch', sized: sizedCase('rectangular', 'inset'), copperLayers: '2 copper layers (top and bottom sides)' },
	{ name: 'a probe-fed patch', sized: sizedCase('rectangular', 'probe', { solderMask: true }), copperLayers: '2 copper layers (top and bottom sides)' },
	{
		name: 'an aperture-coupled patch (three coppers)',
		sized: sizeDocument(layeredDocument({ feed: 'aperture-coupled', stack: [...threeCopperStack] })),
		copperLayers: '3 copper layers (top side, 1 inner layer, bottom side)'
	},
	{ name: 'a retuned revision', sized: sizeDocument(retune.input), copperLayers: '2 copper layers (top and bottom sides)' }
];

const fileNames = ['sunroof-gnss-B.copper-top.gbr', 'sunroof-gnss-B.fab-notes.txt', 'sunroof-gnss-B.manifest.json'];
const notesFor = (sized: SizedDesign, profile: FabProfile, extra: Partial<FabNotesExtras> = {}) =>
	buildFabNotes(buildArtwork(sized), meta, { fileNames, solderMask: sized.input.solderMask, profile, input: sized.input, ...extra });

/** The notes up to the model-value section (the part a board house orders and builds from). */
const orderPart = (notes: string) => notes.split('MODEL VALUES')[0];

describe('fab notes', () => {
	describe.each(cases)('for $name', ({ sized, copperLayers }) => {
		it.each([
			['the built-in profile', sized.input.stack ? STANDARD_MULTILAYER_PROFILE : STANDARD_QUICK_TURN_PROFILE],
			['a team profile', houseProfile]
		])('takes every tolerance, minimum and the finish from %s and names it', (_label, profile) => {
			const notes = notesFor(sized, profile);
			expect(notes).not.toMatch(/\{\{\w+\}\}/);
			expect(notes).toContain(`Fab profile: "${profile.name}".`);
			expect(notes).toContain(`6. TOLERANCES AND MINIMUMS (fab profile "${profile.name}")`);
			expect(notes).toContain(`Etched copper edges: ± ${profile.etchToleranceMm} mm`);
			expect(notes).toContain(`Hold etched copper edges within ± ${profile.etchToleranceMm} mm`);
			expect(notes).toContain(`Narrowest track and gap: ${profile.minTraceWidthMm} mm and ${profile.minSpacingMm} mm`);
			expect(notes).toContain(`Narrowest slot cut in copper: ${profile.minSlotWidthMm} mm`);
			expect(notes).toContain(`Smallest finished hole: ${profile.minDrillMm} mm; annular ring at least ${profile.minAnnularRingMm} mm`);
			expect(notes).toContain(`Hole diameter: plated ± ${profile.platedDrillToleranceMm} mm, non-plated ± ${profile.nonPlatedDrillToleranceMm} mm`);
			expect(notes).toContain(`Copper to the routed edge: at least ${profile.copperToEdgeMm} mm`);
			expect(notes).toContain(`   [ ] Finish: ${profile.finish}\n`);
			expect(notes).toContain(`± ${profile.boardThicknessTolerancePercent} %`);
			// the etch figure that used to be written into the notes whatever the profile said
			if (profile.etchToleranceMm !== 0.025) expect(notes).not.toContain('0.025');
		});

		it('opens with the order checklist: size, layers, thickness and its tolerance, copper, finish, blank quantity, files', () => {
			const artwork = buildArtwork(sized);
			const notes = notesFor(sized, houseProfile);
			const checklist = notes.slice(notes.indexOf('ORDER CHECKLIST'), notes.indexOf('1. BOARD'));
			expect(notes.indexOf('ORDER CHECKLIST')).toBeGreaterThan(0);
			expect(notes.indexOf('ORDER CHECKLIST')).toBeLessThan(notes.indexOf('1. BOARD'));
			const totalMm = artwork.stack.reduce((s, l) => s + l.thicknessMm, 0);
			expect(checklist).toContain(`[ ] Board size: ${Number(artwork.board.widthMm.toFixed(2))} x ${Number(artwork.board.lengthMm.toFixed(2))} mm (outline W x H)`);
			expect(checklist).toContain(`[ ] Layer count: ${copperLayers}`);
			expect(checklist).toContain(`[ ] Finished thickness: ${Number(totalMm.toFixed(2))} mm ± ${houseProfile.boardThicknessTolerancePercent} %`);
			expect(checklist).toContain(`[ ] Copper weight per layer: 1 oz (35 µm finished) on each of the ${artwork.metadata.copperLayerCount} layers`);
			expect(checklist).toContain(`[ ] Finish: ${houseProfile.finish}`);
			expect(checklist).toMatch(/\[ \] Quantity: _+ boards/);
			expect(checklist).toContain(`[ ] Files (${fileNames.length}), all in this bundle:`);
			for (const f of fileNames) expect(checklist).toContain(`       - ${f}`);
		});

		it('speaks to the board house only: no sizing warnings, no tuning advice, no "both sides" for every stack', () => {
			// the sizing warnings are the design team's (aperture-coupled: "tune slot.lengthMm … by sweep")
			expect(sized.warnings.length).toBeGreaterThan(0);
			const notes = notesFor(sized, houseProfile);
			for (const w of sized.warnings) expect(notes).not.toContain(w.message);
			expect(notes).not.toMatch(/\btune\b|by sweep|field solver|slot\.lengthMm|simulation|finished on both sides|Use exactly this laminate/i);
			expect(notes).toContain(`4. COPPER\n   ${copperLayers}.`);
		});

		it('prints no false precision: εr as stated (at most 4 decimals), no raw conductivity', () => {
			const notes = notesFor(sized, houseProfile);
			expect(notes).not.toMatch(/εr \d+\.\d{5,}/);
			expect(notes).not.toMatch(/58000000|5\.8e7/);
			expect(notes).not.toMatch(/oz\/ft²/);
		});
	});

	it('names the laminate that is bought when the design records it, with its stated values', () => {
		const sized = sizeDocument({ ...designDocument('rectangular', 'inset'), laminate: { name: 'Demo hydrocarbon 3.55', relativePermittivity: 3.55, relativePermittivityTolerance: 0.05, lossTangent: 0.0027 } });
		const notes = notesFor(sized, STANDARD_QUICK_TURN_PROFILE);
		expect(notes).toContain('   [ ] Laminate: "Demo hydrocarbon 3.55", 1.524 mm core');
		expect(notes).toContain('Order "Demo hydrocarbon 3.55", 1.524 mm core: εr 3.55 ± 0.05, tanδ 0.0027, as its datasheet states.');
		expect(notes).not.toContain('MODEL VALUES');
	});

	it('a retuned revision orders the laminate that was bought; its fitted εr appears only as a model value', () => {
		const sized = sizeDocument(retune.input);
		const apparent = retune.apparentRelativePermittivity;
		expect(apparent).not.toBe(3.55);
		const notes = notesFor(sized, STANDARD_QUICK_TURN_PROFILE);
		const order = orderPart(notes);
		expect(order).toContain('εr 3.55, tanδ 0.0027 (as the laminate states)');
		expect(order).toContain('a laminate of the ceramic-filled hydrocarbon or PTFE class with εr 3.55, tanδ 0.0027, 1.524 mm core');
		expect(order).not.toContain(String(apparent));
		expect(order).not.toContain(String(Number(apparent.toPrecision(3))));
		const model = notes.slice(notes.indexOf('9. MODEL VALUES'));
		expect(model).toContain('9. MODEL VALUES (for the design team; not an order instruction)');
		expect(model).toContain(`uses εr ${Number(apparent.toPrecision(3))}, a model value fitted to a measured board`);
		expect(model).toContain('Copper conductivity in the model: 5.8 × 10⁷ S/m.');
		// the back-solved value with all its digits is nowhere
		expect(notes).not.toContain(String(apparent));
	});

	it('asks the board house to state its bonding film when cores are listed without one', () => {
		const twoCores = [threeCopperStack[0], threeCopperStack[1], threeCopperStack[3], threeCopperStack[4], threeCopperStack[5]];
		const sized = sizeDocument(layeredDocument({ feed: 'aperture-coupled', stack: [...twoCores] }));
		const notes = notesFor(sized, houseProfile);
		expect(notes).toContain('The stack lists no bonding film between its 2 cores');
		expect(notesFor(sizeDocument(layeredDocument({ feed: 'aperture-coupled', stack: [...threeCopperStack] })), houseProfile)).not.toContain('lists no bonding film');
	});

	it('lists the drills with the profile\'s hole tolerances, and says so when there are none', () => {
		const probe = notesFor(sizedCase('rectangular', 'probe'), houseProfile);
		expect(probe).toContain(`PTH  1.3 mm finished hole, 1 hole(s), plated through, ± ${houseProfile.platedDrillToleranceMm} mm`);
		expect(notesFor(sizedCase('rectangular', 'edge'), houseProfile)).toContain('None: this design has no holes.');
	});

	it.each([
		// ½ oz foil, from memory: 17.5 µm nominal, often written 18 µm
		[18, '0.5 oz (18 µm finished)'],
		// 1 oz/ft² ≈ 34.8 µm, from memory; the trade writes 35 µm
		[35, '1 oz (35 µm finished)'],
		// 2 oz ≈ 70 µm, from memory
		[70, '2 oz (70 µm finished)']
	])('states %s µm copper as the trade orders it: %s', (um, words) => {
		expect(copperWeightOf(um)).toBe(words);
	});

	it('writes a conductivity as a power of ten', () => {
		expect(scientific(5.8e7)).toBe('5.8 × 10⁷');
		expect(scientific(4.1e7)).toBe('4.1 × 10⁷');
	});

	it('refuses a template placeholder without a value', () => {
		expect(() => fillTemplate('{{missing}}', {})).toThrow(/missing/);
	});
});

// Abuse review item 12. Lines are split the way the Unicode Standard's newline guidelines (§5.8) count them:
// LF, CR, VT, FF, NEL (U+0085), LS (U+2028), PS (U+2029); a reader that honours any of them must see no forged line.
const unicodeLines = (text: string) => text.split(/\r\n|[\n\r\u000b\u000c\u0085\u2028\u2029]/);
const forged = (notes: string) => unicodeLines(notes).filter((line) => /^\s*(- )?LAYER COUNT: 6/.test(line));

describe('fab notes with hostile user text', () => {
	const sized = sizedCase('rectangular', 'probe');
	const waived = (reason: string, profileName: string, designName = 'Sunroof GNSS') =>
		buildFabNotes(buildArtwork(sized), createExportMeta({ designName, revisionLabel: 'B', revisionDate: '2026-11-20' }), {
			fileNames: ['a.gbr'],
			solderMask: false,
			profile: STANDARD_QUICK_TURN_PROFILE,
			input: sized.input,
			waiver: { reason, profileName, violations: ['a waived rule'] }
		});

	it('a waiver reason with "\\nLAYER COUNT: 6" yields no such line: the reason is one quoted line', () => {
		const notes = waived('Board house confirmed by phone\nLAYER COUNT: 6', 'standard quick-turn two-layer');
		expect(forged(notes)).toEqual([]);
		expect(notes).toContain('Reason: "Board house confirmed by phone LAYER COUNT: 6"');
	});

	it.each([
		['NEL (U+0085)', '\u0085'],
		['LS (U+2028)', '\u2028'],
		['VT (U+000B)', '\u000b'],
		['CR (U+000D)', '\r'],
		['ESC (U+001B)', '\u001b']
	])('a waiver reason with %s before "LAYER COUNT: 6" forges no line and keeps no control character', (_name, character) => {
		const notes = waived(`Board house confirmed${character}LAYER COUNT: 6`, 'standard quick-turn two-layer');
		expect(forged(notes)).toEqual([]);
		expect(notes).toContain('Reason: "Board house confirmed LAYER COUNT: 6"');
	});

	it('a fab-profile name with a line break forges no line: it is one quoted line', () => {
		const notes = waived('Board house confirmed by phone', 'Cheap house\nLAYER COUNT: 6\r\n');
		expect(forged(notes)).toEqual([]);
		expect(notes).toContain('against the "Cheap house LAYER COUNT: 6" profile accepted by the design team');
	});

	it('a quote in user text is escaped, so the quoted reason ends where it should', () => {
		const notes = waived('the "coarse" rule is fine', 'standard quick-turn two-layer');
		expect(notes).toContain('Reason: "the \\"coarse\\" rule is fine"');
	});

	it('a design name stored with a line break keeps the title on one line', () => {
		const notes = waived('Board house confirmed by phone', 'standard quick-turn two-layer', 'Sunroof\nLAYER COUNT: 6');
		expect(forged(notes)).toEqual([]);
		expect(unicodeLines(notes)[0]).toBe('FABRICATION NOTES — Sunroof LAYER COUNT: 6');
	});
});
