// The outside reference for the SVG writer: the element tree written with svg.js on svgdom (dev dependencies only).
import { SVG, registerWindow, type Element as SvgJsElement } from '@svgdotjs/svg.js';
import type { SvgDocument, SvgElement } from '../../../../src/lib/formats/svg/commands';
import { svgNumber } from '../../../../src/lib/formats/svg/build';

/** The window svg.js draws in: svgdom's createSVGWindow() in Node, `window` in a browser. */
export type SvgWindow = Window & typeof globalThis;

export function serializeSvg(doc: SvgDocument, window: SvgWindow): string {
	registerWindow(window, window.document);
	const root = SVG();
	root.attr({
		width: `${svgNumber(doc.widthMm)}mm`,
		height: `${svgNumber(doc.heightMm)}mm`,
		viewBox: doc.viewBox.map(svgNumber).join(' ')
	});
	const add = (parent: SvgJsElement, e: SvgElement) => {
		const child = parent.element(e.name);
		// attributes in sorted order so every DOM writes them alike
		for (const key of Object.keys(e.attributes).sort()) child.attr(key, e.attributes[key]);
		if (e.text !== undefined) child.node.textContent = e.text;
		for (const c of e.children) add(child, c);
	};
	for (const c of doc.children) add(root, c);
	return `<?xml version="1.0" encoding="UTF-8"?>\n${root.svg()}\n`;
}
