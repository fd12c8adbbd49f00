// Demo designs for Kestrel Labs (demo data, values invented for the scenario): a GNSS L1 receiver patch,
// a 2.4 GHz ISM patch whose retune forked, a 5.8 GHz RHCP patch and a circular test coupon.
// Written through the designs service, so they are sized and stored exactly like a user's; safe to re-run.
import type { Kysely } from 'kysely';
import type { Database } from '../../src/lib/server/db/database.ts';
import * as designQueries from '../../src/lib/server/db/design.queries.ts';
import { createDesign, laminatePresets, saveRevision } from '../../src/lib/server/designs/index.ts';
import { toDesignSlug } from '../../src/lib/formats/index.ts';

type Role = 'owner' | 'editor' | 'viewer';

const laminate = (id: string) => {
	const found = laminatePresets.find((p) => p.id === id);
	if (!found) throw new Error(`no laminate preset ${id}`);
	return { ...found.properties };
};

interface DemoRevision {
	by: Role;
	/** Parent label; the first revision has none. */
	from?: string;
	note: string;
	input: Record<string, unknown>;
}

interface DemoDesign {
	name: string;
	revisions: DemoRevision[];
}

/** The demo designs and their revisions (exported for the test that parses every demo document). */
export function demoDesigns(): DemoDesign[] {
	const gnss = {
		name: 'Kestrel GNSS L1 puck',
		frequencyHz: 1575.42e6,
		shape: 'truncated-corner',
		feed: 'probe',
		handedness: 'rhcp',
		substrate: laminate('preset:ceramic-ptfe-1.27'),
		groundMarginMm: 10,
		probe: { drillDiameterMm: 1.3, clearanceDiameterMm: 4.1 }
	};
	const ism = {
		name: 'Bench node 2.4 GHz inset patch',
		frequencyHz: 2.45e9,
		shape: 'rectangular',
		feed: 'inset',
		substrate: laminate('preset:glass-epoxy-1.6'),
		groundMarginMm: 6
	};
	const cp58 = {
		name: 'Drone FPV downlink 5.8 GHz RHCP',
		frequencyHz: 5.8e9,
		shape: 'truncated-corner',
		feed: 'inset',
		handedness: 'rhcp',
		substrate: laminate('preset:ptfe-glass-0.787'),
		// the whole 5.8 GHz ISM band: wider than one corner-cut patch's usable CP band, so the demo shows the warning
		bandToCover: { lowerHz: 5.725e9, upperHz: 5.875e9 }
	};
	const coupon = {
		name: 'Circular test coupon 5.2 GHz',
		frequencyHz: 5.2e9,
		shape: 'circular',
		feed: 'probe',
		substrate: laminate('preset:ptfe-glass-0.787'),
		probe: { drillDiameterMm: 0.9, clearanceDiameterMm: 2.6 }
	};
	return [
		{
			name: gnss.name,
			revisions: [
				{ by: 'owner', note: 'First cut on the high-εr ceramic-filled board', input: gnss },
				{ by: 'editor', from: 'A', note: 'Larger ground for the roof mount', input: { ...gnss, groundMarginMm: 14 } }
			]
		},
		{
			name: ism.name,
			revisions: [
				{ by: 'editor', note: 'Centre of the 2.4 GHz ISM band', input: ism },
				// Two retunes from A: the fork the history shows.
				{ by: 'editor', from: 'A', note: 'Retuned 25 MHz down after the first bench sweep', input: { ...ism, frequencyHz: 2.425e9 } },
				{ by: 'owner', from: 'A', note: 'Quarter-wave feed instead of the inset', input: { ...ism, feed: 'quarter-wave' } }
			]
		},
		{ name: cp58.name, revisions: [{ by: 'editor', note: 'RHCP by truncated corners, inset feed', input: cp58 }] },
		{ name: coupon.name, revisions: [{ by: 'owner', note: 'Probe-fed circular coupon for laminate checks', input: coupon }] }
	];
}

/** Creates the demo designs a team does not have yet (by slug); existing ones are left untouched. */
export async function seedDemoDesigns(db: Kysely<Database>, teamId: string, userIds: Record<Role, string>): Promise<number> {
	let created = 0;
	for (const demo of demoDesigns()) {
		if (await designQueries.findDesignByTeamAndSlug(db, teamId, toDesignSlug(demo.name))) continue;
		const [first, ...rest] = demo.revisions;
		const { design } = await createDesign(db, { teamId, userId: userIds[first.by], raw: first.input, note: first.note });
		for (const r of rest) await saveRevision(db, { designId: design.id, parentLabel: r.from!, userId: userIds[r.by], raw: r.input, note: r.note });
		created++;
	}
	return created;
}
