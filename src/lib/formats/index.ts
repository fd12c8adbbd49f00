// Public face of the formats room (writers; the Touchstone reader lives in ./touchstone).
export * from './export-meta';
export * from './gerber';
export * from './excellon';
export * from './dxf';
export * from './svg';
export * from './step';
export * from './sweep';
export * from './fab-notes';
export * from './manifest';
export * from './bundle';
export * from './array-pattern';
