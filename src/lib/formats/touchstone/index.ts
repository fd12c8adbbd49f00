// Public face of the Touchstone reader and writer.
export * from './touchstone-network';
export * from './touchstone-error';
export * from './complex-pair';
export * from './commands';
export { readTouchstone, type ReadTouchstoneOptions } from './read-touchstone';
export { buildTouchstoneCommands, type TouchstoneWriteOptions, type WrittenTouchstoneVersion } from './build';
export { serializeTouchstone } from './serialize';
export { writeTouchstone } from './write-touchstone';
export { s11FromNetwork } from './s11-from-network';
export { portCountFromFileName } from './port-count-from-file-name';
export { describeNetwork, type NetworkDescription } from './describe-network';
export { decimateTrace, type TracePoint } from './decimate-trace';
