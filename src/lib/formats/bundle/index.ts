// The zip of an export and our file-name pattern. Which files an export holds is the registry's business (../registry.ts).
export { buildBundle } from './build-bundle';
export { exportFileName, bundleFileName } from './file-names';
