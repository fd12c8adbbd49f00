// The one place that decides how this server runs, read once at start (hooks.server.ts `init`):
// - demo: `npm start` on the private cluster — demo data, caught mail shown at /dev/mailbox, a demo banner;
// - production (the default): no mailbox route, and real SMTP settings and an HTTPS ORIGIN are required,
//   unless FRINGEFIELD_LOCAL_TRIAL=1 says this is a trial on one's own machine.
import { isLoopbackHost, mailSettingsFrom, SettingError } from './mail/mail-settings';

export { SettingError } from './mail/mail-settings';

export const appModeKinds = ['demo', 'production'] as const;
export type AppModeKind = (typeof appModeKinds)[number];

export interface AppMode {
	kind: AppModeKind;
	/** FRINGEFIELD_LOCAL_TRIAL=1: production without real mail or HTTPS, on one's own machine. */
	localTrial: boolean;
	/** /dev/mailbox and /dev/mailbox.json exist (demo only). */
	mailbox: boolean;
	/** Every page says that this is a public demo (demo only). */
	demoBanner: boolean;
}

type Env = Readonly<Record<string, string | undefined>>;

/** The mode `env` asks for; throws SettingError (one line naming the setting) when production lacks what it needs. */
export function decideAppMode(env: Env): AppMode {
	const raw = env.FRINGEFIELD_MODE?.trim() || 'production';
	if (!(appModeKinds as readonly string[]).includes(raw)) throw new SettingError('FRINGEFIELD_MODE', `${JSON.stringify(env.FRINGEFIELD_MODE)} is not one of ${appModeKinds.join(', ')}`);
	const kind = raw as AppModeKind;
	const trialRaw = env.FRINGEFIELD_LOCAL_TRIAL?.trim();
	if (trialRaw && trialRaw !== '1' && trialRaw !== '0') throw new SettingError('FRINGEFIELD_LOCAL_TRIAL', `${JSON.stringify(trialRaw)} must be 1 (a local trial) or 0`);
	const localTrial = trialRaw === '1';
	const mail = mailSettingsFrom(env);
	if (kind === 'demo') return { kind, localTrial, mailbox: true, demoBanner: true };

	if (!localTrial) {
		const hint = 'set it, or FRINGEFIELD_LOCAL_TRIAL=1 for a trial on this machine only';
		if (!env.SMTP_HOST?.trim()) throw new SettingError('SMTP_HOST', `required in production (password-reset and invitation mail go through it); ${hint}`);
		if (!(env.SMTP_FROM?.trim() || env.MAIL_FROM?.trim())) throw new SettingError('SMTP_FROM', `required in production (the sender of every message, e.g. "Fringefield <noreply@example.org>"); ${hint}`);
		if (mail.user && !mail.password) throw new SettingError('SMTP_PASSWORD', 'required when SMTP_USER is set');
		if (mail.tls === 'none' && !isLoopbackHost(mail.host)) throw new SettingError('SMTP_TLS', `"none" would send reset links in plain text to ${mail.host}; use starttls or implicit`);
		const origin = env.ORIGIN?.trim();
		if (!origin) throw new SettingError('ORIGIN', `required in production: the public https:// address of the app; ${hint}`);
		let url: URL;
		try {
			url = new URL(origin);
		} catch {
			throw new SettingError('ORIGIN', `${JSON.stringify(origin)} is not an address like https://fringefield.example.org`);
		}
		if (url.protocol !== 'https:') throw new SettingError('ORIGIN', `${JSON.stringify(origin)} must start with https:// in production (sessions and reset links travel over it); ${hint}`);
	}
	return { kind, localTrial, mailbox: false, demoBanner: false };
}

let current: AppMode | undefined;

/** Decides the mode from `env` and keeps it; called once by the server's init hook (and by tests). */
export function startAppMode(env: Env = process.env): AppMode {
	current = decideAppMode(env);
	return current;
}

/** The mode decided at start (decided from the environment on first use when no init hook ran). */
export function appMode(): AppMode {
	return current ?? startAppMode();
}
