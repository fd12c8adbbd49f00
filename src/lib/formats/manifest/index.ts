// Manifest of an export: names, sizes, SHA-256.
export { sha256Hex } from './sha256';
export { buildManifest, serializeManifest, type ExportFile, type Manifest } from './build-manifest';
