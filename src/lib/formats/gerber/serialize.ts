// Gerber command list → file text: one command per line, integer coordinates in the declared format, LF endings.
import type { Point } from '../../geometry';
import { GERBER_COORDINATE_FORMAT, type CoordinateFormat, type GerberCommand } from './commands';

/** mm → Gerber integer coordinate string (leading zeros omitted, 1 nm steps with 4.6). */
export function toGerberCoordinate(valueMm: number, format: CoordinateFormat = GERBER_COORDINATE_FORMAT): string {
	const n = Math.round(valueMm * 10 ** format.decimalPlaces);
	return n === 0 ? '0' : String(n);
}

/** Gerber integer coordinate string → mm. */
export function fromGerberCoordinate(text: string, format: CoordinateFormat = GERBER_COORDINATE_FORMAT): number {
	return Number(text) / 10 ** format.decimalPlaces;
}

/** Attribute fields and comments may not hold the reserved characters * % , (spec §3.4). */
function clean(text: string): string {
	return text.replace(/[*%,\r\n]/g, ' ').replace(/[^\x20-\x7e]/g, '_');
}

function xy(p: Point, format: CoordinateFormat): string {
	return `X${toGerberCoordinate(p[0], format)}Y${toGerberCoordinate(p[1], format)}`;
}

export function serializeGerber(commands: readonly GerberCommand[]): string {
	let format = GERBER_COORDINATE_FORMAT;
	const lines: string[] = [];
	for (const c of commands) {
		switch (c.type) {
			case 'comment':
				lines.push(`G04 ${clean(c.text)}*`);
				break;
			case 'attribute':
				lines.push(`%${[c.name, ...c.values.map(clean)].join(',')}*%`);
				break;
			case 'format':
				format = c.format;
				lines.push(`%FSLAX${c.format.integerPlaces}${c.format.decimalPlaces}Y${c.format.integerPlaces}${c.format.decimalPlaces}*%`);
				break;
			case 'units':
				lines.push('%MOMM*%');
				break;
			case 'define-circle-aperture':
				lines.push(`%ADD${c.code}C,${c.diameterMm.toFixed(format.decimalPlaces)}*%`);
				break;
			case 'select-aperture':
				lines.push(`D${c.code}*`);
				break;
			case 'polarity':
				lines.push(c.polarity === 'dark' ? '%LPD*%' : '%LPC*%');
				break;
			case 'multi-quadrant':
				lines.push('G75*');
				break;
			case 'interpolation':
				lines.push(c.mode === 'linear' ? 'G01*' : c.mode === 'clockwise' ? 'G02*' : 'G03*');
				break;
			case 'region-start':
				lines.push('G36*');
				break;
			case 'region-end':
				lines.push('G37*');
				break;
			case 'move':
				lines.push(`${xy(c.to, format)}D02*`);
				break;
			case 'line':
				lines.push(`${xy(c.to, format)}D01*`);
				break;
			case 'arc':
				lines.push(`${xy(c.to, format)}I${toGerberCoordinate(c.centerOffset[0], format)}J${toGerberCoordinate(c.centerOffset[1], format)}D01*`);
				break;
			case 'flash':
				lines.push(`${xy(c.at, format)}D03*`);
				break;
			case 'end':
				lines.push('M02*');
				break;
		}
	}
	return lines.join('\n') + '\n';
}
