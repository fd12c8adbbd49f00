// Public face of the measurements service: upload a Touchstone S11 file, read it back, retune from it.
export { MAX_TOUCHSTONE_BYTES, TOUCHSTONE_EXTENSIONS, readTouchstoneUpload, type ReadUpload } from './read-upload';
export { uploadMeasurement, type UploadMeasurementOptions } from './upload-measurement';
export { listMeasurements, findMeasurement, findMeasurementView, listRetunedRevisions, findRetuneSource, type MeasurementView, type RetunedRevisionLink, type RetuneSource } from './find-measurements';
export { deleteMeasurement, MeasurementInUseError, type DeleteMeasurementOptions } from './delete-measurement';
export { TRACE_COLUMNS, traceOf } from './measurement-trace';
export { retuneProposal, confirmRetune, type RetuneChoice } from './retune-measurement';
export { requireRevision, type RevisionAccess } from './revision-access';
export { loadMeasurementsPage } from './measurements-page';
export { uploadRefusal, type UploadRefusal } from './upload-refusal';
export type { Measurement, MeasurementSummary, MeasurementWithSamples } from './measurement-model';
