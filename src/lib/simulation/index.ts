// Public face of the simulation room: the full-wave model writer (artwork + stack → engine XML, mesh
// rules) and the post-processor (port time series → S11, impedance, resonance, band, pattern). Pure.
export * from './types';
export { buildFieldModel } from './build-model';
export { serializeFieldModel } from './serialize-model';
export { buildMesh, meshStatistics } from './mesh';
export { analyzePortSeries, parsePortSeries } from './post-process';
