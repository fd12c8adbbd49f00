// stack-build: can the profile's house laminate this stack at all — its copper count and its core materials.
import type { Artwork, StackLayer } from '../artwork';
import type { FabProfile } from '../schemas/fab-profile';
import { locationOf, type Violation } from './violation';

type Dielectric = Extract<StackLayer, { kind: 'dielectric' }>;

/** A core's material, as the stack states it: εr and tanδ (a bonding film is not a core). */
const materialOf = (d: Dielectric) => `εr ${d.relativePermittivity}, tanδ ${d.lossTangent}`;

/**
 * The stack against the profile's process, not against a length: `measuredMm` and `requiredMm` are 0
 * (no length is at stake) and the message says what cannot be built and what would build it.
 * - more copper layers than the house laminates (a three-copper board on a two-layer service);
 * - cores of different materials when the house does not bond mixed cores.
 */
export function checkStackBuild(artwork: Artwork, profile: FabProfile): Violation[] {
	const out: Violation[] = [];
	const centre = locationOf([artwork.board.widthMm / 2, artwork.board.lengthMm / 2]);
	const coppers = artwork.stack.filter((l) => l.kind === 'copper');
	const cores = artwork.stack.filter((l): l is Dielectric => l.kind === 'dielectric' && !l.bonding);
	const films = artwork.stack.filter((l) => l.kind === 'dielectric' && l.bonding);
	if (coppers.length > profile.maxCopperLayers) {
		const bonding = cores.length > 1 && films.length === 0 ? `, and its ${cores.length} cores are listed with no bonding film between them (a multilayer house bonds them with one)` : '';
		out.push({
			ruleId: 'stack-build',
			layerId: null,
			shapeIds: coppers.map((l) => l.id),
			location: centre,
			measuredMm: 0,
			requiredMm: 0,
			message: `the stack has ${coppers.length} copper layers${bonding}; ${profile.name} builds at most ${profile.maxCopperLayers}: choose a fab profile of a multilayer process that can build it`
		});
	}
	const materials = [...new Set(cores.map(materialOf))];
	if (materials.length > 1 && !profile.mixedCores) {
		out.push({
			ruleId: 'stack-build',
			layerId: null,
			shapeIds: cores.map((l) => l.id),
			location: centre,
			measuredMm: 0,
			requiredMm: 0,
			message: `the stack bonds cores of ${materials.length} different materials (${materials.join('; ')}); ${profile.name} does not build mixed-material boards: choose a fab profile that bonds mixed cores`
		});
	}
	return out;
}
