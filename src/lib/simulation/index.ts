// Public face of the simulation room: the full-wave model writer (artwork + stack → engine XML, mesh
// rules) and the post-processor (port time series → S11, impedance, resonance, band; far-field
// sphere → directivity, gain, E/H-plane cuts). Pure.
export * from './types';
export { buildFieldModel, conductivityForLossTangent, ACCURATE_REFINEMENT, CHECK_BAND_FRACTION, CELLS_PER_WAVELENGTH, MIN_CELLS_PER_LAYER, EDGE_CELL_FRACTION, END_CRITERION_DB } from './build-model';
export { serializeFieldModel, formatNumber, nearFieldDumpFile, PORT_VOLTAGE_FILE, PORT_CURRENT_FILE, NEAR_FIELD_E_DUMP, NEAR_FIELD_H_DUMP } from './serialize-model';
export { serializeFarFieldRequest, FAR_FIELD_RESULT_FILE, type FarFieldRequest } from './serialize-far-field';
export { analyzeFarField, radiationIntensity, acceptedPower, FarFieldError, FAR_FIELD_THETA_DEG, FAR_FIELD_PHI_DEG, CUT_FLOOR_DB, type FarFieldSphere } from './far-field';
export { buildMesh, buildAxis, meshStatistics, thirdsLines, largestGradingRatio, MAX_GRADING_RATIO } from './mesh';
export { analyzePortSeries, impedanceResonance, parsePortSeries, dft, type ImpedanceResonance, type PortAnalysis, type PortAnalysisInput } from './post-process';
