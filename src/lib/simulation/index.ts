// Public face of the simulation room: the full-wave model writer (artwork + stack → engine XML, mesh
// rules) and the post-processor (port time series → S11, impedance, resonance, band, pattern). Pure.
export * from './types';
export { buildFieldModel, conductivityForLossTangent, ACCURATE_REFINEMENT, CHECK_BAND_FRACTION, CELLS_PER_WAVELENGTH, MIN_CELLS_PER_LAYER, EDGE_CELL_FRACTION, END_CRITERION_DB } from './build-model';
export { serializeFieldModel, formatNumber, PORT_VOLTAGE_FILE, PORT_CURRENT_FILE } from './serialize-model';
export { buildMesh, buildAxis, meshStatistics, thirdsLines, largestGradingRatio, MAX_GRADING_RATIO } from './mesh';
export { analyzePortSeries, parsePortSeries, dft, type PortAnalysis, type PortAnalysisInput } from './post-process';
