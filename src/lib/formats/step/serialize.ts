// STEP entities → ISO 10303-21 clear text: fixed number formatting, non-ASCII through \X2\ escapes, LF endings.
import type { StepDocument, StepEntity, StepRecord, StepValue } from './commands';

/** Decimal places of reals: 0.1 nm, far below the 1e-7 mm uncertainty the file declares, and stable across runs. */
export const STEP_DECIMAL_PLACES = 7;

/**
 * A REAL always carries a decimal point (ISO 10303-21:2016 §6.4.2: "1." not "1"); trailing zeros
 * are trimmed, and a negative zero is written as zero so the same revision gives the same bytes.
 */
export function formatStepReal(value: number): string {
	if (!Number.isFinite(value)) throw new Error(`STEP real must be finite, got ${value}`);
	let s = value.toFixed(STEP_DECIMAL_PLACES).replace(/0+$/, '');
	if (/^-0\.$/.test(s)) s = '0.';
	return s;
}

/**
 * A STRING (ISO 10303-21:2016 §6.4.3): apostrophe doubled, backslash doubled, printable ASCII
 * kept, anything else written as a \X2\hhhh\X0\ (UCS-2) or \X4\hhhhhhhh\X0\ control directive (§6.4.3.3).
 */
export function encodeStepString(text: string): string {
	let out = '';
	for (const ch of text) {
		const code = ch.codePointAt(0)!;
		if (ch === "'") out += "''";
		else if (ch === '\\') out += '\\\\';
		else if (code >= 0x20 && code <= 0x7e) out += ch;
		else if (code < 0x20 || code === 0x7f) out += ' ';
		else if (code <= 0xffff) out += `\\X2\\${code.toString(16).toUpperCase().padStart(4, '0')}\\X0\\`;
		else out += `\\X4\\${code.toString(16).toUpperCase().padStart(8, '0')}\\X0\\`;
	}
	return `'${out}'`;
}

function value(v: StepValue): string {
	switch (v.kind) {
		case 'ref':
			return `#${v.id}`;
		case 'string':
			return encodeStepString(v.text);
		case 'real':
			return formatStepReal(v.value);
		case 'integer':
			return String(Math.trunc(v.value));
		case 'enum':
			return `.${v.name}.`;
		case 'list':
			return `(${v.items.map(value).join(',')})`;
		case 'unset':
			return '$';
		case 'derived':
			return '*';
		case 'typed':
			return `${v.typeName}(${value(v.value)})`;
	}
}

const record = (r: StepRecord) => `${r.name}(${r.values.map(value).join(',')})`;

function entity(e: StepEntity): string {
	return e.type === 'simple' ? `#${e.id}=${record(e.record)};` : `#${e.id}=(${e.records.map(record).join('')});`;
}

/** Comment text may not close the comment. */
const comment = (line: string) => line.replace(/\*\//g, '* /');

export function serializeStep(doc: StepDocument): string {
	const h = doc.header;
	const lines = [
		'ISO-10303-21;',
		'HEADER;',
		...(h.comments.length ? ['/*', ...h.comments.map((c) => ` * ${comment(c)}`), ' */'] : []),
		`FILE_DESCRIPTION((${h.description.map(encodeStepString).join(',')}),'2;1');`,
		`FILE_NAME(${encodeStepString(h.fileName)},${encodeStepString(h.timeStamp)},(${encodeStepString(h.author)}),(${encodeStepString(h.organization)}),${encodeStepString(h.preprocessorVersion)},${encodeStepString(h.originatingSystem)},'');`,
		`FILE_SCHEMA((${encodeStepString(h.schema)}));`,
		'ENDSEC;',
		'DATA;',
		...doc.entities.map(entity),
		'ENDSEC;',
		'END-ISO-10303-21;'
	];
	return lines.join('\n') + '\n';
}
