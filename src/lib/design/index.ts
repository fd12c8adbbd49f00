// Public face of the design room: the one pipeline, and the pure helpers the editor, the server and the CLI share.
export { prepare, prepareSized, gate, stamped, writeFiles, readBack, holdsFabFiles, bundle, type PreparedDesign, type WriteOptions } from './pipeline';
export { sizeDocument, elementCountOfFormValues, LIVE_PREVIEW_ELEMENT_LIMIT, type SizingOutcome } from './live-sizing';
export * from './design-form-fields';
export * from './form-units';
export * from './tolerance-lengths';
export * from './display-names';
export * from './revision-pages';
export * from './derived-quantities';
export { revisionSummary } from './revision-summary';
export { revisionTree, type TreeRevision, type TreeRow } from './revision-tree';
export { canonicalJson } from './canonical-json';
export { buildArrayBenchFiles, arrayBenchDocument, ARRAY_BENCH_FORMATS } from './array-bench';
export { predictedBand } from './predicted-band';
export { laminateAsOrdered } from './ordered-laminate';
