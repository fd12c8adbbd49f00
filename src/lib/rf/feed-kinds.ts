// What the core asks of a feed kind, answered once per kind: adding a kind to FeedKind makes the compiler ask for its answers.
import type { FeedKind, LayeredFeedKind } from '../schemas';
import type { SizedFeed, SizedLayeredFeed, SizedLine } from './sized-design';

/** The decisions that depend on a feed kind alone, one row per kind. */
export interface FeedKindTraits {
	/** Built on three copper layers by the extended sizing and artwork paths (the feed runs under the patch). */
	readonly layered: boolean;
	/** Fed through a plated hole from below (a drill, a ground clearance, a pin port) rather than a printed line. */
	readonly drilled: boolean;
	/**
	 * The resistance the feed presents at resonance: the radiating edge's own resistance for a feed that
	 * transforms nothing, the target impedance for the feeds sized to match it.
	 */
	readonly presents: 'edge-resistance' | 'target';
}

export const feedKindTraits: Record<FeedKind, FeedKindTraits> = {
	inset: { layered: false, drilled: false, presents: 'target' },
	probe: { layered: false, drilled: true, presents: 'target' },
	edge: { layered: false, drilled: false, presents: 'edge-resistance' },
	'quarter-wave': { layered: false, drilled: false, presents: 'target' },
	'aperture-coupled': { layered: true, drilled: false, presents: 'target' },
	'proximity-coupled': { layered: true, drilled: false, presents: 'target' }
};

/** True for the feeds the extended path sizes and builds on three coppers. */
export function isLayeredFeedKind(kind: FeedKind): kind is LayeredFeedKind {
	return feedKindTraits[kind].layered;
}

/** True for a sized feed the extended path builds (narrows to the layered union). */
export function isLayeredFeed(feed: SizedFeed): feed is SizedLayeredFeed {
	return feedKindTraits[feed.kind].layered;
}

/** The microstrip line that carries the feed to the board edge; undefined for a feed without one (a probe). */
export function feedLineOf(feed: SizedFeed): SizedLine | undefined {
	switch (feed.kind) {
		case 'edge':
		case 'inset':
		case 'quarter-wave':
		case 'aperture-coupled':
		case 'proximity-coupled':
			return feed.line;
		case 'probe':
			return undefined;
		default:
			return feed satisfies never;
	}
}
