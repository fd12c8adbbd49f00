// Manifest of an export: names, sizes, SHA-256 (each file hashed once, by the platform's Web Crypto).
export { sha256Hex } from './sha256';
export { buildManifest, hashFiles, serializeManifest, type ExportFile, type HashedFile, type Manifest } from './build-manifest';
