// Reset-mail allowances: per e-mail (5 an hour) and per client address (20 an hour), the same for every e-mail.
import { describe, expect, it } from 'vitest';
import { takeResetMailAllowance } from '../../../../src/lib/server/accounts/attempt-throttle';

const unique = () => `${Date.now().toString(36)}${Math.random().toString(36).slice(2, 8)}`;

describe('takeResetMailAllowance', () => {
	it('allows 5 requests an hour for one e-mail, then asks to wait', async () => {
		const email = `reset-${unique()}@example.test`;
		for (let i = 0; i < 5; i++) expect((await takeResetMailAllowance(email, `10.0.${i}.1`)).retryAfterSeconds).toBe(0);
		expect((await takeResetMailAllowance(email, '10.0.9.1')).retryAfterSeconds).toBeGreaterThan(0);
	});

	it('allows 20 requests an hour from one address, whatever the e-mails', async () => {
		const address = `192.0.2.${Math.floor(Math.random() * 250)}-${unique()}`;
		for (let i = 0; i < 20; i++) expect((await takeResetMailAllowance(`many-${i}-${unique()}@example.test`, address)).retryAfterSeconds).toBe(0);
		expect((await takeResetMailAllowance(`one-more-${unique()}@example.test`, address)).retryAfterSeconds).toBeGreaterThan(0);
		// another address is not affected
		expect((await takeResetMailAllowance(`other-${unique()}@example.test`, `${address}-b`)).retryAfterSeconds).toBe(0);
	});
});
