// Excellon commands → text: metric, decimal coordinates with 3 places (1 µm), LF endings.
import { replaceControlCharacters } from '../../schemas/plain-text';
import type { ExcellonCommand } from './commands';

/** Decimal places of drill coordinates: 1 µm, matching the METRIC,TZ,000.000 header and finer than drill machines position. */
export const EXCELLON_DECIMAL_PLACES = 3;

const num = (v: number) => {
	const s = v.toFixed(EXCELLON_DECIMAL_PLACES);
	return s === `-${(0).toFixed(EXCELLON_DECIMAL_PLACES)}` ? s.slice(1) : s;
};
/** A comment stays one line: no comma (a field separator in attributes), no control character (a stored name may hold one). */
const clean = (t: string) => replaceControlCharacters(t).replace(/,/g, ' ');
const tool = (n: number) => `T${String(n).padStart(2, '0')}`;

export function serializeExcellon(commands: readonly ExcellonCommand[]): string {
	const lines: string[] = [];
	for (const c of commands) {
		switch (c.type) {
			case 'header-start':
				lines.push('M48');
				break;
			case 'comment':
				lines.push(`; ${clean(c.text)}`);
				break;
			case 'attribute':
				lines.push(`; #@! ${[c.name, ...c.values.map(clean)].join(',')}`);
				break;
			case 'units':
				lines.push('METRIC,TZ,000.000');
				break;
			case 'define-tool':
				lines.push(`${tool(c.tool)}C${c.diameterMm.toFixed(3)}`);
				break;
			case 'header-end':
				lines.push('M95');
				break;
			case 'absolute':
				lines.push('G90');
				break;
			case 'drill-mode':
				lines.push('G05');
				break;
			case 'select-tool':
				lines.push(tool(c.tool));
				break;
			case 'hit':
				lines.push(`X${num(c.at[0])}Y${num(c.at[1])}`);
				break;
			case 'end':
				lines.push('M30');
				break;
		}
	}
	return lines.join('\n') + '\n';
}
