// Public face of server/exports: build a revision's files or bundle, hash them, record the download, and read the log.
export { buildExport, exportMetaOf, revisionDateOf, contentTypeOf, type BuiltExport } from './build-export';
export { downloadResponse } from './download-response';
export { exportForRequest } from './export-for-request';
export { exportRevision, type DeliveredExport } from './export-revision';
export { listExportLog, toExportLogEntry, type ExportLogEntry, type ExportLogPage } from './export-log';
export { loadExportTarget, type ExportTarget } from './export-target';
export { recordExport, type ExportRecordInput } from './record-export';
export { sha256Hex } from './sha256';
