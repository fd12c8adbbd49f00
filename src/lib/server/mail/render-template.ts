// Mail templates are plain text: a "Subject: …" first line, a blank line, then the body; {{name}} is replaced.
export interface RenderedMail {
	subject: string;
	text: string;
}

const PLACEHOLDER = /\{\{\s*([a-zA-Z][a-zA-Z0-9]*)\s*\}\}/g;

export function renderMailTemplate(template: string, values: Record<string, string>): RenderedMail {
	const filled = template.replace(PLACEHOLDER, (_match, name: string) => {
		const value = values[name];
		if (value === undefined) throw new Error(`mail template: no value for {{${name}}}`);
		return value;
	});
	const match = /^Subject: ([^\r\n]+)\r?\n\r?\n/.exec(filled);
	if (!match) throw new Error('mail template: the first line must be "Subject: …" followed by a blank line');
	return { subject: match[1].trim(), text: filled.slice(match[0].length).replace(/\r\n/g, '\n') };
}
