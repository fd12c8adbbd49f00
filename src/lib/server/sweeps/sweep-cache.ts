// Sweep files on disk: a plan on an immutable revision always makes the same bytes, so they are built once
// (on a worker thread, single-flight: concurrent downloads of one plan share one build) and kept under the
// data folder as cache/sweeps/<key>.json, where <key> is the sha256 of everything the bytes depend on.
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { createExportMeta, toSlug } from '../../formats/export-meta';
import type { Design, Revision } from '../designs/design-model';
import { sha256Hex } from '../../formats/manifest';
import { runBudgetedWork } from '../work';
import type { SavedSweepPlan } from './sweep-plan-model';
import type { SweepFileFacts } from './sweep-work';
import pkg from '../../../../package.json' with { type: 'json' };

/** Raise when the sweep writer's bytes change, so no file from before is served again (2: sweep JSON version 2). */
const CACHE_FORMAT = 2;

export interface CachedSweepFile extends SweepFileFacts {
	/** The bytes on disk, complete and never rewritten. */
	path: string;
}

/** FRINGEFIELD_DATA_DIR (default .data in the working folder)/cache/sweeps. */
export function sweepCacheDir(): string {
	return join(process.env.FRINGEFIELD_DATA_DIR || join(process.cwd(), '.data'), 'cache', 'sweeps');
}

/** "Lower εr band / 2" → "lower-r-band-2": the plan's part of the file name. */
const planSlug = (name: string): string => toSlug(name, 40, 'plan');

const building = new Map<string, Promise<CachedSweepFile>>();
let builds = 0;

/** Sweep files built since the process began (tests check that concurrent downloads share one build). */
export function sweepBuildCount(): number {
	return builds;
}

function readFacts(path: string): SweepFileFacts | null {
	try {
		return existsSync(path) ? (JSON.parse(readFileSync(path, 'utf8')) as SweepFileFacts) : null;
	} catch {
		return null; // unreadable facts: build again (the rename makes the new ones whole)
	}
}

export async function sweepFileFor(design: Design, revision: Revision, plan: SavedSweepPlan): Promise<CachedSweepFile> {
	const meta = { ...createExportMeta({ designName: design.name, revisionLabel: revision.label, revisionDate: revision.createdAt.toISOString().slice(0, 10) }), designSlug: design.slug };
	const fileName = `${meta.designSlug}-${meta.revisionLabel}.sweep-${planSlug(plan.name)}.sweep.json`;
	const key = await sha256Hex(JSON.stringify({ format: CACHE_FORMAT, version: pkg.version, meta, fileName, input: revision.input, plan: plan.plan }));
	const bodyPath = join(sweepCacheDir(), `${key}.json`);
	const factsPath = join(sweepCacheDir(), `${key}.facts.json`);
	const known = readFacts(factsPath);
	if (known && existsSync(bodyPath)) return { ...known, path: bodyPath };
	let pending = building.get(key);
	if (!pending) {
		builds++;
		pending = runBudgetedWork({ type: 'sweep', job: { input: revision.input, plan: plan.plan, meta, fileName, bodyPath, factsPath } }, { what: `The sweep file of plan "${plan.name}"`, retireThread: true })
			.then((result) => ({ ...result.facts, path: bodyPath }))
			.finally(() => building.delete(key));
		building.set(key, pending);
	}
	return pending;
}
