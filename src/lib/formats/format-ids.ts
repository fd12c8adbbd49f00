// The ids of the file formats. A leaf module: the API schemas read it without loading the writers.
// Each id has exactly one entry in ./registry.ts (the compiler checks it); nothing else lists formats.

/** The formats of the default bundle (the bundle download's and the CLI's default): its bytes, and so its hash, stay as they were. */
export const bundleFormatIds = ['gerber', 'drill', 'dxf', 'svg', 'sweep', 'notes'] as const;
/** Formats written only when asked for by name (`--formats step`, their own download); never in the default bundle. */
export const optionalFormatIds = ['step'] as const;
/** Every format id: the bundle's, then the optional ones (the order the download panel, the API and the CLI list them). */
export const formatIds = [...bundleFormatIds, ...optionalFormatIds] as const;
export type FormatId = (typeof formatIds)[number];

/** The order an export writes its files: the fab notes come last, since they list the files written before them. */
export const writeOrder: readonly FormatId[] = ['gerber', 'drill', 'dxf', 'svg', 'sweep', 'step', 'notes'];

export function isFormatId(value: string): value is FormatId {
	return (formatIds as readonly string[]).includes(value);
}
