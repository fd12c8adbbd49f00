// Starting the local SMTP fake (unless a real SMTP_HOST is configured).
import { join } from 'node:path';
import { ConfigError, type LocalConfig } from './config.ts';
import { canBind, isPortOpen, waitFor } from './ports.ts';
import { alivePid, startBackground } from './services.ts';

export interface MailSettings {
	SMTP_HOST: string;
	SMTP_PORT: string;
	MAILBOX_DIR: string;
}

export async function provideMail(config: LocalConfig, name = 'mail', mailboxDir = join(config.dataDir, 'mail')): Promise<MailSettings> {
	if (process.env.SMTP_HOST) {
		return { SMTP_HOST: process.env.SMTP_HOST, SMTP_PORT: String(config.smtpPort), MAILBOX_DIR: '' };
	}
	if (!alivePid(config, name)) {
		if (!(await canBind(config.smtpPort))) throw new ConfigError('SMTP_PORT', `port ${config.smtpPort} on 127.0.0.1 is in use by another program; choose a free port`);
		startBackground(config, name, process.execPath, ['--import', 'tsx', 'scripts/mail-fake.ts'], {
			...process.env,
			SMTP_PORT: String(config.smtpPort),
			MAILBOX_DIR: mailboxDir
		});
		if (!(await waitFor(() => isPortOpen(config.smtpPort), 15_000))) throw new ConfigError('SMTP_PORT', 'the local mail fake did not start');
	}
	return { SMTP_HOST: '127.0.0.1', SMTP_PORT: String(config.smtpPort), MAILBOX_DIR: mailboxDir };
}
