// Public face of server/revision-view: the revision page's heavy panels, built on worker threads within the page's budget.
export { loadRevisionDrawing, loadRevisionView, type RevisionPanel, type RevisionView, type RevisionViewRequest } from './revision-view';
export { REVISION_DRAWING_SHAPE_LIMIT, type RevisionCheck } from './revision-view-work';
