// Sending one templated message through SMTP (the SMTP_* settings, see mail-settings.ts; the local catcher by default).
import nodemailer, { type Transporter } from 'nodemailer';
import { mailSettingsFrom, type MailSettings } from './mail-settings';
import { renderMailTemplate } from './render-template';
import { mailTemplates, type MailTemplateName } from './templates';

export { DEFAULT_MAIL_FROM } from './mail-settings';

const transports = new Map<string, Transporter>();

function transport(s: MailSettings): Transporter {
	const key = `${s.host}:${s.port}:${s.tls}:${s.user ?? ''}`;
	let t = transports.get(key);
	if (!t) {
		const auth = s.user ? { user: s.user, pass: s.password ?? '' } : undefined;
		// implicit: TLS from the start; starttls: refuse to send unless the server upgrades; none: never upgrade.
		const tls = s.tls === 'implicit' ? { secure: true } : s.tls === 'starttls' ? { secure: false, requireTLS: true } : { secure: false, ignoreTLS: true };
		t = nodemailer.createTransport({ host: s.host, port: s.port, ...tls, auth, connectionTimeout: 10_000, greetingTimeout: 10_000 });
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
		const settings = mailSettingsFrom(process.env);
		await transport(settings).sendMail({ from: settings.from, to, subject, text });
	} catch (err) {
		throw new MailDeliveryError(`could not send "${template}" mail: ${err instanceof Error ? err.message : String(err)}`);
	}
}
