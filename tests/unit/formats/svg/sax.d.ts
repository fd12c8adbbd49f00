// sax (svgdom's XML parser) ships no types: the strict parser calls the SVG test uses.
declare module 'sax' {
	interface SaxParser {
		onerror: (e: Error) => void;
		write(text: string): SaxParser;
		close(): SaxParser;
		resume(): SaxParser;
	}
	const sax: { parser(strict: boolean): SaxParser };
	export default sax;
}
