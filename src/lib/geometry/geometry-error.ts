// The geometry room's one error: a broken invariant that zod could not see, with a code and a message for humans.

export type GeometryErrorCode =
	| 'arc-in-boolean'
	| 'feed-longer-than-margin'
	| 'notch-outside-patch'
	| 'probe-outside-patch'
	| 'clearance-outside-ground'
	| 'degenerate-shape'
	/** An array pitch too small for the elements and the clearance between them. */
	| 'elements-overlap'
	/** A corporate-feed arm too short for its λg/4 transformer. */
	| 'network-arm-too-short'
	/** The corporate feed would pass too close to an element. */
	| 'feed-network-crowded'
	/** A connector launch the design cannot hold: no feed line at the board edge, or a line impedance no gap reaches. */
	| 'launch-does-not-fit'
	| 'mounting-hole-outside-board';

export class GeometryError extends Error {
	readonly name = 'GeometryError';
	constructor(
		readonly code: GeometryErrorCode,
		message: string
	) {
		super(message);
	}
}
