// First-pass sizes of an aperture-coupled patch: slot length and width, open stub. Starting points to tune by sweep, not a solved match.

/**
 * Slot length as a share of the patch's resonant length L. Pozar's design guidelines for
 * aperture-coupled patches (D. M. Pozar, "A review of aperture coupled microstrip antennas", 1996;
 * from memory): make the slot only as long as the coupling needs, well short of its own half-wave
 * resonance, which keeps back radiation down; about half the patch length is the usual start.
 */
export const SLOT_LENGTH_PATCH_SHARE = 0.5;

/** Slot width as a share of its length: about one tenth (same guidelines, from memory). */
export const SLOT_WIDTH_LENGTH_SHARE = 0.1;

/**
 * Stub past the slot centre as a share of the feed line's guided wavelength: a quarter wave, so the
 * open end shows a short at the slot (same guidelines: "slightly less than λg/4", from memory);
 * the sweep trims it to cancel the slot's reactance.
 */
export const STUB_GUIDED_WAVELENGTH_SHARE = 0.25;

export interface ApertureStart {
	slotLengthMm: number;
	slotWidthMm: number;
	stubLengthMm: number;
}

/** The first-pass sizes for a patch of resonant length L fed by a line of guided wavelength λg. */
export function apertureStart(patchLengthMm: number, lineGuidedWavelengthMm: number): ApertureStart {
	const slotLengthMm = SLOT_LENGTH_PATCH_SHARE * patchLengthMm;
	return { slotLengthMm, slotWidthMm: SLOT_WIDTH_LENGTH_SHARE * slotLengthMm, stubLengthMm: STUB_GUIDED_WAVELENGTH_SHARE * lineGuidedWavelengthMm };
}
