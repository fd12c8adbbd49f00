// The geometry room's one error: a broken invariant that zod could not see, with a code and a message for humans.

export type GeometryErrorCode =
	| 'arc-in-boolean'
	| 'feed-longer-than-margin'
	| 'notch-outside-patch'
	| 'probe-outside-patch'
	| 'clearance-outside-ground'
	| 'degenerate-shape';

export class GeometryError extends Error {
	readonly name = 'GeometryError';
	constructor(
		readonly code: GeometryErrorCode,
		message: string
	) {
		super(message);
	}
}
