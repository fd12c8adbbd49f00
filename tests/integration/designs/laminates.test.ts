// A team's laminate library: presets named by material class, the team's own entries validated on the way in.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { addLaminate, laminatePresets, listLaminates } from '../../../src/lib/server/designs';
import { InputError } from '../../../src/lib/schemas';
import { laminatePropertiesSchema } from '../../../src/lib/schemas/laminate';
import { createTestTeam, type TestTeam } from './test-team';

const db = getDb();
let team: TestTeam;
beforeAll(async () => {
	team = await createTestTeam(db, 'lam');
});
afterAll(() => closeDb());

const props = { relativePermittivity: 3.0, lossTangent: 0.003, heightMm: 0.76, copperThicknessUm: 35, relativePermittivityTolerance: 0.04, heightToleranceMm: 0.03 };

describe('laminate library', () => {
	it('offers presets that pass the schema and carry no brand names', () => {
		expect(laminatePresets.length).toBeGreaterThanOrEqual(3);
		for (const p of laminatePresets) {
			expect(laminatePropertiesSchema.safeParse(p.properties).success).toBe(true);
			// Material class words only (a name is a class, a thickness and units).
			expect(p.name).toMatch(/^(Glass-epoxy|PTFE|Ceramic-filled)[\w\s(),.-]*(εr )?[\d.]+ mm$/);
		}
	});

	it('lists the presets, then the team’s own laminate once added', async () => {
		await addLaminate(db, { teamId: team.teamId, userId: team.users.editor.id, raw: { name: 'Shop stock 0.76', properties: props } });
		const all = await listLaminates(db, team.teamId);
		expect(all.slice(0, laminatePresets.length).every((l) => l.builtIn)).toBe(true);
		const own = all.filter((l) => !l.builtIn);
		expect(own.map((l) => [l.name, l.properties.heightMm])).toEqual([['Shop stock 0.76', 0.76]]);
	});

	it('refuses bad values with the field path, and a name already taken', async () => {
		const bad = await addLaminate(db, { teamId: team.teamId, userId: team.users.editor.id, raw: { name: 'Odd', properties: { ...props, relativePermittivity: 0.9 } } }).catch((e) => e);
		expect(bad).toBeInstanceOf(InputError);
		expect(bad.issues[0].path).toBe('properties.relativePermittivity');
		const dup = await addLaminate(db, { teamId: team.teamId, userId: team.users.editor.id, raw: { name: 'Shop stock 0.76', properties: props } }).catch((e) => e);
		expect(dup).toBeInstanceOf(InputError);
		expect(dup.issues[0].path).toBe('name');
		expect((await listLaminates(db, team.teamId)).filter((l) => !l.builtIn)).toHaveLength(1);
	});
});
