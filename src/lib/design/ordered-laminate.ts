// A library laminate as a design orders it: its name and the values its datasheet (or class) states.
import type { LaminateProperties, OrderedLaminate } from '../schemas';

/** The `laminate` block of a design sized on a library laminate; a tolerance of 0 means "not stated" and is left out. */
export function laminateAsOrdered(name: string, properties: LaminateProperties): OrderedLaminate {
	return {
		name,
		relativePermittivity: properties.relativePermittivity,
		...(properties.relativePermittivityTolerance > 0 ? { relativePermittivityTolerance: properties.relativePermittivityTolerance } : {}),
		lossTangent: properties.lossTangent
	};
}
