// Public face of the designs service: designs, immutable revisions, the laminate library.
export { createDesign, type CreateDesignOptions, type CreatedDesign } from './create-design';
export { saveRevision, type SaveRevisionOptions, type SavedRevision } from './save-revision';
export { listDesigns, findDesign, findDesignWithRevisions, findRevision, type DesignSummary, type DesignWithRevisions } from './find-designs';
export { diffRevisions, type DiffRow, type DiffSide, type RevisionDiff } from './diff-revisions';
export { revisionLabel, revisionSeq } from './revision-label';
export { sizeInput, type SizedInput } from './sized-input';
export { listLaminates, addLaminate, type Laminate } from './laminates';
export { laminatePresets, type LaminatePreset } from './laminate-presets';
export type { Design, Revision } from './design-model';
export { startDesign, startDesignSchema } from './start-design';
