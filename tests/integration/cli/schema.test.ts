import { spawnSync } from 'node:child_process';
import Ajv2020 from 'ajv/dist/2020';
import { describe, expect, it } from 'vitest';

const cli = (args: string[]) => spawnSync('npx', ['tsx', 'src/cli/main.ts', 'schema', ...args], { cwd: process.cwd(), encoding: 'utf8' });

describe('cli schema', () => {
	it('prints the design-input JSON Schema, which validates a minimal document', () => {
		const r = cli(['design-input']);
		expect(r.status).toBe(0);
		const schema = JSON.parse(r.stdout);
		expect(schema.properties.substrate.properties.relativePermittivity).toMatchObject({ exclusiveMinimum: 1, maximum: 30 });
		const validate = new Ajv2020({ strict: false }).compile(schema);
		expect(validate({ frequencyHz: 2.45e9, substrate: { relativePermittivity: 4.4, heightMm: 1.6 } })).toBe(true);
		expect(validate({ frequencyHz: 'fast', substrate: { relativePermittivity: 4.4, heightMm: 1.6 } })).toBe(false);
	});

	it('exits 2 on an unknown name', () => {
		const r = cli(['nonsense']);
		expect(r.status).toBe(2);
		expect(r.stderr.trim().split('\n')).toHaveLength(1);
	});
});
