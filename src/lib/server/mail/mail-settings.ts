// The SMTP settings (SMTP_HOST, SMTP_PORT, SMTP_USER, SMTP_PASSWORD, SMTP_FROM, SMTP_TLS) read from the
// environment in one place: app-mode.ts checks them once at start, send-mail.ts builds its transport from them.
export const DEFAULT_MAIL_FROM = 'Fringefield <noreply@fringefield.test>';

/** implicit: TLS from the first byte (port 465); starttls: the plain connection must upgrade; none: plain text. */
export const smtpTlsModes = ['implicit', 'starttls', 'none'] as const;
export type SmtpTls = (typeof smtpTlsModes)[number];

export interface MailSettings {
	host: string;
	port: number;
	user: string | undefined;
	password: string | undefined;
	from: string;
	tls: SmtpTls;
	/** Whether SMTP_HOST and SMTP_FROM were given (a real provider), not the local catcher's defaults. */
	configured: boolean;
}

/** A setting that cannot be used: the message is one line starting with the setting's name. */
export class SettingError extends Error {
	readonly name = 'SettingError';
	constructor(
		readonly setting: string,
		detail: string
	) {
		super(`${setting}: ${detail}`);
	}
}

const LOOPBACK = /^(127\.\d+\.\d+\.\d+|::1|localhost)$/i;

export function isLoopbackHost(host: string): boolean {
	return LOOPBACK.test(host);
}

type Env = Readonly<Record<string, string | undefined>>;

/** The settings in `env`; throws SettingError for a value that is malformed (not for one that is missing). */
export function mailSettingsFrom(env: Env): MailSettings {
	const host = env.SMTP_HOST?.trim() || '127.0.0.1';
	const rawPort = env.SMTP_PORT?.trim();
	const tlsRaw = env.SMTP_TLS?.trim().toLowerCase();
	if (tlsRaw && !(smtpTlsModes as readonly string[]).includes(tlsRaw)) throw new SettingError('SMTP_TLS', `${JSON.stringify(env.SMTP_TLS)} is not one of ${smtpTlsModes.join(', ')}`);
	let port: number;
	if (rawPort) {
		port = Number(rawPort);
		if (!Number.isInteger(port) || port < 1 || port > 65535) throw new SettingError('SMTP_PORT', `${JSON.stringify(rawPort)} is not a port number (1–65535)`);
	} else {
		port = tlsRaw === 'implicit' ? 465 : env.SMTP_HOST ? 587 : 2525;
	}
	const tls = (tlsRaw as SmtpTls | undefined) ?? (port === 465 ? 'implicit' : isLoopbackHost(host) ? 'none' : 'starttls');
	const user = env.SMTP_USER || undefined;
	const from = env.SMTP_FROM?.trim() || env.MAIL_FROM?.trim() || DEFAULT_MAIL_FROM;
	return { host, port, user, password: env.SMTP_PASSWORD, from, tls, configured: Boolean(env.SMTP_HOST?.trim() && (env.SMTP_FROM?.trim() || env.MAIL_FROM?.trim())) };
}
