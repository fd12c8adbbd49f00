// The one table of words for the ids a design carries: shapes, feeds, polarisation senses, probe models. Pages, tables
// and the editor's choices show these; documents, the API and the CLI keep the ids.
import type { FeedKind, PatchShape, ProbeModel } from '../schemas';
import type { BackMount, LaunchKind } from '../schemas/launch';

export const shapeNames: Record<PatchShape, string> = {
	rectangular: 'Rectangular',
	circular: 'Circular',
	'truncated-corner': 'Truncated-corner (CP)',
	'nearly-square': 'Nearly-square (CP)'
};

export const feedNames: Record<FeedKind, string> = {
	inset: 'Inset microstrip',
	probe: 'Coaxial probe',
	edge: 'Edge microstrip',
	'quarter-wave': 'Quarter-wave transformer',
	'aperture-coupled': 'Aperture-coupled',
	'proximity-coupled': 'Proximity-coupled'
};

/** Circular polarisation sense, in the IEEE Std 145 wording (right-hand / left-hand circular). */
export const handednessNames: Record<'rhcp' | 'lhcp', string> = { rhcp: 'Right-hand circular (RHCP)', lhcp: 'Left-hand circular (LHCP)' };

export const probeModelNames: Record<ProbeModel, string> = { 'solid-pin': 'Solid pin', 'plated-barrel': 'Plated barrel' };

/** Where a connector meets the board: along the edge (line feeds), from the back (a probe), or none. */
export const launchKindNames: Record<LaunchKind, string> = { none: 'None', edge: 'Edge launch', back: 'Back launch' };

export const backMountNames: Record<BackMount, string> = { pad: 'Ground pad', flange: 'Flange holes' };

const byField: Record<string, Record<string, string>> = {
	shape: shapeNames,
	feed: feedNames,
	handedness: handednessNames,
	'probe.model': probeModelNames,
	'launch.kind': launchKindNames,
	'launch.mount': backMountNames
};

/** The words for a choice field's id (shape, feed, handedness, probe model); the id itself when it has none, '' for blank. */
export function choiceName(fieldName: string, id: string): string {
	if (id === '') return '';
	return byField[fieldName]?.[id] ?? id;
}
