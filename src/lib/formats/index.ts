// Public face of the formats room (writers, the registry; the Touchstone reader lives in ./touchstone).
export * from './export-meta';
export * from './gerber';
export * from './excellon';
export * from './dxf';
export * from './svg';
export * from './drawing-sheet';
export * from './step';
export * from './sweep';
export * from './fab-notes';
export * from './manifest';
export * from './bundle';
export * from './array-pattern';
export * from './format-ids';
export * from './registry';
export { parseFormatList } from './parse-format-list';
