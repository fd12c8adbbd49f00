// The origin that links in e-mail point at: ORIGIN (set by npm start and behind a proxy), else the local default.
export function appOrigin(): string {
	const origin = process.env.ORIGIN || `http://127.0.0.1:${process.env.PORT || 3000}`;
	return origin.replace(/\/+$/, '');
}
