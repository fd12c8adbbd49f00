// Public face of the geometry room.
export * from './point';
export * from './tolerance';
export * from './contour';
export * from './arc-sweep';
export * from './contour-area';
export * from './flatten-contour';
export * from './bounds';
export * from './region';
export * from './boolean-ops';
export * from './geometry-error';
export * from './ring-is-simple';
export * from './point-in-ring';
export * from './translate';
export * from './extremes';
