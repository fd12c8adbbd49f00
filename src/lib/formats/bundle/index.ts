// Export pipeline: sized design → files → zip.
export { buildFiles, buildFilesFromInput, type BuildFilesEnvironment } from './build-files';
export { buildBundle } from './build-bundle';
export { exportFormats, optionalExportFormats, allExportFormats, parseExportFormats, type ExportFormat } from './export-formats';
export { exportFileName, bundleFileName } from './file-names';
export { buildArrayBenchFiles, arrayBenchDocument, ARRAY_BENCH_FORMATS } from './array-bench-files';
