// Reset-mail allowances: per e-mail (5 an hour) and per client address (20 an hour), the same for every e-mail;
// counted in PostgreSQL (the rate_limit table), where every app process sees them.
import { afterAll, describe, expect, it } from 'vitest';
import { closeDb } from '../../../src/lib/server/db';
import { isLoopbackAddress, takeResetMailAllowance } from '../../../src/lib/server/accounts/attempt-throttle';

afterAll(() => closeDb());

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

	it('never limits loopback per address (behind a proxy without ADDRESS_HEADER every client is 127.0.0.1)', async () => {
		// RFC 5735 §3 (127.0.0.0/8), RFC 4291 §2.5.3 (::1) and §2.5.5.2 (IPv4-mapped).
		for (const a of ['127.0.0.1', '127.8.9.10', '::1', '::ffff:127.0.0.1']) expect(isLoopbackAddress(a), a).toBe(true);
		for (const a of ['10.0.0.1', '192.0.2.7', '::ffff:192.0.2.7', '2001:db8::1', '']) expect(isLoopbackAddress(a), a).toBe(false);
		for (let i = 0; i < 25; i++) expect((await takeResetMailAllowance(`loop-${i}-${unique()}@example.test`, '127.0.0.1')).retryAfterSeconds).toBe(0);
	});
});
