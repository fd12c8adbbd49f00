// The content type of each delivered file, by its extension.

export const ZIP_CONTENT_TYPE = 'application/zip';

const contentTypes: Record<string, string> = {
	zip: ZIP_CONTENT_TYPE,
	gbr: 'application/vnd.gerber',
	drl: 'text/plain; charset=utf-8',
	dxf: 'image/vnd.dxf',
	svg: 'image/svg+xml',
	json: 'application/json',
	txt: 'text/plain; charset=utf-8',
	// ISO 10303-21 clear text: model/step is the IANA-registered type (from memory: registered for ISO/TC 184/SC 4, 2021; not re-checked)
	step: 'model/step'
};

export function contentTypeOf(fileName: string): string {
	return contentTypes[fileName.split('.').pop() ?? ''] ?? 'application/octet-stream';
}
