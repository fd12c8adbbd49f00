// One line about a revision for lists: frequency, shape and feed by name, the main patch size in the person's unit, εr.
import type { SizedDesign } from '../rf';
import type { DesignInput } from '../schemas';
import { formatGhz, formatPermittivity, lengthInUnit, DEFAULT_DISPLAY_UNITS, type DisplayUnits } from '../units';
import { feedNames, shapeNames } from './display-names';

export function revisionSummary(input: DesignInput, sized: SizedDesign, units: DisplayUnits = DEFAULT_DISPLAY_UNITS): string {
	const p = sized.patch;
	// mm to 0.01, mil to 0.1 (2.5 µm): a patch size to what a first-pass estimate is worth
	const len = (mm: number) => lengthInUnit(mm, units.length).toFixed(units.length === 'mil' ? 1 : 2);
	const u = units.length;
	const size = p.kind === 'circular' ? `radius ${len(p.radiusMm)} ${u}` : p.kind === 'truncated-corner' ? `${len(p.sideMm)} ${u} square` : `${len(p.widthMm)} × ${len(p.lengthMm)} ${u}`;
	return `${formatGhz(input.frequencyHz)} GHz · ${shapeNames[input.shape]} · ${feedNames[input.feed]} feed · ${size} · εr ${formatPermittivity(input.substrate.relativePermittivity)}`;
}
