// Retune from a measurement: back-solve the permittivity the built board shows, then re-size the design with it.
//
// Why re-size with the apparent εr rather than scale the length by f_measured/f_target:
// scaling L alone is a first-order fix that ignores how the fringe extension ΔL and εreff move with the
// new length, and leaves the inset depth, probe offset and feed line tuned for the wrong laminate.
// Sizing the same document again with the εr the board actually shows keeps every dimension consistent
// with one model, and by construction puts that model's resonance of the new patch, on the real board,
// at the target. The substrate height is held as designed: one resonance cannot separate an εr error from
// a thickness error, and εr dominates (f ∝ 1/√εreff), so the whole shift is booked to an "apparent" εr.
// (Imports come from the defining files, not ./index, so that index can re-export this module.)
import { InputError, orderedLaminateOf, parseDesignInput, type DesignInput } from '../schemas';
import { requirePositive } from './guard';
import { resonantFrequencyHz } from './resonant-frequency';
import type { SizedDesign, SizedPatch } from './sized-design';
import { size } from './size';
import { lineModelOf } from './square-patch';

/** The εr range a design-input document accepts (schemas/design-input.ts: (1, 30]). */
const MIN_RELATIVE_PERMITTIVITY = 1;
const MAX_RELATIVE_PERMITTIVITY = 30;
/** Bisection stops when the bracket is this small relative to εr (far below any laminate tolerance). */
const PERMITTIVITY_RELATIVE_TOLERANCE = 1e-12;
/** Significant digits kept in the apparent εr (an εr step of 1e-5 moves the resonance by about 1 ppm). */
const APPARENT_PERMITTIVITY_DIGITS = 6;

export interface RetuneOptions {
	/** Keep the designed patch width and solve only the length (rectangular patches). Default false. */
	holdWidth?: boolean;
}

/** One key dimension before and after the retune. */
export interface DimensionChange {
	/** Dotted path in the sized design, e.g. "patch.lengthMm", "feed.insetDepthMm". */
	name: string;
	oldMm: number;
	newMm: number;
	changeMm: number;
	/** (new − old)/old; 0 when old is 0. */
	changeFraction: number;
}

export interface RetuneProposal {
	targetFrequencyHz: number;
	measuredFrequencyHz: number;
	/** What the model predicted for the built dimensions on the designed laminate. */
	predictedFrequencyHz: number;
	/** (measured − predicted)/predicted. */
	frequencyErrorFraction: number;
	designRelativePermittivity: number;
	/** The laminate εr that makes the model's resonance of the built patch equal the measurement (6 significant digits). */
	apparentRelativePermittivity: number;
	/** Patch effective permittivity the sizing model gives for the designed and the apparent εr. */
	designEffectivePermittivity: number;
	apparentEffectivePermittivity: number;
	method: 'resize-with-apparent-permittivity';
	/** The new design-input document: the same design with the apparent εr (and the width held if asked). */
	input: DesignInput;
	/** The model's resonance of the new patch on a board with the apparent εr (≈ the target). */
	expectedFrequencyHz: number;
	dimensions: DimensionChange[];
	/** Sizing warnings of the new design. */
	warnings: SizedDesign['warnings'];
}

/** Resonance of fixed patch dimensions on a laminate of permittivity er. */
function resonanceOn(patch: SizedPatch, heightMm: number, er: number): number {
	return resonantFrequencyHz(patch, { relativePermittivity: er, heightMm });
}

/**
 * The εr in (1, 30] for which the built patch resonates at measuredHz, by bisection
 * (the resonance falls monotonically as εr rises).
 */
function apparentPermittivity(patch: SizedPatch, heightMm: number, measuredHz: number): number {
	// Just above 1: the lower bound is excluded by the schema.
	let lo = MIN_RELATIVE_PERMITTIVITY * (1 + 1e-9);
	let hi = MAX_RELATIVE_PERMITTIVITY;
	const highestHz = resonanceOn(patch, heightMm, lo);
	const lowestHz = resonanceOn(patch, heightMm, hi);
	if (!(measuredHz <= highestHz && measuredHz >= lowestHz)) {
		throw new InputError([
			{
				path: 'measuredFrequencyHz',
				value: measuredHz,
				message: `no laminate εr in (1, 30] makes this patch resonate there; allowed range [${lowestHz.toFixed(0)}, ${highestHz.toFixed(0)}] Hz`
			}
		]);
	}
	while (hi - lo > PERMITTIVITY_RELATIVE_TOLERANCE * hi) {
		const mid = (lo + hi) / 2;
		if (resonanceOn(patch, heightMm, mid) > measuredHz) lo = mid;
		else hi = mid;
	}
	// Six significant digits: far finer than any laminate's εr is known, and a readable value in the new document.
	return Number(((lo + hi) / 2).toPrecision(APPARENT_PERMITTIVITY_DIGITS));
}

/** εreff of fixed patch dimensions on a laminate (transmission-line model; the cavity model's εr for a disc). */
function patchEffectivePermittivityOn(patch: SizedPatch, heightMm: number, er: number): number {
	switch (patch.kind) {
		case 'rectangular':
		case 'nearly-square':
			return lineModelOf(patch.widthMm, patch.lengthMm, heightMm, er).effectivePermittivity;
		case 'truncated-corner':
			return lineModelOf(patch.sideMm, patch.sideMm, heightMm, er).effectivePermittivity;
		case 'circular':
			return er;
	}
}

/** Every finite length (a key ending in "Mm") of the patch, the feed and the ground, by dotted path. */
function lengthsOf(sized: SizedDesign): Map<string, number> {
	const out = new Map<string, number>();
	const walk = (prefix: string, node: unknown) => {
		if (node === null || typeof node !== 'object') return;
		for (const [key, value] of Object.entries(node)) {
			const path = `${prefix}.${key}`;
			if (typeof value === 'number' && key.endsWith('Mm') && Number.isFinite(value)) out.set(path, value);
			else if (value !== null && typeof value === 'object') walk(path, value);
		}
	};
	walk('patch', sized.patch);
	walk('feed', sized.feed);
	walk('ground', sized.ground);
	return out;
}

function compareDimensions(before: SizedDesign, after: SizedDesign): DimensionChange[] {
	const oldLengths = lengthsOf(before);
	const newLengths = lengthsOf(after);
	const changes: DimensionChange[] = [];
	for (const [name, oldMm] of oldLengths) {
		const newMm = newLengths.get(name);
		if (newMm === undefined) continue;
		changes.push({ name, oldMm, newMm, changeMm: newMm - oldMm, changeFraction: oldMm === 0 ? 0 : (newMm - oldMm) / oldMm });
	}
	return changes;
}

/**
 * Proposes new dimensions for a design whose built board resonated at measuredFrequencyHz.
 * `design` is a design-input document (validated here). Throws only InputError.
 */
export function proposeRetune(design: unknown, measuredFrequencyHz: number, options: RetuneOptions = {}): RetuneProposal {
	const measuredHz = requirePositive('measuredFrequencyHz', measuredFrequencyHz);
	const original: DesignInput = parseDesignInput(design);
	const built = size(original);
	const { heightMm, relativePermittivity } = original.substrate;
	const predictedHz = resonanceOn(built.patch, heightMm, relativePermittivity);
	const apparentEr = apparentPermittivity(built.patch, heightMm, measuredHz);

	const holdWidth = options.holdWidth === true && built.patch.kind === 'rectangular';
	const proposedDocument = {
		...original,
		// the board is still built on the laminate that was bought; the apparent εr below is a model value
		laminate: orderedLaminateOf(original),
		substrate: { ...original.substrate, relativePermittivity: apparentEr },
		...(holdWidth && built.patch.kind === 'rectangular' ? { patchWidthMm: built.patch.widthMm } : {})
	};
	// validated again: the apparent εr must still be in the document's range (InputError with its field path)
	const retuned = size(parseDesignInput(proposedDocument));

	return {
		targetFrequencyHz: original.frequencyHz,
		measuredFrequencyHz: measuredHz,
		predictedFrequencyHz: predictedHz,
		frequencyErrorFraction: (measuredHz - predictedHz) / predictedHz,
		designRelativePermittivity: relativePermittivity,
		apparentRelativePermittivity: apparentEr,
		designEffectivePermittivity: built.effectivePermittivity,
		apparentEffectivePermittivity: patchEffectivePermittivityOn(built.patch, heightMm, apparentEr),
		method: 'resize-with-apparent-permittivity',
		input: retuned.input,
		expectedFrequencyHz: resonanceOn(retuned.patch, heightMm, apparentEr),
		dimensions: compareDimensions(built, retuned),
		warnings: retuned.warnings
	};
}
