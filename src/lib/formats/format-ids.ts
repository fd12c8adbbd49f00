// The ids of the file formats, in the order an export writes them. A leaf module: the API schemas read it without loading the writers.
// Each id has exactly one entry in ./registry.ts (the compiler checks it); nothing else lists formats.

export const formatIds = ['gerber', 'drill', 'dxf', 'svg', 'sweep', 'notes'] as const;
export type FormatId = (typeof formatIds)[number];

export function isFormatId(value: string): value is FormatId {
	return (formatIds as readonly string[]).includes(value);
}
