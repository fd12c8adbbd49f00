// Public face of server/exports: build a revision's files or bundle, hash them, record the download, and read the log.
export { buildExport, exportMetaOf, revisionDateOf, type BuildExportOptions } from './build-export';
export { downloadResponse } from './download-response';
export { refuseCrossSiteDownload, RECORDABLE_FETCH_SITES, CROSS_SITE_DOWNLOAD_MESSAGE } from './download-site';
export { exportForRequest, type ExportRequestOptions } from './export-for-request';
export { checkExportTarget, type GateReport } from './export-gate';
export { ExportRefusedError, ReadBackFailedError } from './export-refusal';
export { type ExportDependencies, type ExportOptions } from './export-dependencies';
export { refuseReadBack } from './refuse-read-back';
export type { ExportBuildInput, ExportBuildOutcome, ExportBuildReport } from './export-work';
export { parseWaiverReason, WAIVER_MAX_CHARS, WAIVER_MIN_CHARS } from './waiver-reason';
export { asHttpRefusal, readBackSupportIdOf, refusalBody, refusalOf, type RefusalBody } from './refusal-body';
export { exportRevision, type DeliveredExport } from './export-revision';
export { listExportLog, toExportLogEntry, type ExportLogEntry, type ExportLogPage } from './export-log';
export { loadExportTarget, type ExportTarget } from './export-target';
export { recordExport, type ExportRecordInput } from './record-export';
