// Sending one templated message through SMTP (SMTP_HOST/SMTP_PORT; the local catcher by default).
import nodemailer, { type Transporter } from 'nodemailer';
import { renderMailTemplate } from './render-template';
import { mailTemplates, type MailTemplateName } from './templates';

export const DEFAULT_MAIL_FROM = 'Fringefield <noreply@fringefield.test>';

const transports = new Map<string, Transporter>();

function transport(): Transporter {
	const host = process.env.SMTP_HOST || '127.0.0.1';
	const port = Number(process.env.SMTP_PORT || 2525);
	const key = `${host}:${port}`;
	let t = transports.get(key);
	if (!t) {
		const auth = process.env.SMTP_USER ? { user: process.env.SMTP_USER, pass: process.env.SMTP_PASSWORD ?? '' } : undefined;
		t = nodemailer.createTransport({ host, port, secure: port === 465, auth, connectionTimeout: 10_000, greetingTimeout: 10_000 });
		transports.set(key, t);
	}
	return t;
}

/** A message could not be handed to the SMTP server. */
export class MailDeliveryError extends Error {
	readonly name = 'MailDeliveryError';
}

export async function sendMail(to: string, template: MailTemplateName, values: Record<string, string>): Promise<void> {
	const { subject, text } = renderMailTemplate(mailTemplates[template], values);
	try {
		await transport().sendMail({ from: process.env.MAIL_FROM || DEFAULT_MAIL_FROM, to, subject, text });
	} catch (err) {
		throw new MailDeliveryError(`could not send "${template}" mail: ${err instanceof Error ? err.message : String(err)}`);
	}
}
