// The app's mode, decided from the environment in one place (abuse review item 2).
import { describe, expect, it } from 'vitest';
import { decideAppMode, SettingError } from '../../../src/lib/server/app-mode';

const PRODUCTION = { SMTP_HOST: 'smtp.example.org', SMTP_FROM: 'Fringefield <noreply@example.org>', ORIGIN: 'https://fringefield.example.org' };

function refusal(env: Record<string, string | undefined>): string {
	try {
		decideAppMode(env);
	} catch (err) {
		if (err instanceof SettingError) return err.setting;
		throw err;
	}
	return 'started';
}

describe('decideAppMode', () => {
	it('is production unless told it is the demo, and only the demo has the mailbox and the banner', () => {
		expect(decideAppMode(PRODUCTION)).toEqual({ kind: 'production', localTrial: false, mailbox: false, demoBanner: false });
		expect(decideAppMode({ ...PRODUCTION, FRINGEFIELD_DEV_MAILBOX: '1' }).mailbox).toBe(false);
		expect(decideAppMode({ FRINGEFIELD_MODE: 'demo' })).toEqual({ kind: 'demo', localTrial: false, mailbox: true, demoBanner: true });
	});

	// Each case: the environment, then the setting named in the one-line refusal ('started' when none).
	it.each([
		[{}, 'SMTP_HOST'],
		[{ ...PRODUCTION, SMTP_HOST: '' }, 'SMTP_HOST'],
		[{ ...PRODUCTION, SMTP_FROM: undefined }, 'SMTP_FROM'],
		[{ ...PRODUCTION, ORIGIN: undefined }, 'ORIGIN'],
		[{ ...PRODUCTION, ORIGIN: 'http://fringefield.example.org' }, 'ORIGIN'],
		[{ ...PRODUCTION, ORIGIN: 'fringefield.example.org' }, 'ORIGIN'],
		[{ ...PRODUCTION, SMTP_TLS: 'none' }, 'SMTP_TLS'],
		[{ ...PRODUCTION, SMTP_TLS: 'sometimes' }, 'SMTP_TLS'],
		[{ ...PRODUCTION, SMTP_PORT: '99999' }, 'SMTP_PORT'],
		[{ ...PRODUCTION, SMTP_USER: 'fringefield' }, 'SMTP_PASSWORD'],
		[{ ...PRODUCTION, FRINGEFIELD_MODE: 'staging' }, 'FRINGEFIELD_MODE'],
		[{ FRINGEFIELD_LOCAL_TRIAL: 'yes' }, 'FRINGEFIELD_LOCAL_TRIAL'],
		[{ FRINGEFIELD_LOCAL_TRIAL: '1' }, 'started'], // a local trial needs neither mail nor HTTPS
		[{ ...PRODUCTION, SMTP_HOST: '127.0.0.1', SMTP_TLS: 'none' }, 'started'], // a relay on this machine may be plain
		[PRODUCTION, 'started']
	])('%j → %s', (env, setting) => {
		expect(refusal(env)).toBe(setting);
	});
});
