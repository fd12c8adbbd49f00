// The tolerance page's thickness ± and etch ± in the person's length unit. 1 mil = 0.0254 mm exactly (1959 international
// yard and pound agreement), so 0.1 mm = 3.937 mil and 4 mil = 0.1016 mm.
import { describe, expect, it } from 'vitest';
import { toleranceLengthsMm, toleranceLengthTexts } from '../../../src/lib/design/tolerance-lengths';

const saved = { heightToleranceMm: 0.1, etchToleranceMm: 0.05 };
const query = (q: string) => (k: string) => new URLSearchParams(q).get(k);

describe('the tolerance page’s length fields', () => {
	it('start from the saved values, in mil for a person in mil (0.1 mm → 3.937 mil, 0.05 mm → 1.9685 mil)', () => {
		expect(toleranceLengthTexts(query(''), saved, 'mil')).toEqual({ heightToleranceMm: '3.937', etchToleranceMm: '1.9685' });
		expect(toleranceLengthTexts(query(''), saved, 'mm')).toEqual({ heightToleranceMm: '0.1', etchToleranceMm: '0.05' });
	});

	it('read a link without lengthUnit in mm (links made before units) and restate it for a person in mil', () => {
		expect(toleranceLengthTexts(query('h=0.0254&etch=0.0508'), saved, 'mil')).toEqual({ heightToleranceMm: '1', etchToleranceMm: '2' });
		expect(toleranceLengthTexts(query('h=0.0254&etch=&lengthUnit=bogus'), saved, 'mm')).toEqual({ heightToleranceMm: '0.0254', etchToleranceMm: '0.05' });
	});

	it('keep a query in the person’s own unit as typed, and restate one typed in mil for a person in mm', () => {
		expect(toleranceLengthTexts(query('h=4&etch=2+mil&lengthUnit=mil'), saved, 'mil')).toEqual({ heightToleranceMm: '4', etchToleranceMm: '2 mil' });
		expect(toleranceLengthTexts(query('h=4&etch=2&lengthUnit=mil'), saved, 'mm')).toEqual({ heightToleranceMm: '0.1016', etchToleranceMm: '0.0508' });
	});

	it('keep query text the parser refuses as typed, so the page names the problem', () => {
		expect(toleranceLengthTexts(query('h=0,1&lengthUnit=mm'), saved, 'mil').heightToleranceMm).toBe('0,1');
	});

	it('read the fields in mm through the one parser: bare numbers in the unit, explicit units win, bad text refused', () => {
		expect(toleranceLengthsMm({ heightToleranceMm: '4', etchToleranceMm: '0.05 mm' }, 'mil')).toEqual({ heightToleranceMm: { ok: true, value: 0.1016 }, etchToleranceMm: { ok: true, value: 0.05 } });
		expect(toleranceLengthsMm({ heightToleranceMm: '8 mil', etchToleranceMm: '0.05' }, 'mm').heightToleranceMm).toEqual({ ok: true, value: 0.2032 });
		const bad = toleranceLengthsMm({ heightToleranceMm: '', etchToleranceMm: '2 parsec' }, 'mil');
		expect(bad.heightToleranceMm.ok).toBe(false);
		expect(bad.etchToleranceMm).toEqual({ ok: false, message: 'unknown unit "parsec"; use mm or mil' });
	});
});
