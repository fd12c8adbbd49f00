import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/lib/schemas';
import { rectangularPatch } from '../../../src/lib/rf/rectangular-patch';

const within = (actual: number, expected: number, share: number) => expect(Math.abs(actual / expected - 1)).toBeLessThan(share);

describe('rectangularPatch', () => {
	// Balanis, Antenna Theory (3rd ed.), ch. 14, rectangular-patch design example; from memory:
	// εr 2.2, h 0.1588 cm, 10 GHz → W 1.186 cm, εreff 1.972, ΔL 0.081 cm, L 0.906 cm.
	it("reproduces Balanis' 10 GHz design example within 0.5 % with the textbook model", () => {
		const p = rectangularPatch({ frequencyHz: 10e9, relativePermittivity: 2.2, heightMm: 1.588, model: 'textbook' });
		within(p.widthMm, 11.86, 0.005);
		within(p.effectivePermittivity, 1.972, 0.005);
		within(p.fringeExtensionMm, 0.81, 0.005);
		within(p.lengthMm, 9.06, 0.005);
	});

	it('keeps a fixed width and solves only the length', () => {
		const free = rectangularPatch({ frequencyHz: 2.45e9, relativePermittivity: 4.4, heightMm: 1.6 });
		const fixed = rectangularPatch({ frequencyHz: 2.45e9, relativePermittivity: 4.4, heightMm: 1.6, widthMm: 30 });
		expect(fixed.widthMm).toBe(30);
		// A narrower patch has a lower εreff, so it needs a longer physical length.
		expect(fixed.lengthMm).toBeGreaterThan(free.lengthMm);
	});

	it('rejects a substrate so thick that no length remains, stating the largest usable height', () => {
		try {
			rectangularPatch({ frequencyHz: 10e9, relativePermittivity: 30, heightMm: 7 });
			expect.unreachable();
		} catch (e) {
			expect(e).toBeInstanceOf(InputError);
			const issue = (e as InputError).first;
			expect(issue.path).toBe('heightMm');
			expect(issue.message).toMatch(/allowed range \(0, [0-9.]+\)/);
		}
	});
});
