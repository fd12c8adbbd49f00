// Public face of the field-check service: start, cancel and read full-wave checks and Homing studies; revise from a study.
export { startFieldCheck, MAX_ACTIVE_FIELD_CHECKS_PER_TEAM, type StartFieldCheckOptions } from './start-field-check';
export { cancelFieldCheck, type CancelOutcome } from './cancel-field-check';
export { findFieldCheck, listFieldChecks, findLatestFieldCheckResult } from './find-field-checks';
export { reviseFromHoming } from './revise-from-homing';
export { requireFieldCheck, type FieldCheckAccess } from './field-check-access';
export { toFieldCheck, toFieldCheckWithResult, isFinal, type FieldCheck, type FieldCheckWithResult } from './field-check-model';
export { loadFieldCheckPanel, thinSamples, MAX_PAGE_SAMPLES } from './revision-panel';
export { toApiFieldCheckStatus, toApiFieldCheckSummary, fieldCheckStatusUrl, type ApiFieldCheckStatus, type ApiFieldCheckSummary } from './field-check-view';
