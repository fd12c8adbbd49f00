// A typed SVG element tree: the drawing's meaning before svg.js writes it.

export type SvgElementName = 'g' | 'path' | 'circle' | 'line' | 'rect' | 'text' | 'mask' | 'pattern' | 'defs' | 'title' | 'desc';

export interface SvgElement {
	readonly name: SvgElementName;
	/** Attribute values already formatted (numbers in mm with fixed rounding). */
	readonly attributes: Readonly<Record<string, string>>;
	readonly children: readonly SvgElement[];
	/** Text content (for text, title, desc). */
	readonly text?: string;
}

export interface SvgDocument {
	readonly widthMm: number;
	readonly heightMm: number;
	/** min-x, min-y, width, height in mm (user unit = 1 mm). */
	readonly viewBox: readonly [number, number, number, number];
	readonly children: readonly SvgElement[];
}
