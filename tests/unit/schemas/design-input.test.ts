import Ajv2020 from 'ajv/dist/2020';
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { designInputSchema, InputError, parseDesignInput } from '../../../src/lib/schemas';

const valid = { frequencyHz: 2.45e9, substrate: { relativePermittivity: 4.4, heightMm: 1.6 } };

function issueOf(raw: unknown) {
	try {
		parseDesignInput(raw);
	} catch (e) {
		expect(e).toBeInstanceOf(InputError);
		return (e as InputError).first;
	}
	throw new Error('expected an InputError');
}

const withSubstrate = (patch: Record<string, unknown>) => ({ ...valid, substrate: { ...valid.substrate, ...patch } });

describe('designInputSchema', () => {
	it('fills every default of a minimal document but tanδ, which sizing assumes from the εr class and names', () => {
		const d = parseDesignInput(valid);
		expect(d).toMatchObject({ shape: 'rectangular', feed: 'inset', targetImpedanceOhm: 50, substrate: { copperThicknessUm: 35 } });
		expect(d.substrate.lossTangent).toBeUndefined();
	});

	// Each row: the document, the field path the error must name, a fragment of the allowed range.
	const cases: [string, unknown, string, RegExp][] = [
		['εr equal to 1', withSubstrate({ relativePermittivity: 1 }), 'substrate.relativePermittivity', /\(1, 30\]/],
		['εr below 1', withSubstrate({ relativePermittivity: 0.5 }), 'substrate.relativePermittivity', /\(1, 30\]/],
		['εr above 30', withSubstrate({ relativePermittivity: 30.5 }), 'substrate.relativePermittivity', /\(1, 30\]/],
		['h = 0', withSubstrate({ heightMm: 0 }), 'substrate.heightMm', /\(0, /],
		['h < 0', withSubstrate({ heightMm: -1 }), 'substrate.heightMm', /\(0, /],
		['h ≥ λ0/4 (30.6 mm at 2.45 GHz)', withSubstrate({ heightMm: 31 }), 'substrate.heightMm', /λ0\/4.*allowed range \(0, 30\.591\)/],
		['f below 100 MHz', { ...valid, frequencyHz: 99e6 }, 'frequencyHz', /\[100000000, 100000000000\]/],
		['f above 100 GHz', { ...valid, frequencyHz: 101e9 }, 'frequencyHz', /\[100000000, 100000000000\]/],
		['tanδ < 0', withSubstrate({ lossTangent: -0.001 }), 'substrate.lossTangent', /\[0, 1\)/],
		['tanδ = 1', withSubstrate({ lossTangent: 1 }), 'substrate.lossTangent', /\[0, 1\)/],
		['target below 10 Ω', { ...valid, targetImpedanceOhm: 9 }, 'targetImpedanceOhm', /\[10, 200\]/],
		['target above 200 Ω', { ...valid, targetImpedanceOhm: 201 }, 'targetImpedanceOhm', /\[10, 200\]/],
		['NaN', { ...valid, frequencyHz: NaN }, 'frequencyHz', /finite number/],
		['+Infinity', withSubstrate({ heightMm: Infinity }), 'substrate.heightMm', /finite number/],
		['-Infinity', withSubstrate({ relativePermittivity: -Infinity }), 'substrate.relativePermittivity', /finite number/],
		['a string', withSubstrate({ relativePermittivity: '4.4' }), 'substrate.relativePermittivity', /finite number/],
		['missing frequency', { substrate: valid.substrate }, 'frequencyHz', /required/],
		['missing substrate height', { ...valid, substrate: { relativePermittivity: 4.4 } }, 'substrate.heightMm', /required/],
		['inset on a circular patch', { ...valid, shape: 'circular', feed: 'inset' }, 'feed', /probe, edge, quarter-wave/],
		['edge on a nearly-square patch', { ...valid, shape: 'nearly-square', feed: 'edge' }, 'feed', /probe/]
	];
	it.each(cases)('rejects %s with the field path and the allowed range', (_label, raw, path, message) => {
		const issue = issueOf(raw);
		expect(issue.path).toBe(path);
		expect(issue.message).toMatch(message);
	});

	it('rejects a document that is not an object', () => {
		expect(issueOf('design').path).toBe('');
		expect(issueOf(null).path).toBe('');
	});

	it('generates a JSON Schema (input side) that accepts the minimal document and rejects a bad one', () => {
		const schema = z.toJSONSchema(designInputSchema, { io: 'input' });
		const validate = new Ajv2020({ strict: false }).compile(schema);
		expect(validate(valid)).toBe(true);
		expect(validate(parseDesignInput(valid))).toBe(true);
		expect(validate(withSubstrate({ relativePermittivity: 0.5 }))).toBe(false);
		expect(validate({ ...valid, bogus: 1 })).toBe(false);
	});
});
