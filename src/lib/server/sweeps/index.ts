// Public face of the sweeps service: save a revision's sweep plans, read them, export one as the sweep JSON (recorded).
export { saveSweepPlan, type SaveSweepPlanOptions } from './save-sweep-plan';
export { listSweepPlans, findSweepPlan } from './find-sweep-plans';
export { exportSweepPlan, sweepResponse, type DeliveredSweep } from './export-sweep-plan';
export { sweepFileFor, sweepBuildCount, sweepCacheDir, type CachedSweepFile } from './sweep-cache';
export type { SavedSweepPlan } from './sweep-plan-model';
